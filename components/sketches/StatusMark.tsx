// A solve status as a small drawn mark and its word, so it reads without colour.
import type { SketchStatus } from "@/lib/sketch-schemas";
import { formatNumber } from "@/solver/units";

/** A factor of safety below its required value, as the list keeps it. */
export type LowFactorMark = { check: "overturning" | "sliding"; body: string; factor: number; required: number; run: string };

const WORDS: Record<SketchStatus, { word: string; title: string; tone: string }> = {
  holds: { word: "holds", title: "Holds: every support within its limits", tone: "text-reaction" },
  lifts: { word: "lifts", title: "Lifts: a contact lifts off or a tie goes slack; the rest still hold the body", tone: "text-caution" },
  tips: { word: "tips", title: "Tips: the supports cannot hold the body without pulling", tone: "text-accent-deep" },
  unrestrained: { word: "unrestrained", title: "Unrestrained: the loads drive a motion no support resists", tone: "text-accent-deep" },
};

/** A block on a ground line, drawn as each status leaves it. */
function Glyph({ status }: { status: SketchStatus }) {
  const ground = <path d="M1 13.5h14" stroke="currentColor" strokeWidth="1.2" />;
  const shapes: Record<SketchStatus, React.ReactNode> = {
    holds: <rect x="4" y="6" width="8" height="7.5" fill="currentColor" />,
    lifts: (
      <>
        <rect x="4" y="4.5" width="8" height="6.5" fill="none" stroke="currentColor" strokeWidth="1.4" />
        <path d="M4 12.2v-1.2M12 12.2v-1.2" stroke="currentColor" strokeWidth="1" strokeDasharray="1 1" />
      </>
    ),
    tips: <path d="M5 13.5l6.2-3.6-3.4-6L1.6 7.5z" fill="none" stroke="currentColor" strokeWidth="1.4" strokeLinejoin="round" />,
    unrestrained: (
      <>
        <rect x="2" y="6" width="7" height="7.5" fill="none" stroke="currentColor" strokeWidth="1.4" />
        <path d="M10 9.5h5M13 7.5l2 2-2 2" fill="none" stroke="currentColor" strokeWidth="1.3" />
      </>
    ),
  };
  return (
    <svg width="16" height="16" viewBox="0 0 16 16" aria-hidden="true" className="shrink-0">
      {ground}
      {shapes[status]}
    </svg>
  );
}

/** "FoS 1.21 < 1.5": a body that holds may still be short of its required factor of safety (as
 *  drawn, or in a case); the list says so beside the status, the title names the check and run. */
export function LowFactorChip({ low }: { low: LowFactorMark }) {
  return (
    <span
      className="num ml-1.5 whitespace-nowrap rounded border border-caution/50 px-1 text-[11px] font-medium text-caution"
      title={`Factor of safety against ${low.check} of ${low.body} is ${formatNumber(low.factor, 4, { keepZeros: true })}, below the required ${formatNumber(low.required, 3)} (${low.run})`}
      data-testid="low-factor"
    >
      FoS {formatNumber(low.factor, 3, { keepZeros: true })} &lt; {formatNumber(low.required, 3)}
    </span>
  );
}

/** The mark of a body that bears on its contacts but needs more friction than they give. */
function SlipGlyph() {
  return (
    <svg width="16" height="16" viewBox="0 0 16 16" aria-hidden="true" className="shrink-0">
      <path d="M1 13.5h14" stroke="currentColor" strokeWidth="1.2" />
      <rect x="2" y="6" width="8" height="7.5" fill="none" stroke="currentColor" strokeWidth="1.4" />
      <path d="M11 9.5h4M13.5 8l1.5 1.5-1.5 1.5" fill="none" stroke="currentColor" strokeWidth="1.2" />
    </svg>
  );
}

const OVER_MU_TITLE = "One contact needs more friction than its own μ gives; the body as a whole has friction to spare.";
const SLIP_TITLE = "Slips: more friction is needed than the contacts give, so the body would slide.";

/**
 * The latest version's status. A body that holds but needs more friction than its contacts give
 * reads "slips" alone (as the results panel says it), never "holds"; with another status the slip
 * is said before it ("slips · lifts").
 */
export function StatusMark({ status, warnings = [] }: { status: SketchStatus | null; warnings?: string[] }) {
  if (!status) return <span className="text-ink-faint" title="No body to solve, or the solve did not finish">—</span>;
  const w = WORDS[status];
  const slips = warnings.includes("SLIP");
  if (slips && status === "holds")
    return (
      <span className="inline-flex items-center gap-1.5 whitespace-nowrap font-medium text-caution" title={`${SLIP_TITLE} Every contact bears.`} data-status="slips">
        <SlipGlyph />
        slips
      </span>
    );
  const overMu = !slips && warnings.includes("OVER_MU");
  return (
    <span className={`inline-flex items-center gap-1.5 whitespace-nowrap font-medium ${w.tone}`} title={slips ? `${SLIP_TITLE} ${w.title}` : overMu ? `${w.title}. ${OVER_MU_TITLE}` : w.title} data-status={status}>
      <Glyph status={status} />
      {slips ? <span className="text-caution">slips ·</span> : null}
      {w.word}
      {overMu ? <span className="text-caution">· over μ</span> : null}
    </span>
  );
}
