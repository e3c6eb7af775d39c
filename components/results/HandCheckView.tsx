"use client";
// "Hand check": ΣFx, ΣFy and ΣM about a point P, term by term, against the momentum flux out
// minus in — so a checker can follow the calculation line by line and compare with their own.
// P is picked on the canvas (the "Pick on the drawing" button) or typed.
import { useDeferredValue, useMemo, useState } from "react";
import { evaluateTyped, toFieldNumber } from "@/solver/expressions";
import { columnUnit, HAND_CHECK_FIGURES, handCheckNumber, handCheckScale, handCheckTable, unitFamily, type Scale } from "@/solver/report";
import { downloadCsv, useCsvName } from "@/components/studies/csv";
import { convert, type UnitSystem } from "@/solver/units";
import type { Status, Vec2 } from "@/solver/types";
import { useAnalysis, useEditor, useStores } from "@/canvas/context";
import { BUTTON, INPUT } from "@/components/editor/ui";
import { useActionRunner } from "@/components/editor/useActions";
import { useResultScale } from "./useHeldScale";
import { defaultMomentPoint, handCheckBlocks, handCheckText, type HandCheckBlock, type HandCheckLine } from "./handCheck";
import { StabilityCheck } from "./StabilityCheck";
import { STALE_CSV } from "./staleCsv";
import { stabilityLines } from "./stabilityCheck";

/**
 * A coordinate of P as typed: a length with its unit ("3 ft", "900 mm"), or a plain number in
 * the length unit on screen (feet in US units, metres in SI). Returns metres.
 */
export function parseLength(text: string, units: UnitSystem): number {
  const v = evaluateTyped(text.trim() || "0");
  return typeof v === "number" ? v / convert(1, "length", units).value : toFieldNumber(v, "length");
}

function Block({ b, units, unit, scale, status }: { b: HandCheckBlock; units: UnitSystem; unit: string; scale: Scale; status?: Status }) {
  // every number of the check by one rule (4 significant figures, trailing zeros kept): the points too
  const len = (v: number) => handCheckNumber(convert(v, "length", units).value);
  const lenUnit = convert(1, "length", units).unit;
  const text = handCheckText(b, scale, (v) => convert(v, b.key === "m" ? "moment" : "force", units, unit).value, unit, status);
  // where a term acts, in the moment block: r × F (or r × ṁV) is then a line a checker can redo;
  // "acting at", as a label may end in a place of its own ("pressure at “from pump”")
  const where = (t: HandCheckLine) =>
    b.key === "m" && t.at && !t.couple ? (
      <span className="text-ink-faint">
        , acting at ({len(t.at[0])}, {len(t.at[1])}) {lenUnit}
        {t.ownCouple ? `, with its couple ${handCheckNumber(convert(t.ownCouple, "moment", units, unit).value)} ${unit}` : ""}
      </span>
    ) : null;
  return (
    <section aria-label={b.title} className="min-w-0" data-testid={`hand-${b.key}`}>
      <h3 className="mb-1 text-[12.5px] font-semibold text-ink">{b.title}</h3>
      <ol className="space-y-[1px] text-[12px]">
        {b.forces.map((t, i) => (
          <li key={`${t.id}-${i}`} className="flex justify-between gap-2 border-b border-dotted border-rule-soft">
            <span className="truncate text-ink-soft" title={t.label}>
              {i > 0 ? "+ " : "  "}
              {t.label}
              {where(t)}
            </span>
            <span className="num shrink-0 text-ink" data-testid="term-value">
              {text.forces[i]}
            </span>
          </li>
        ))}
        <li className="flex justify-between gap-2 pt-0.5 font-semibold">
          <span>= Σ {b.key === "m" ? "moments" : "forces"} on the control volume</span>
          <span className="num" data-testid="forces-sum">
            {text.forcesSum}
          </span>
        </li>
        {b.momentum.map((t, i) => (
          <li key={`m-${t.id}-${i}`} className="flex justify-between gap-2 border-b border-dotted border-rule-soft">
            <span className="truncate text-ink-soft" title={t.label}>
              {t.label}
              {where(t)}
            </span>
            <span className="num shrink-0 text-ink">{text.momentum[i]}</span>
          </li>
        ))}
        <li className="flex justify-between gap-2 pt-0.5 font-semibold">
          {/* the moment block's momentum side is the moments of the flux about P, not the flux */}
          <span>{b.key === "m" ? "= Σ r × (ṁV)out − Σ r × (ṁV)in" : "= Σ(ṁV)out − Σ(ṁV)in"}</span>
          <span className="num" data-testid="momentum-sum">
            {text.momentumSum}
          </span>
        </li>
        <li className="flex justify-between gap-2 text-ink-faint">
          <span>difference (0 when it holds)</span>
          <span className="num" data-testid="imbalance">
            {text.difference}
          </span>
        </li>
        <li className="text-[11.5px] text-ink-faint" data-testid="hand-verdict">
          {text.verdict}
        </li>
      </ol>
    </section>
  );
}

