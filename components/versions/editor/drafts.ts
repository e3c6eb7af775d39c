// Work that could not be saved (a conflict, an ended session) is kept in this browser until
// the user restores or discards it: nothing typed is lost.
//
// Each tab keeps its own draft of a sketch (`counterpoise:draft:<sketchId>:<tab>`), so the same
// sketch open in two tabs never writes over the other tab's unsaved work; a visit is offered the
// newest draft of any tab that is closed. A draft kept before drafts had tabs sits under the bare
// key (tab "").
//
// A tab with a saved sketch open says so in local storage (`counterpoise:tab-open:<tab>` = the
// time, written again every `BEAT_MS`, removed as the tab goes): a draft of a tab still open is
// that tab's unsaved work in progress, not work to bring back, so it is not offered elsewhere
// (`readDraft`), only named (`draftsOpenElsewhere`). A tab that crashed writes no more: after
// `OPEN_MS` its draft is offered like a closed tab's.
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
const OPEN_PREFIX = "counterpoise:tab-open:";
/** How often an open tab says so; a browser may hold a background tab's timers to once a minute. */
export const BEAT_MS = 20_000;
/** A tab that has not said so for this long is taken as closed (it crashed, or was killed). */
export const OPEN_MS = 150_000;
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

/** Whether the tab is open now: it said so less than `OPEN_MS` ago (a draft from before tabs, "", never is). */
export function tabOpen(tab: string, now = Date.now()): boolean {
  if (!tab) return false;
  try {
    const at = Number(storage()?.getItem(OPEN_PREFIX + tab));
    return Number.isFinite(at) && at > 0 && now - at < OPEN_MS;
  } catch {
    return false;
  }
}

/**
 * Says that this tab is open, now and every `BEAT_MS` (and as it comes back into view), until the
 * returned stop is called or the page goes; the stop says it is closed.
 */
export function keepTabOpen(tab: string): () => void {
  const s = storage();
  if (!s) return () => {};
  const beat = () => {
    try {
      s.setItem(OPEN_PREFIX + tab, String(Date.now()));
    } catch {
      // a full or refused storage: the other tabs offer this tab's draft as if it were closed
    }
  };
  const gone = () => {
    try {
      s.removeItem(OPEN_PREFIX + tab);
    } catch {
      // nothing to remove
    }
  };
  const seen = () => document.visibilityState === "visible" && beat();
  beat();
  const timer = setInterval(beat, BEAT_MS);
  window.addEventListener("pagehide", gone);
  // back from the page cache, or shown again after a while in the background
  window.addEventListener("pageshow", beat);
  document.addEventListener("visibilitychange", seen);
  return () => {
    clearInterval(timer);
    window.removeEventListener("pagehide", gone);
    window.removeEventListener("pageshow", beat);
    document.removeEventListener("visibilitychange", seen);
    gone();
  };
}

/** Every draft of the sketch kept in this browser, newest first. */
function allDrafts(sketchId: string): Draft[] {
  const s = storage();
  if (!s) return [];
  const out: Draft[] = [];
  for (const t of draftTabs(s, sketchId)) {
    const d = parse(sketchId, s.getItem(key(sketchId, t)), t);
    if (d) out.push(d);
  }
  return out.sort((a, b) => (String(a.keptAt) < String(b.keptAt) ? 1 : String(a.keptAt) > String(b.keptAt) ? -1 : 0));
}

/**
 * That tab's draft of the sketch; without a tab, the newest draft of a tab that is closed (a tab
 * still open has its own unsaved work in progress: `draftsOpenElsewhere` names those).
 */
export function readDraft(sketchId: string, tab?: string): Draft | null {
  try {
    const s = storage();
    if (!s) return null;
    if (tab !== undefined) return parse(sketchId, s.getItem(key(sketchId, tab)), tab);
    const now = Date.now();
    return allDrafts(sketchId).find((d) => !tabOpen(d.tab ?? "", now)) ?? null;
  } catch {
    return null;
  }
}

/** The drafts of the sketch that other tabs still open are keeping (not `ownTab`'s), newest first. */
export function draftsOpenElsewhere(sketchId: string, ownTab: string): Draft[] {
  try {
    const now = Date.now();
    return allDrafts(sketchId).filter((d) => d.tab && d.tab !== ownTab && tabOpen(d.tab, now));
  } catch {
    return [];
  }
}

/** Whether a storage key is a tab saying it is open or closed (`keepTabOpen`). */
export const isTabOpenKey = (k: string | null) => k === null || k.startsWith(OPEN_PREFIX);

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
