"use client";
// One version under review: its drawing with comment pins, its reactions (and, when it has
// operating cases, their tables and envelope), the sign-off with the title block, and the comment
// threads. A link to "#thread-<id>" (the mention mail's) opens that thread.
import { useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useMemo, useState } from "react";
import { formatForceCell } from "@/components/sketches/format";
import { StatusMark } from "@/components/sketches/StatusMark";
import { Crumb, Notice, Panel, Segmented, Skeleton } from "@/components/shell/controls";
import { formatDateTime } from "@/components/workspaces/format";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import type { SketchStatus } from "@/lib/sketch-schemas";
import { CAUTION_SHORT } from "@/solver/cautions";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";
import { asDrawnTwin, reactionTable, stabilityTable, unitFamily } from "@/solver/report";
import { withoutColumn, withoutEmptyReactionColumns } from "@/canvas/studies/tables";
import { ReportTable } from "@/components/studies/ReportTable";
import { asDrawnOfDocument, studyOfDocument } from "@/lib/review/compare";
import { versionScaleOf } from "./versionScale";
import { elementLabels } from "@/lib/review/pin-words";
import { asDrawnName, belowRequired, CaseTables } from "@/components/studies/CaseTables";
import { CsvSubject } from "@/components/studies/csv";
import { versionConcerns, withOpenThreads } from "./concerns";
import { UNIT_OPTIONS, useUnitsPreference } from "@/components/sketches/useUnitsPreference";
import { CommentsPanel, type CommentsData } from "./Comments";
import { VersionSweeps } from "./VersionSweeps";
import { ReviewDrawing, useSolved, type PickedPin } from "./ReviewDrawing";
import { pinName } from "./drawingOverlay";
import { plainText } from "@/lib/review/comment-text";
import { SignOffPanel, type SignOffData } from "./SignOff";
import { ForkedFrom, type ForkOrigin } from "@/components/sketches/ForkedFrom";
import { CalcSheetLink } from "@/components/versions/CalcSheetLink";
import { RestoreDialog, type Restored } from "@/components/versions/RestoreDialog";

type VersionData = {
  version: { id: string; number: number; message: string; authorName: string | null; createdAt: string; status: SketchStatus | null; largestReaction: number | null; warnings: string[]; document: SketchFile };
};

/** The case of a document whose run is the document as drawn over again (`asDrawnTwin`), or null:
 *  its factors of safety are said once, under "<case name>, as drawn", as the calc sheet says them. */
export function asDrawnCase(document: SketchFile): { id: string; name: string } | null {
  const cases = studyOfDocument(document);
  const drawn = asDrawnOfDocument(document);
  const id = cases && drawn ? asDrawnTwin(cases, drawn) : null;
  const run = id ? cases!.runs.find((r) => r.id === id) : undefined;
  return run ? { id: run.id, name: run.name } : null;
}

export { versionScaleOf } from "./versionScale";

/** The version's reactions as drawn, in one unit a table (the rows the editor, the CSV and the calc
 *  sheet use), and its factors of safety as drawn (with cases, the cases' tables below carry each
 *  case's; the values on the drawing are a state of their own, unless a case is that state over
 *  again: then they are said once, with that case, "<case name>, as drawn"). */
export function VersionReactions({ document, units }: { document: SketchFile; units: UnitSystem }) {
  const { result, parsed } = useSolved(document);
  const scale = useMemo(() => versionScaleOf(document) ?? undefined, [document]);
  const study = useMemo(() => asDrawnOfDocument(document), [document]);
  const twin = useMemo(() => asDrawnCase(document), [document]);
  const hasCases = !!(document.cases?.length || document.combinations?.length);
  if (!result) return <Notice tone="error">This version does not solve{!parsed.ok ? `: ${parsed.errors[0]?.path} ${parsed.errors[0]?.message}` : "."}</Notice>;
  const names = Object.fromEntries(document.supports.map((s) => [s.id, s.label || s.id]));
  const stability = study && !twin ? { ...withoutColumn(stabilityTable(study, units, scale), "case"), ...(hasCases ? { title: "Factors of safety as drawn" } : {}) } : null;
  return (
    <>
      <ReportTable
        table={withoutEmptyReactionColumns(reactionTable(result, units, { names, scale }))}
        fileName="reactions"
        testId="version-reactions"
        caption="Forces on the body from each support, as drawn."
      />
      {stability ? (
        <section aria-label="Factors of safety" className="pt-2" data-testid="version-stability">
          <ReportTable table={stability} fileName="factors-of-safety" testId="stability" mark={belowRequired(stability)} />
        </section>
      ) : twin ? (
        <p className="pt-2 text-xs text-ink-soft" data-testid="version-stability-twin">
          Factors of safety as drawn: the case {twin.name} is the sketch as drawn, so they are given once, under “{asDrawnName(twin.name)}” in the operating cases below.
        </p>
      ) : null}
    </>
  );
}

