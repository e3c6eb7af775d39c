"use client";
// Below the hand check's three sums: the factors of safety added up by hand. Against overturning,
// each load's moment about the pivot in two columns (restoring, overturning); against sliding,
// each bearing contact's μ·n beside the tangential force it carries. A contact carrying more
// than μ·n is marked, whatever the body as a whole does.
import { convert, type UnitSystem } from "@/solver/units";
import { handCheckNumber } from "@/solver/report";
import type { OverturningLines, SlidingLines, StabilityLines } from "./stabilityCheck";
import { BELOW_ONE, tipSlideOrder } from "./statusSentence";

interface Units {
  units: UnitSystem;
  force: string;
  moment: string;
}

const show = (u: Units, q: "force" | "moment", si: number) => `${handCheckNumber(convert(si, q, u.units, q === "force" ? u.force : u.moment).value)} ${q === "force" ? u.force : u.moment}`;
const ratio = (x: number) => (Number.isFinite(x) ? handCheckNumber(x) : "∞");
const verdict = (l: { factor: number; required: number; pass: boolean }, against: keyof typeof BELOW_ONE) =>
  l.pass ? `at least the required ${l.required}` : `below the required ${l.required}${l.factor < 1 ? ` (${BELOW_ONE[against]})` : ""}`;

/** The Σ row under a two-column check: each cell with its test id. */
function SumRow({ cells }: { cells: Array<[string, string]> }) {
  return (
    <tr className="font-semibold">
      <td>Σ</td>
      {cells.map(([id, text]) => (
        <td key={id} className="num w-px whitespace-nowrap pl-3 text-right" data-testid={id}>
          {text}
        </td>
      ))}
    </tr>
  );
}

function Overturning({ o, u }: { o: OverturningLines; u: Units }) {
  return (
    <section aria-label="Against overturning" data-testid="hand-overturning" className="min-w-0">
      <h4 className="mb-1 text-[12.5px] font-semibold text-ink">Against overturning about {o.about}</h4>
      <table className="w-full text-[12px]">
        <thead>
          <tr className="text-left text-ink-faint">
            <th className="font-normal">load</th>
            <th className="whitespace-nowrap pl-3 text-right font-normal">restoring</th>
            <th className="whitespace-nowrap pl-3 text-right font-normal">overturning</th>
          </tr>
        </thead>
        <tbody>
          {o.lines.map((l, i) => (
            <tr key={`${l.id}-${i}`} className="border-b border-dotted border-rule-soft" data-testid="turning-line">
              <td className="text-ink-soft" title={l.label}>
                {l.label}
              </td>
              <td className="num w-px whitespace-nowrap pl-3 text-right">{l.restoring ? show(u, "moment", l.restoring) : "—"}</td>
              <td className="num w-px whitespace-nowrap pl-3 text-right">{l.overturning ? show(u, "moment", l.overturning) : "—"}</td>
            </tr>
          ))}
          <SumRow cells={[["restoring-sum", show(u, "moment", o.restoring)], ["overturning-sum", show(u, "moment", o.overturning)]]} />
        </tbody>
      </table>
      <p className={`mt-0.5 text-[12px] ${o.pass ? "text-ink-soft" : "font-semibold text-caution"}`} data-testid="overturning-factor">
        factor = {show(u, "moment", o.restoring)} / {show(u, "moment", o.overturning)} = {ratio(o.factor)}, {verdict(o, "overturning")}
      </p>
    </section>
  );
}

function Sliding({ s, u }: { s: SlidingLines; u: Units }) {
  return (
    <section aria-label="Against sliding" data-testid="hand-sliding" className="min-w-0">
      <h4 className="mb-1 text-[12.5px] font-semibold text-ink">Against sliding{s.wholeBody ? " (the body as a whole)" : ""}</h4>
      <table className="w-full text-[12px]">
        <thead>
          <tr className="text-left text-ink-faint">
            <th className="font-normal">contact</th>
            <th className="whitespace-nowrap pl-3 text-right font-normal">μ · n</th>
            <th className="whitespace-nowrap pl-3 text-right font-normal">tangential t</th>
          </tr>
        </thead>
        <tbody>
          {s.lines.map((l) => (
            <tr key={l.id} className="border-b border-dotted border-rule-soft" data-testid="friction-line" data-over={l.over || undefined}>
              <td className="text-ink-soft" title={l.name}>
                {l.name}
              </td>
              <td className="num w-px whitespace-nowrap pl-3 text-right">
                {l.mu} × {show(u, "force", l.n)} = {show(u, "force", l.available)}
              </td>
              <td className={`num w-px whitespace-nowrap pl-3 text-right ${l.over ? "font-semibold text-caution" : ""}`}>
                {show(u, "force", l.t)}
                {l.over ? " ▲" : ""}
              </td>
            </tr>
          ))}
          <SumRow cells={[["available-sum", show(u, "force", s.available)], ["driving-sum", `|Σt| = ${show(u, "force", s.driving)}`]]} />
        </tbody>
      </table>
      <p className={`mt-0.5 text-[12px] ${s.pass ? "text-ink-soft" : "font-semibold text-caution"}`} data-testid="sliding-factor">
        {Number.isFinite(s.factor) ? `factor = Σμn / |Σt| = ${show(u, "force", s.available)} / ${show(u, "force", s.driving)} = ${ratio(s.factor)}, ${verdict(s, "sliding")}` : "no load tends to slide it"}
      </p>
    </section>
  );
}

export function StabilityCheck({ lines, units, force, moment }: { lines: StabilityLines } & Units) {
  const u = { units, force, moment };
  const o = lines.overturning;
  const s = lines.sliding;
  const order = tipSlideOrder(o, s);
  return (
    <div className="mt-3 border-t border-rule-soft pt-2" data-testid="hand-stability">
      <h3 className="mb-1 text-[12.5px] font-semibold text-ink">Factors of safety as drawn</h3>
      <p className="mb-2 text-[11.5px] text-ink-faint">
        Each load counts by its parts across and along the base about the pivot: a part that presses the body onto its base restores, a part that pushes it over overturns. Momentum flux counts as the body feels it, −ṁV at an outlet and +ṁV at an inlet.
      </p>
      {lines.overMu.length > 0 && (
        <p className="mb-2 text-[12px] font-semibold text-caution" data-testid="over-mu">
          ▲{" "}
          {lines.overMu
            .map((l) => `${l.name.charAt(0).toUpperCase()}${l.name.slice(1)} carries ${show(u, "force", Math.abs(l.t))} along its base, more than μ·n = ${l.mu} × ${show(u, "force", l.n)} = ${show(u, "force", l.available)}: alone it would slip`)
            .join("; ")}
          .
        </p>
      )}
      <div className="@container">
        <div className="grid grid-cols-1 gap-x-4 gap-y-3 @3xl:grid-cols-2">
          {"notApplicable" in o ? (
            o.notApplicable ? <p className="text-[12px] text-ink-soft" data-testid="hand-overturning">Against overturning: {o.notApplicable}.</p> : null
          ) : (
            <Overturning o={o} u={u} />
          )}
          {"notApplicable" in s ? (
            s.notApplicable ? <p className="text-[12px] text-ink-soft" data-testid="hand-sliding">Against sliding: {s.notApplicable}.</p> : null
          ) : (
            <Sliding s={s} u={u} />
          )}
        </div>
      </div>
      {order && (
        <p className="mt-2 text-[12px] font-semibold text-caution" data-testid="hand-which-first">
          {order.text}.
        </p>
      )}
    </div>
  );
}
