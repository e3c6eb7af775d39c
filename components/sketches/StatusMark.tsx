// A solve status as a small drawn mark and its word, so it reads without colour.
import type { SketchStatus } from "@/lib/sketch-schemas";

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

export function StatusMark({ status, warnings = [] }: { status: SketchStatus | null; warnings?: string[] }) {
  if (!status) return <span className="text-ink-faint" title="No body to solve, or the solve did not finish">—</span>;
  const w = WORDS[status];
  const slips = warnings.includes("SLIP");
  return (
    <span className={`inline-flex items-center gap-1.5 whitespace-nowrap font-medium ${w.tone}`} title={slips ? `Slips: more friction is needed than the contacts give. ${w.title}` : w.title} data-status={status}>
      <Glyph status={status} />
      {slips ? <span className="text-caution">slips ·</span> : null}
      {w.word}
    </span>
  );
}
