// Work that could not be saved (a conflict, an ended session) is kept in this browser until
// the user restores or discards it: nothing typed is lost.
//
// Each tab keeps its own draft of a sketch (`counterpoise:draft:<sketchId>:<tab>`), so the same
// sketch open in two tabs never writes over the other tab's unsaved work; a visit is offered the
// newest draft of any tab. A draft kept before drafts had tabs sits under the bare key (tab "").
import type { SketchFile } from "@/solver/schema";

export type Draft = {
  sketchId: string;
  /** the version the edits started from */
  baseVersion: number;
  /** the newest version when the draft was kept */
  latestVersion: number;
  message: string;
  keptAt: string;
  sketch: SketchFile;
  /** the tab that kept it ("": a draft from before drafts had tabs) */
  tab?: string;
};

const PREFIX = "counterpoise:draft:";
const key = (sketchId: string, tab = "") => `${PREFIX}${sketchId}${tab ? `:${tab}` : ""}`;

function storage(): Storage | null {
  return typeof window === "undefined" ? null : window.localStorage;
}

/** A name for this tab's drafts, new with each page load (a reload is offered the draft it left). */
export function newTabId(): string {
  return typeof crypto !== "undefined" && "randomUUID" in crypto ? crypto.randomUUID().slice(0, 8) : Math.random().toString(36).slice(2, 10);
}

export function keepDraft(draft: Omit<Draft, "keptAt">): boolean {
  try {
    storage()?.setItem(key(draft.sketchId, draft.tab), JSON.stringify({ ...draft, keptAt: new Date().toISOString() }));
    return true;
  } catch {
    return false;
  }
}

function parse(sketchId: string, text: string | null | undefined, tab: string): Draft | null {
  try {
    if (!text) return null;
    const d = JSON.parse(text) as Draft;
    return d && d.sketchId === sketchId && d.sketch && typeof d.baseVersion === "number" ? { ...d, tab } : null;
  } catch {
    return null;
  }
}

/** The tabs holding a draft of the sketch. */
function draftTabs(s: Storage, sketchId: string): string[] {
  const bare = key(sketchId);
  const tabs: string[] = [];
  for (let i = 0; i < s.length; i++) {
    const k = s.key(i);
    if (k === bare) tabs.push("");
    else if (k?.startsWith(`${bare}:`)) tabs.push(k.slice(bare.length + 1));
  }
  return tabs;
}

/** That tab's draft of the sketch; without a tab, the newest draft any tab kept. */
export function readDraft(sketchId: string, tab?: string): Draft | null {
  try {
    const s = storage();
    if (!s) return null;
    if (tab !== undefined) return parse(sketchId, s.getItem(key(sketchId, tab)), tab);
    let newest: Draft | null = null;
    for (const t of draftTabs(s, sketchId)) {
      const d = parse(sketchId, s.getItem(key(sketchId, t)), t);
      if (d && (!newest || String(d.keptAt) > String(newest.keptAt))) newest = d;
    }
    return newest;
  } catch {
    return null;
  }
}

/** Removes that tab's draft; without a tab, the one `readDraft(sketchId)` gives (the newest). */
export function discardDraft(sketchId: string, tab?: string): void {
  const t = tab ?? readDraft(sketchId)?.tab;
  if (t === undefined) return;
  try {
    storage()?.removeItem(key(sketchId, t));
  } catch {
    // nothing kept to remove
  }
}
