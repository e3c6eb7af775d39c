// A weightless 2 m × 1 m block on a pin at (0, 0) and a pad (a contact pushing up) at (2, 0), pushed
// sideways by P at its top (y = 1 m) and down by 10 kN at its middle. Moments about the pin
// (statics): the right end needs an upward force (10 kN·1 m + P·1 m)/2 m = (10 kN + P)/2.
// `more`: supports added to it (a keeper over the pad). Invented test data.
export function pinPadBlock(more: Array<Record<string, unknown>> = [], P = "2 kN") {
  return {
    format: "counterpoise.sketch",
    version: 3,
    parameters: { P },
    bodies: [{ id: "b", label: "block", outline: [[0, 0], [2, 0], [2, 1], [0, 1]], mass: 0 }],
    supports: [
      { id: "pin", label: "pin", body: "b", kind: "pin", at: [0, 0] } as Record<string, unknown>,
      { id: "pad", label: "pad", body: "b", kind: "contact", at: [2, 0], angle: 90 },
      ...more,
    ],
    loads: [
      { id: "push", body: "b", kind: "force", at: [0, 1], fx: "P", fy: 0 },
      { id: "down", body: "b", kind: "force", at: [1, 0.5], fx: 0, fy: "-10 kN" },
    ],
    ports: [],
    massSources: [],
  };
}