/** The version's operating cases and combinations, all solved, as the editor's Cases tab shows them. */
export function VersionCases({ document, units }: { document: SketchFile; units: UnitSystem }) {
  // solved once per document: the sign-off findings read the same study
  const study = useMemo(() => (document.cases?.length || document.combinations?.length ? studyOfDocument(document) : null), [document]);
  // the case that is the sketch as drawn: its factors of safety are the drawing's, said once
  const twin = useMemo(() => (study ? asDrawnCase(document) : null), [study, document]);
  // the unit family of the page and of the version's calc sheet
  const scale = useMemo(() => (study ? (versionScaleOf(document) ?? undefined) : undefined), [study, document]);
  if (!study) return null;
  const n = study.runs.length;
  return (
    <section aria-label="Operating cases" className="space-y-2 pt-2" data-testid="version-cases">
      <h2 className="text-base font-semibold">Operating cases</h2>
      <p className="text-xs text-ink-soft">
        {n} {n === 1 ? "run" : "runs"} (cases and combinations, each solved as its own load set), as saved in this version.
      </p>
      <CaseTables result={study} units={units} asDrawn={twin?.id} sketch={document} scale={scale} />
    </section>
  );
}

const THREAD_HASH = /^#thread-([\w-]+)$/;

/** `canEdit`: the reader may save versions (the editor opens for editing; otherwise read only). */
export function VersionReview({ workspaceId, sketchId, sketchTitle, number, latest, viewerId, canEdit = true }: { workspaceId: string; sketchId: string; sketchTitle: string; number: number; latest: number; viewerId: string; canEdit?: boolean }) {
  const base = `/api/sketches/${sketchId}/versions/${number}`;
  const qc = useQueryClient();
  const version = useQuery({ queryKey: apiKey(base), queryFn: () => apiFetch<VersionData>(base), staleTime: Infinity });
  const signoff = useQuery({ queryKey: apiKey(`${base}/signoff`), queryFn: () => apiFetch<SignOffData>(`${base}/signoff`) });
  const comments = useQuery({ queryKey: apiKey(`${base}/comments`), queryFn: () => apiFetch<CommentsData>(`${base}/comments`) });
  // which version of the sketch stands approved: a later revision is not read as carrying its approval
  const sketchPath = `/api/sketches/${sketchId}`;
  const sketch = useQuery({ queryKey: apiKey(sketchPath), queryFn: () => apiFetch<{ sketch?: { approvedVersion?: number | null; latestVersion?: number; forkedFrom?: ForkOrigin | null } }>(sketchPath) });
  const approvedVersion = sketch.data?.sketch?.approvedVersion ?? null;
  // the latest as the server says it now (a save since the page was made counts)
  const newest = Math.max(latest, sketch.data?.sketch?.latestVersion ?? latest);
  const [restoring, setRestoring] = useState(false);
  const [restored, setRestored] = useState<Restored | null>(null);
  const [units, setUnits] = useUnitsPreference();
  const [pin, setPin] = useState<PickedPin | null>(null);
  const [picking, setPicking] = useState(false);
  // the selected thread is in the address, so a link opens it (the mention mail's does); the
  // threads come from the client's query, so the first render on the server shows none
  const [selected, setSelectedState] = useState<string | null>(() => (typeof window === "undefined" ? null : (THREAD_HASH.exec(window.location.hash)?.[1] ?? null)));
  const setSelected = (id: string | null) => {
    setSelectedState(id);
    window.history.replaceState(window.history.state, "", id ? `#thread-${id}` : window.location.pathname + window.location.search);
  };
  const doc = version.data?.version.document;
  // one force and one moment unit for the whole page, as its calc sheet writes them
  const family = useMemo(() => {
    const scale = doc ? versionScaleOf(doc) : null;
    return scale ? unitFamily(units, scale) : undefined;
  }, [doc, units]);
  const labels = useMemo(() => (doc ? elementLabels(doc) : {}), [doc]);
  const pins = useMemo(
    () =>
      (comments.data?.threads ?? []).flatMap((t, i) =>
        t.pin ? [{ threadId: t.id, n: i + 1, name: pinName(i + 1, t.comments[0], t.resolvedAt !== null, plainText), at: t.pin.kind === "element" ? { elementId: t.pin.elementId } : { point: t.pin.at }, resolved: t.resolvedAt !== null, selected: t.id === selected }] : [],
      ),
    [comments.data, selected],
  );
  const refresh = () => void qc.invalidateQueries({ queryKey: apiKey(`/api/sketches/${sketchId}`) });
  // what the version's own results say: a body not held, a slip, a factor of safety short
  const results = useMemo(() => (doc ? versionConcerns(doc, units, family?.force) : []), [doc, units, family]);
  // open threads on this and the other versions, as the sign-off reads them (refreshed with every comment change)
  const concerns = withOpenThreads(results, signoff.data?.openThreads ?? [], number);

  if (version.isError) return <Notice tone="error">{version.error instanceof ApiError ? version.error.message : "The version could not be loaded."}</Notice>;
  const v = version.data?.version;
  const sketchHref = `/workspaces/${workspaceId}/sketches/${sketchId}`;
  return (
    <div className="space-y-5">
      <div className="space-y-1.5">
        <Crumb href={sketchHref} parent={sketchTitle} here={`Version ${number}`} />
        <div className="flex flex-wrap items-start justify-between gap-3">
          <h1 className="text-2xl font-semibold tracking-tight">
            v{number}
            {v?.message ? <span className="font-normal text-ink-soft"> — {v.message}</span> : null}
          </h1>
          <div className="flex flex-wrap items-center gap-2 text-sm">
            <Segmented
              compact
              label="Units shown"
              testId="version-units"
              value={units}
              onChange={setUnits}
              options={UNIT_OPTIONS}
            />
            {number > 1 ? (
              <Link href={`${sketchHref}/compare?from=${number - 1}&to=${number}`} className="rounded-md border border-ink/20 px-3 py-1.5 font-medium hover:border-ink/45">
                Compare with v{number - 1}
              </Link>
            ) : null}
            {/* an earlier version: what has changed since, up to the latest */}
            {number < newest ? (
              <Link href={`${sketchHref}/compare?from=${number}&to=${newest}`} className="rounded-md border border-ink/20 px-3 py-1.5 font-medium hover:border-ink/45">
                Compare with v{newest} (latest)
              </Link>
            ) : null}
            <CalcSheetLink
              href={`/api/sketches/${sketchId}/versions/${number}/calc-sheet?units=${units}`}
              className="rounded-md border border-ink/20 px-3 py-1.5 font-medium hover:border-ink/45"
              title="A PDF of this version: title block, drawing, inputs, hand check, reactions per case, envelope, stability, sweeps, check record, method, assumptions and cautions"
              testId="version-calc-sheet"
            >
              Calc sheet (PDF)
            </CalcSheetLink>
            <Link href={number === newest ? `/sketches/${sketchId}` : `/sketches/${sketchId}?version=${number}`} className="rounded-md bg-ink px-3 py-1.5 font-medium text-paper hover:bg-ink-soft">
              {canEdit ? "Open in the editor" : "Open (read only)"}
            </Link>
          </div>
        </div>
        {/* a fork's every version says where the fork came from (the origin's review stays there) */}
        {sketch.data?.sketch?.forkedFrom ? <ForkedFrom origin={sketch.data.sketch.forkedFrom} /> : null}
        {v ? (
          <p className="flex flex-wrap items-center gap-x-3 text-sm text-ink-soft">
            <StatusMark status={v.status} warnings={v.warnings} />
            <span>largest reaction {formatForceCell(v.largestReaction, units, family?.force)}</span>
            <span>
              saved by {v.authorName ?? "a deleted account"}, {formatDateTime(v.createdAt)}
            </span>
            {number < newest ? (
              <Link href={`${sketchHref}/versions/${newest}`} className="text-caution underline decoration-caution/40 underline-offset-2 hover:decoration-caution">
                v{newest} is newer
              </Link>
            ) : null}
            {/* an older version: make it the latest again (a new version with its drawing) */}
            {number < newest && canEdit && !restored ? (
              <button type="button" onClick={() => setRestoring(true)} className="rounded-md border border-ink/20 px-2 py-0.5 text-[13px] font-medium text-ink hover:border-ink/45" data-testid="version-restore">
                Make v{number} the latest again…
              </button>
            ) : null}
          </p>
        ) : null}
        {restored ? (
          <div data-testid="restored-notice">
            <Notice tone="success">
              Saved v{restored.number} with the drawing of v{number}: it is the latest version now.{" "}
              <Link href={`${sketchHref}/versions/${restored.number}`} className="font-medium underline underline-offset-2">
                Open v{restored.number}
              </Link>
            </Notice>
          </div>
        ) : null}
        {restoring && v ? (
          <RestoreDialog
            sketchId={sketchId}
            sketchTitle={sketchTitle}
            version={v}
            latest={newest}
            onClose={() => setRestoring(false)}
            onRestored={(made) => {
              setRestoring(false);
              setRestored(made);
            }}
          />
        ) : null}
        {/* another version stands approved and this one is not: said as the calc sheet's "Revision" line says it */}
        {approvedVersion !== null && approvedVersion !== number && signoff.data && signoff.data.state !== "approved" ? (
          <p className="text-sm text-ink-soft" data-testid="approved-elsewhere">
            <Link href={`${sketchHref}/versions/${approvedVersion}`} className="font-medium text-reaction underline decoration-reaction/40 underline-offset-2">
              v{approvedVersion} is the approved version
            </Link>{" "}
            of this sketch. This version is not approved: v{approvedVersion}&apos;s approval does not carry over to it.
          </p>
        ) : null}
      </div>

      <Panel title="Sign-off" description="Prepared by one engineer, checked by another, approved by an owner.">
        {signoff.data ? <SignOffPanel data={signoff.data} path={`${base}/signoff`} number={number} concerns={concerns} versionHref={(n) => `${sketchHref}/versions/${n}`} onChanged={refresh} /> : <Skeleton className="h-24 w-full" />}
      </Panel>

      <div className="grid grid-cols-[minmax(0,1fr)] gap-5 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="min-w-0 space-y-3">
          {doc ? (
            <ReviewDrawing
              document={doc}
              pins={pins}
              picking={picking}
              onPick={(p) => {
                setPin(p);
                setPicking(false);
              }}
              onSelectThread={(id) => {
                setSelected(id);
                // the thread takes the focus, so a keyboard carries on there (reading it, replying)
                requestAnimationFrame(() => document.getElementById(`thread-${id}`)?.focus({ preventScroll: true }));
              }}
              units={units}
              family={family}
              label={`Drawing of version ${number} with its reactions and ${pins.length} comment pins`}
            />
          ) : (
            <Skeleton className="h-[420px] w-full" />
          )}
          <p className="text-xs text-ink-faint">
            <span className="font-semibold text-caution">Caution:</span> {CAUTION_SHORT}
          </p>
          {doc ? (
            <CsvSubject.Provider value={`${sketchTitle} v${number}`}>
              <VersionReactions document={doc} units={units} />
              <VersionCases document={doc} units={units} />
            </CsvSubject.Provider>
          ) : null}
          {doc ? (
            <VersionSweeps document={doc} units={units} />
          ) : null}
        </div>
        <aside aria-label="Comments" id="comments" className="scroll-mt-4">
          <h2 className="mb-2 text-base font-semibold">Comments</h2>
          {comments.data ? (
            <CommentsPanel
              data={comments.data}
              commentsPath={`${base}/comments`}
              viewerId={viewerId}
              labels={labels}
              pin={pin}
              picking={picking}
              onPicking={setPicking}
              onClearPin={() => setPin(null)}
              onPin={setPin}
              selected={selected}
              onSelect={setSelected}
              onChanged={refresh}
              versionHref={(n) => `${sketchHref}/versions/${n}`}
            />
          ) : (
            <Skeleton className="h-40 w-full" />
          )}
        </aside>
      </div>
    </div>
  );
}
