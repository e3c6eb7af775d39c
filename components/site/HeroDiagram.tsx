// A static free-body diagram in the product's own symbols: a skid on two feet with a
// discharge jet. Applied loads are solid arrows; reactions are double-line arrows.
// Colours are the palette's tokens; the card it sits on is a light drawing sheet in every theme.
// Two layouts of one drawing: the wide one, and on a narrow card (a phone) the same shapes
// drawn smaller with fewer, larger labels, so they read at about 13 px.

function DoubleArrow({ x, y1, y2 }: { x: number; y1: number; y2: number }) {
  const dir = Math.sign(y2 - y1);
  return (
    <g className="stroke-reaction" fill="none" strokeWidth="1.6" data-testid="hero-reaction" data-x={x}>
      <path d={`M${x - 3} ${y1} V${y2 - dir * 10} M${x + 3} ${y1} V${y2 - dir * 10}`} />
      <path d={`M${x - 8} ${y2 - dir * 12} L${x} ${y2} L${x + 8} ${y2 - dir * 12}`} strokeLinejoin="round" />
    </g>
  );
}

/** The feet's centres, in the wide layout's coordinates. */
const FOOT_X = [138, 354] as const;
/**
 * The centre of gravity: where W = 8.34 kN must act for R₁ = 4.51 kN and R₂ = 4.27 kN with the
 * jet's ṁV = 440 N pushing down at the outlet (x = 231). Moments about the left foot:
 * 4.27 × 216 = 8.34 × (x − 138) + 0.44 × 93, so x = 243.7.
 */
const CG_X = 244;

/** Everything but the words, in the wide layout's coordinates. */
function Shapes() {
  return (
    <>
      {/* ground and hatching */}
      <path d="M40 300H480" className="stroke-ink" strokeWidth="1.4" />
      {Array.from({ length: 22 }, (_, i) => (
        <path key={i} d={`M${48 + i * 20} 300l-10 12`} className="stroke-ink-faint" strokeWidth="1" />
      ))}
      {/* control volume boundary */}
      <path d="M92 172V282H398V172H262V88H200V172Z" fill="none" className="stroke-accent" strokeDasharray="6 5" strokeWidth="1.2" />
      {/* body */}
      <path d="M100 180H390V274H100Z" className="fill-rule-soft stroke-ink" strokeWidth="1.6" />
      <path d="M208 96H254V180H208Z" className="fill-rule-soft stroke-ink" strokeWidth="1.6" />
      <circle cx="330" cy="226" r="26" className="fill-paper-deep stroke-ink" strokeWidth="1.2" />
      {/* feet */}
      <path d="M124 274h28l4 26h-36z" className="fill-rule stroke-ink" strokeWidth="1.2" />
      <path d="M340 274h28l4 26h-36z" className="fill-rule stroke-ink" strokeWidth="1.2" />
      {/* centre of gravity: quartered circle, where the labelled reactions put it (see CG_X) */}
      <g transform={`translate(${CG_X} 226)`} data-testid="hero-cg">
        <circle r="7" className="fill-paper-card stroke-ink" strokeWidth="1.2" />
        <path d="M0 -7A7 7 0 0 1 7 0H0Z M0 7A7 7 0 0 1 -7 0H0Z" className="fill-ink" />
      </g>
      {/* weight */}
      <g className="fill-ink stroke-ink" strokeWidth="2">
        <path d={`M${CG_X} 234V286`} />
        <path d={`M${CG_X - 6} 278L${CG_X} 292L${CG_X + 6} 278Z`} />
      </g>
      {/* outlet: hollow arrow across the boundary */}
      <path d="M231 96V44" className="stroke-ink" strokeWidth="1.4" data-testid="hero-outlet" />
      <path d="M224 58L231 40L238 58Z" className="fill-paper-card stroke-ink" strokeWidth="1.4" />
      <path d="M214 96h34" className="stroke-ink" strokeWidth="3" />
      {/* momentum flux: dashed */}
      <path d="M190 92V52" className="stroke-ink-soft" strokeDasharray="4 3" strokeWidth="1.4" />
      <path d="M185 62L190 48L195 62" fill="none" className="stroke-ink-soft" strokeWidth="1.4" />
      {/* reactions */}
      <DoubleArrow x={FOOT_X[0]} y1={360} y2={306} />
      <DoubleArrow x={FOOT_X[1]} y1={360} y2={306} />
    </>
  );
}

