// A static free-body diagram in the product's own symbols: a skid on two feet with a
// discharge jet. Applied loads are solid arrows; reactions are double-line arrows.

function DoubleArrow({ x, y1, y2, label }: { x: number; y1: number; y2: number; label: string }) {
  const dir = Math.sign(y2 - y1);
  return (
    <g stroke="#1f5f7a" fill="none" strokeWidth="1.6">
      <path d={`M${x - 3} ${y1} V${y2 - dir * 10} M${x + 3} ${y1} V${y2 - dir * 10}`} />
      <path d={`M${x - 8} ${y2 - dir * 12} L${x} ${y2} L${x + 8} ${y2 - dir * 12}`} strokeLinejoin="round" />
      <text x={x + 12} y={y1 - dir * 4} fill="#1f5f7a" stroke="none" fontSize="13" fontWeight="600">
        {label}
      </text>
    </g>
  );
}

export function HeroDiagram() {
  return (
    <svg viewBox="0 0 520 380" className="h-auto w-full" role="img" aria-labelledby="hero-fbd-title">
      <title id="hero-fbd-title">
        Free-body diagram of a pump skid on two feet with a discharge jet: weight, momentum flux and the two reactions
      </title>
      {/* ground and hatching */}
      <path d="M40 300H480" stroke="#1d2329" strokeWidth="1.4" />
      {Array.from({ length: 22 }, (_, i) => (
        <path key={i} d={`M${48 + i * 20} 300l-10 12`} stroke="#5f6974" strokeWidth="1" />
      ))}
      {/* control volume boundary */}
      <path
        d="M92 172V282H398V172H262V88H200V172Z"
        fill="none"
        stroke="#b4462b"
        strokeDasharray="6 5"
        strokeWidth="1.2"
      />
      <text x="404" y="186" fontSize="11" fill="#b4462b">
        control volume
      </text>
      {/* body */}
      <path d="M100 180H390V274H100Z" fill="#e3dccd" stroke="#1d2329" strokeWidth="1.6" />
      <path d="M208 96H254V180H208Z" fill="#e3dccd" stroke="#1d2329" strokeWidth="1.6" />
      <circle cx="330" cy="226" r="26" fill="#efe9dd" stroke="#1d2329" strokeWidth="1.2" />
      <text x="314" y="231" fontSize="11" fill="#3d4650">pump</text>
      {/* feet */}
      <path d="M124 274h28l4 26h-36z" fill="#cfc8b8" stroke="#1d2329" strokeWidth="1.2" />
      <path d="M340 274h28l4 26h-36z" fill="#cfc8b8" stroke="#1d2329" strokeWidth="1.2" />
      {/* centre of gravity: quartered circle */}
      <g transform="translate(236 226)">
        <circle r="7" fill="#fbfaf6" stroke="#1d2329" strokeWidth="1.2" />
        <path d="M0 -7A7 7 0 0 1 7 0H0Z M0 7A7 7 0 0 1 -7 0H0Z" fill="#1d2329" />
      </g>
      {/* weight */}
      <g stroke="#1d2329" strokeWidth="2" fill="#1d2329">
        <path d="M236 234V286" />
        <path d="M230 278L236 292L242 278Z" />
      </g>
      <text x="244" y="268" fontSize="13" fontWeight="600" fill="#1d2329">W = 8.34 kN</text>
      {/* outlet: hollow arrow across the boundary */}
      <path d="M231 96V44" stroke="#1d2329" strokeWidth="1.4" />
      <path d="M224 58L231 40L238 58Z" fill="#fbfaf6" stroke="#1d2329" strokeWidth="1.4" />
      <path d="M214 96h34" stroke="#1d2329" strokeWidth="3" />
      <text x="244" y="48" fontSize="12" fill="#1d2329">outlet · ṁ 14.2 kg/s · V 31 m/s</text>
      {/* momentum flux: dashed */}
      <path d="M190 92V52" stroke="#3d4650" strokeDasharray="4 3" strokeWidth="1.4" />
      <path d="M185 62L190 48L195 62" fill="none" stroke="#3d4650" strokeWidth="1.4" />
      <text x="60" y="66" fontSize="12" fill="#3d4650">ṁV = 440 N</text>
      {/* reactions */}
      <DoubleArrow x={138} y1={360} y2={306} label="R₁ = 4.51 kN" />
      <DoubleArrow x={354} y1={360} y2={306} label="R₂ = 4.27 kN" />
    </svg>
  );
}