export function HandCheckView() {
  const csvName = useCsvName();
  // deferred: a drag's frames come first, the panel catches up when the main thread is free
  const shown = useDeferredValue(useAnalysis((s) => s.shown));
  const numeric = useDeferredValue(useAnalysis((s) => s.shownSketch));
  const units = useEditor((s) => s.units);
  const picked = useEditor((s) => s.momentPoint);
  const stability = useDeferredValue(useAnalysis((s) => s.shownStability));
  const stale = useAnalysis((s) => s.stale);
  const { editor } = useStores();
  const run = useActionRunner();
  const bodies = numeric?.bodies ?? [];
  const [bodyId, setBodyId] = useState<string | null>(null);
  const body = bodies.find((b) => b.id === bodyId) ?? bodies[0];
  const eq = body && shown ? shown.equations[body.id] : undefined;
  const about: Vec2 = picked ?? defaultMomentPoint(eq, body?.cg);
  const blocks = useMemo(() => (eq ? handCheckBlocks(eq, about) : []), [eq, about]);
  // the check's largest force and moment: what floating-point noise is measured against
  const size = useMemo(() => (eq ? handCheckScale(eq, about) : undefined), [eq, about]);
  // the units: the whole result's (`resultScale`), as the reactions table and the drawing write it,
  // whichever body is checked; the arms to P do not choose them
  const scale = useResultScale();
  const unitsOfSums = useMemo(() => {
    const { force, moment } = scale ? unitFamily(units, scale) : { force: columnUnit("force", units), moment: columnUnit("moment", units) };
    return { fx: force, fy: force, m: moment };
  }, [scale, units]);
  const factors = useMemo(() => (numeric && shown && body ? stabilityLines(numeric, body.id, shown.reactions, stability?.[body.id]) : null), [numeric, shown, body, stability]);
  const [draft, setDraft] = useState<{ x: string; y: string } | null>(null);
  const [error, setError] = useState<{ field: "x" | "y"; message: string } | null>(null);
  // P set elsewhere (picked on the drawing, "Back to the first support"): a refused entry is moot
  const [pickedBefore, setPickedBefore] = useState(picked);
  if (pickedBefore !== picked) {
    setPickedBefore(picked);
    setDraft(null);
    setError(null);
  }
  if (!eq || !body) return <p className="p-2 text-[12.5px] text-ink-faint">No result to check yet.</p>;

  const lengthUnit = convert(1, "length", units).unit;
  /** Whether the typed point was taken; a refused one stays in its field, marked, to be put right. */
  const commitPoint = (x: string, y: string): boolean => {
    const p: number[] = [];
    for (const [k, text] of [["x", x], ["y", y]] as const) {
      try {
        p.push(parseLength(text, units));
      } catch (e) {
        setError({ field: k, message: `P${k}: ${(e as Error).message}` });
        return false;
      }
    }
    editor.getState().setMomentPoint(p as Vec2);
    setError(null);
    return true;
  };
  // in the length unit on screen, like the terms' positions
  const shownText = (m: number) => String(Number(convert(m, "length", units).value.toFixed(4)));
  // a field's draft starts from P as the store has it now: Px just taken (Tab to Py) has moved it
  // already, though this render's `about` is still the point before
  const startDraft = () => {
    const p = editor.getState().momentPoint ?? about;
    return { x: shownText(p[0]), y: shownText(p[1]) };
  };

  return (
    <div data-testid="hand-check">
      <div className="mb-2 flex flex-wrap items-end gap-2 text-[12px]">
        {bodies.length > 1 && (
          <label className="flex w-40 flex-col">
            <span className="text-ink-soft">Body</span>
            <select className={INPUT} value={body.id} onChange={(e) => setBodyId(e.target.value)}>
              {bodies.map((b) => (
                <option key={b.id} value={b.id}>
                  {b.label || b.id}
                </option>
              ))}
            </select>
          </label>
        )}
        <span className="pb-1.5 text-ink-soft">Moments about P =</span>
        {(["x", "y"] as const).map((k, i) => (
          <label key={k} className="flex w-28 flex-col">
            <span className="text-ink-faint" title={`${lengthUnit === "ft" ? "feet" : "metres"}, or a length with its unit (“${lengthUnit === "ft" ? "2 m" : "4 ft"}”)`}>
              P{k} ({lengthUnit})
            </span>
            <input
              className={INPUT}
              aria-label={`Moment point ${k}`}
              data-testid={`moment-${k}`}
              value={draft ? draft[k] : shownText(about[i])}
              aria-invalid={error?.field === k || undefined}
              aria-describedby={error?.field === k ? "moment-point-error" : undefined}
              onFocus={() => setDraft((d) => d ?? startDraft())}
              onChange={(e) => setDraft((d) => ({ ...(d ?? startDraft()), [k]: e.target.value }))}
              onBlur={() => {
                // what was typed stays when it is refused, beside the reason, never swapped for the old value
                if (!draft || commitPoint(draft.x, draft.y)) setDraft(null);
              }}
              onKeyDown={(e) => e.key === "Enter" && (e.target as HTMLInputElement).blur()}
            />
          </label>
        ))}
        <button type="button" className={BUTTON} onClick={() => run("results.pickPoint")}>
          Pick on the drawing
        </button>
        {picked && (
          <button type="button" className="pb-1.5 text-accent hover:underline" onClick={() => editor.getState().setMomentPoint(null)}>
            Back to the first support
          </button>
        )}
        {error && (
          <span id="moment-point-error" className="pb-1.5 text-caution">
            ⚠ {error.message}
          </span>
        )}
        <button
          type="button"
          className={`${BUTTON} ml-auto`}
          disabled={stale}
          title={stale ? STALE_CSV : undefined}
          aria-label="Download the hand check as CSV"
          onClick={() => shown && downloadCsv(handCheckTable(shown, body.id, about, units, { name: body.label?.trim() || body.id, scale }), csvName(`hand-check-${body.id}`))}
        >
          CSV
        </button>
      </div>
      <p className="mb-2 text-[11.5px] text-ink-faint">
        Steady flow through a control volume fixed to the body: ΣF = Σ(ṁV)out − Σ(ṁV)in and ΣM_P = Σ r × ṁV (each port&apos;s ṁV times its momentum-flux factor β when one is given). Forces in x and y, moments counter-clockwise positive. Every number to {HAND_CHECK_FIGURES} significant figures; each Σ adds the unrounded terms, so it may differ in its last figure from the printed terms added up.
      </p>
      {/* three sums side by side only where each has room for its terms' names; else one under another */}
      {/* faded like the reactions table while the result shown is an earlier sketch's */}
      <div className={`@container ${stale ? "opacity-60" : ""}`} data-testid="hand-sums" data-stale={stale || undefined}>
        <div className="grid grid-cols-1 gap-x-4 gap-y-3 @4xl:grid-cols-3">
          {blocks.map((b) => (
            <Block key={b.key} b={b} units={units} unit={unitsOfSums[b.key]} scale={size ?? { force: 0, moment: 0 }} status={shown?.bodies[body.id]?.status} />
          ))}
        </div>
        {factors && <StabilityCheck lines={factors} units={units} force={unitsOfSums.fx} moment={unitsOfSums.m} />}
      </div>
    </div>
  );
}