const TITLE = "Free-body diagram of a pump skid on two feet with a discharge jet: weight, momentum flux and the two reactions";

/** The drawing on a card 460 px wide or more: labels at 11–13 units of a 520-unit view. */
function Wide() {
  return (
    <svg viewBox="0 0 520 380" className="h-auto w-full" role="img" aria-labelledby="hero-fbd-title" data-testid="hero-diagram-wide">
      <title id="hero-fbd-title">{TITLE}</title>
      <Shapes />
      <text x="404" y="186" fontSize="11" className="fill-accent">
        control volume
      </text>
      <text x="314" y="231" fontSize="11" className="fill-ink-soft">
        pump
      </text>
      <text x={CG_X + 8} y="268" fontSize="13" fontWeight="600" className="fill-ink">
        W = 8.34 kN
      </text>
      <text x="244" y="48" fontSize="12" className="fill-ink">
        outlet · ṁ 14.2 kg/s · V 31 m/s
      </text>
      <text x="60" y="66" fontSize="12" className="fill-ink-soft">
        ṁV = 440 N
      </text>
      <text x="150" y="364" fontSize="13" fontWeight="600" className="fill-reaction">
        R₁ = 4.51 kN
      </text>
      <text x="366" y="364" fontSize="13" fontWeight="600" className="fill-reaction">
        R₂ = 4.27 kN
      </text>
    </svg>
  );
}

/**
 * The drawing on a narrow card (a phone's 326 px): the shapes at 0.72 of their size in a
 * 340-unit view, so a 14-unit label is about 13 px on screen; the outlet's words take two lines
 * and the reactions' values sit under their arrows.
 */
function Compact() {
  return (
    <svg viewBox="0 50 340 276" className="h-auto w-full" role="img" aria-labelledby="hero-fbd-title-compact" data-testid="hero-diagram-compact">
      <title id="hero-fbd-title-compact">{TITLE}</title>
      <g transform="translate(-12 40) scale(0.72)">
        <Shapes />
      </g>
      <g fontSize="14">
        <text x="274" y="156" textAnchor="end" className="fill-accent">
          control volume
        </text>
        <text x="226" y="207" fontSize="13" textAnchor="middle" className="fill-ink-soft">
          pump
        </text>
        <text x="150" y="232" textAnchor="end" fontWeight="600" className="fill-ink">
          W = 8.34 kN
        </text>
        <text x="164" y="70" className="fill-ink">
          outlet
        </text>
        <text x="164" y="88" className="fill-ink">
          ṁ 14.2 kg/s · V 31 m/s
        </text>
        <text x="118" y="96" textAnchor="end" className="fill-ink-soft">
          ṁV = 440 N
        </text>
        <text x="87" y="318" textAnchor="middle" fontWeight="600" className="fill-reaction">
          R₁ = 4.51 kN
        </text>
        <text x="243" y="318" textAnchor="middle" fontWeight="600" className="fill-reaction">
          R₂ = 4.27 kN
        </text>
      </g>
    </svg>
  );
}

/** Picks its layout by the width of the card it is in (a container query), not of the window. */
export function HeroDiagram() {
  return (
    <div className="@container">
      <div className="@max-[459px]:hidden">
        <Wide />
      </div>
      <div className="@min-[460px]:hidden">
        <Compact />
      </div>
    </div>
  );
}
