"use client";
// Two versions side by side (or the newest version and your kept, unsaved changes): what
// changed in the inputs, field by field with units, and what it did to the reactions.
import { useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useMemo, useState, useSyncExternalStore } from "react";
import { sharedFrame } from "@/canvas/render/svg";
import { drawingFamily } from "@/canvas/render/results";
import { UNIT_OPTIONS, useUnitsPreference } from "@/components/sketches/useUnitsPreference";
import { Crumb, Notice, Panel, Segmented, Select, Skeleton } from "@/components/shell/controls";
import { discardDraft, readDraft } from "@/components/versions/editor/drafts";
import { draftOnNewest } from "@/components/versions/editor/restoreDraft";
import { useVersions } from "@/components/versions/VersionHistory";
import { setAddressParam } from "@/lib/address";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { changeCount, compareSketches } from "@/lib/review/compare";
import { clashItems } from "@/lib/review/mergeWords";
import { CAUTION_SHORT } from "@/solver/cautions";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";
import { ChangesTable, ReactionsTable } from "./CompareTables";
import { Enlargeable } from "./Enlargeable";
import { ReviewDrawing, useSolved } from "./ReviewDrawing";

type VersionDoc = { version: { number: number; message: string; document: SketchFile } };

const NO_CHANGES = () => () => {};

function useDocument(sketchId: string, which: number | "draft", draftTab?: string) {
  const path = `/api/sketches/${sketchId}/versions/${which}`;
  const remote = useQuery({ queryKey: apiKey(path), queryFn: () => apiFetch<VersionDoc>(path), enabled: which !== "draft", staleTime: Infinity });
  // the draft "Kept work" offered (that tab's), else the newest of a closed tab; read once the page
  // is in the browser (the server has no kept changes to read: reading them while hydrating would
  // render a "no kept changes" notice the browser then contradicts)
  const inBrowser = useSyncExternalStore(NO_CHANGES, () => true, () => false);
  const draft = useMemo(
    () => (inBrowser && which === "draft" ? ((draftTab !== undefined ? readDraft(sketchId, draftTab) : null) ?? readDraft(sketchId)) : null),
    [inBrowser, which, draftTab, sketchId],
  );
  // the kept work as "Bring them back" would open it: merged onto the newest version
  const merged = useQuery({ queryKey: ["kept-work", sketchId, draft?.keptAt], queryFn: () => draftOnNewest(draft!), enabled: !!draft, staleTime: Infinity });
  if (which === "draft") {
    if (!inBrowser) return { doc: null, label: null, error: null, pending: true, conflicts: [] as string[], merged: null };
    if (!draft) return { doc: null, label: null, error: "There are no kept changes for this sketch in this browser.", pending: false };
    const m = merged.data;
    return {
      doc: m?.sketch ?? null,
      label: m ? `your kept changes (made on v${draft.baseVersion}${m.newest > draft.baseVersion ? `, brought onto v${m.newest}` : ""})` : null,
      error: merged.error ? "The versions your kept changes are merged with could not be loaded." : null,
      pending: merged.isPending,
      conflicts: m?.conflicts ?? [],
      merged: m ?? null,
      // the tab that kept it: bringing back or discarding acts on this draft, not a newer one another tab keeps meanwhile
      tab: draft.tab ?? "",
    };
  }
  return {
    doc: remote.data?.version.document ?? null,
    label: remote.data ? `v${remote.data.version.number}${remote.data.version.message ? ` — ${remote.data.version.message}` : ""}` : null,
    error: remote.error instanceof ApiError ? remote.error.message : remote.error ? "The version could not be loaded." : null,
    pending: remote.isPending,
    conflicts: [] as string[],
    merged: null,
  };
}

/** The fields your kept changes and a later version both changed, one a line (`clashItems`). */
function Clashes({ items, lead }: { items: readonly string[]; lead: string }) {
  if (!items.length) return null;
  return (
    <div className="basis-full text-[12.5px] text-caution" data-testid="kept-work-conflicts">
      <p>{lead}</p>
      <ul className="mt-0.5 list-disc pl-5">
        {items.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </div>
  );
}

export function CompareScreen({
  workspaceId,
  sketchId,
  sketchTitle,
  from,
  to,
  draftTab,
  draftOpen = false,
  layout: initialLayout = "side",
}: {
  workspaceId: string;
  sketchId: string;
  sketchTitle: string;
  from: number;
  to: number | "draft";
  /** with `to` "draft": the tab whose kept changes to compare (as "Kept work" offered them) */
  draftTab?: string;
  /** the changes are still open in the editor tab that opened this one (its save conflict's
   *  "Compare"): they are looked at here, and brought in or forked there */
  draftOpen?: boolean;
  /** the drawings side by side or overlaid, as the address says */
  layout?: "side" | "overlay";
}) {
  const router = useRouter();
  const versions = useVersions(sketchId);
  const a = useDocument(sketchId, from);
  const b = useDocument(sketchId, to, draftTab);
  const [units, setUnits] = useUnitsPreference();
  const [layout, setLayoutState] = useState<"side" | "overlay">(initialLayout);
  // the address keeps the choice, so a reload or a link sent to a colleague shows the same drawings
  const setLayout = (l: "side" | "overlay") => {
    setLayoutState(l);
    setAddressParam("drawings", l === "overlay" ? "overlay" : null);
  };
  const comparison = useMemo(() => (a.doc && b.doc ? compareSketches(a.doc, b.doc, units) : null), [a.doc, b.doc, units]);
  const base = `/workspaces/${workspaceId}/sketches/${sketchId}`;
  const go = (f: number, t: number | "draft") => router.replace(`${base}/compare?from=${f}&to=${t}${layout === "overlay" ? "&drawings=overlay" : ""}`);
  const toLabel = to === "draft" ? "your changes" : `v${to}`;
  // the fields you and a later version both changed, in words with both values (`clashList`)
  const clashes = b.merged && b.conflicts.length ? clashItems(b.conflicts, b.merged.sketch, b.merged.theirs, `v${b.merged.newest}`, units) : [];

  return (
    <div className="space-y-5">
      <div className="space-y-2">
        <Crumb href={base} parent={sketchTitle} here="Compare" />
        <h1 className="text-2xl font-semibold tracking-tight">
          Compare v{from} → {toLabel}
        </h1>
        <div className="flex flex-wrap items-end gap-3">
          <div className="w-44">
            <Select id="compare-from" label="Before" value={from} onChange={(e) => go(Number(e.target.value), to)}>
              {(versions.data?.versions ?? [{ number: from }]).map((v) => (
                <option key={v.number} value={v.number}>
                  v{v.number}
                </option>
              ))}
            </Select>
          </div>
          <div className="w-44">
            <Select id="compare-to" label="After" value={to} onChange={(e) => go(from, e.target.value === "draft" ? "draft" : Number(e.target.value))}>
              {to === "draft" ? <option value="draft">your kept changes</option> : null}
              {(versions.data?.versions ?? (to === "draft" ? [] : [{ number: to }])).map((v) => (
                <option key={v.number} value={v.number}>
                  v{v.number}
                </option>
              ))}
            </Select>
          </div>
          <Segmented
            label="Drawings"
            testId="compare-layout"
            value={layout}
            onChange={setLayout}
            options={[
              { value: "side", label: "Side by side" },
              { value: "overlay", label: "Overlaid", title: "The earlier version faint and grey under the later one, at the same scale" },
            ]}
          />
          <Segmented
            label="Units"
            testId="compare-units"
            value={units}
            onChange={setUnits}
            options={UNIT_OPTIONS}
          />
          {to === "draft" && b.doc && draftOpen ? (
            <div className="flex flex-wrap items-center gap-2 text-sm" data-testid="draft-open-elsewhere">
              <Clashes items={clashes} lead={`You and a later version both changed these, and bringing v${from} in keeps yours:`} />
              <p className="text-ink-soft">Your changes are still open in the editor tab you came from: go back there to bring v{from} in, or to save them as a fork. Nothing here changes them.</p>
            </div>
          ) : to === "draft" && b.doc ? (
            <div className="flex flex-wrap items-center gap-2 text-sm">
              <Clashes items={clashes} lead="You and a later version both changed these, and bringing your changes back uses yours:" />
              <a href={`/sketches/${sketchId}?restore=1&draft=${encodeURIComponent(b.tab ?? "")}`} className="rounded-md bg-ink px-3 py-2 font-medium text-paper hover:bg-ink-soft">
                Bring my changes back on top of the newest version
              </a>
              <button
                type="button"
                className="rounded-md px-3 py-2 text-ink-soft hover:text-ink"
                onClick={() => {
                  discardDraft(sketchId, b.tab);
                  router.push(base);
                }}
              >
                Discard them
              </button>
            </div>
          ) : null}
        </div>
      </div>

      {a.error || b.error ? <Notice tone="error">{a.error ?? b.error}</Notice> : null}
      {!comparison ? (
        a.pending || b.pending ? (
          <Skeleton className="h-96 w-full" />
        ) : null
      ) : (
        <>
          <p className="text-sm text-ink-soft" data-testid="compare-summary">
            {changeCount(comparison) === 0 ? "The inputs are the same." : `${changeCount(comparison)} change${changeCount(comparison) === 1 ? "" : "s"} in the inputs.`}{" "}
            {comparison.bodies.map((x) => (x.words ? `${x.label}: ${x.words}. ` : `${x.label}: ${x.after ?? "—"} (as before). `))}
          </p>
          {layout === "side" ? (
            <SideBySide before={a.doc!} after={b.doc!} beforeLabel={a.label ?? ""} afterLabel={b.label ?? ""} marks={comparison.marks} units={units} />
          ) : (
            <Overlay before={a.doc!} after={b.doc!} beforeLabel={a.label ?? ""} afterLabel={b.label ?? ""} marks={comparison.marks} units={units} />
          )}
          <p className="text-xs text-ink-faint">
            Outlines: dashed with △ changed, solid with + added, dotted with × removed. <span className="font-semibold text-caution">Caution:</span> {CAUTION_SHORT}
          </p>
          <Panel title="Reactions" description="Each support's reaction on the body, before and after: the resultant and how much it changed, then its components.">
            <ReactionsTable comparison={comparison} units={units} />
          </Panel>
          <Panel title="What changed" description={`Every input that differs, as written, with its value in ${units === "SI" ? "SI" : "US customary"} units.`}>
            <ChangesTable comparison={comparison} />
          </Panel>
        </>
      )}
    </div>
  );
}

type DrawingPair = {
  before: SketchFile;
  after: SketchFile;
  beforeLabel: string;
  afterLabel: string;
  marks: { before: Record<string, "removed" | "changed">; after: Record<string, "added" | "changed"> };
  units: UnitSystem;
};

/** One scale and origin, and one unit family, that hold both drawings, their labels and arrows, in `width` × `height`. */
function useSharedFrame(before: SketchFile, after: SketchFile, width: number, height: number, units: UnitSystem, legend: boolean) {
  const a = useSolved(before).result;
  const b = useSolved(after).result;
  const frame = useMemo(() => sharedFrame([{ file: before, result: a }, { file: after, result: b }], width, height, units, { legend }), [before, after, a, b, width, height, units, legend]);
  // one force unit for both drawings, so "0.9 kN" before does not read against "902 N" after
  const family = useMemo(() => drawingFamily([a, b], units), [a, b, units]);
  return { frame, family };
}

/** The two drawings side by side, in one frame: the same scale and origin, so a moved or resized
 *  part shows as moved, not as a drawing fitted differently. */
function SideBySide({ before, after, beforeLabel, afterLabel, marks, units }: DrawingPair) {
  const { frame, family } = useSharedFrame(before, after, 640, 400, units, true);
  return (
    // the captions share one row (a subgrid), so a message that wraps on one side does not push
    // that drawing down: the two frames stay level, as the one scale and origin mean them to be
    <div className="grid gap-4 lg:grid-cols-2 lg:grid-rows-[auto_auto] lg:gap-y-1" aria-label="The two drawings side by side" data-testid="compare-side-by-side">
      <figure className="space-y-1 lg:row-span-2 lg:grid lg:grid-rows-subgrid lg:space-y-0">
        <figcaption className="text-sm font-semibold">Before: {beforeLabel}</figcaption>
        <ReviewDrawing document={before} marks={marks.before} label={`Before: ${beforeLabel}`} width={640} height={400} units={units} frame={frame} family={family} />
      </figure>
      <figure className="space-y-1 lg:row-span-2 lg:grid lg:grid-rows-subgrid lg:space-y-0">
        <figcaption className="text-sm font-semibold">After: {afterLabel}</figcaption>
        <ReviewDrawing document={after} marks={marks.after} label={`After: ${afterLabel}`} width={640} height={400} units={units} frame={frame} family={family} />
      </figure>
    </div>
  );
}

/** Both drawings at one scale and origin: the earlier one faint and grey, the later one over it. */
function Overlay({ before, after, beforeLabel, afterLabel, marks, units }: DrawingPair) {
  // the layers write no legend
  const { frame, family } = useSharedFrame(before, after, 1280, 640, units, false);
  const removed = useMemo(() => Object.fromEntries(Object.entries(marks.before).filter(([, k]) => k === "removed")), [marks.before]);
  // the earlier drawing keeps the words of what was removed only: the rest of its labels would land
  // on the later drawing's (the tables give every value before and after)
  const removedIds = useMemo(() => Object.keys(removed), [removed]);
  return (
    <figure className="space-y-1" data-testid="compare-overlay">
      <figcaption className="text-sm">
        <span className="font-semibold">After: {afterLabel}</span> <span className="text-ink-soft">in full, over</span>{" "}
        <span className="font-semibold text-ink-soft">before: {beforeLabel}</span> <span className="text-ink-soft">drawn faint and grey, at the same scale (its labels left off but for what was removed; the tables give every value).</span>
      </figcaption>
      <Enlargeable naturalWidth={1280} label="The two drawings laid over each other">
        <div className="paper-sheet relative overflow-hidden rounded-md border border-rule bg-paper">
          <ReviewDrawing document={before} marks={removed} label={`Before: ${beforeLabel}`} width={1280} height={640} units={units} frame={frame} family={family} layer onlyLabelsOf={removedIds} className="opacity-40 grayscale" />
          <ReviewDrawing document={after} marks={marks.after} label={`After: ${afterLabel}`} width={1280} height={640} units={units} frame={frame} family={family} layer className="compare-over absolute inset-0" />
        </div>
      </Enlargeable>
    </figure>
  );
}
