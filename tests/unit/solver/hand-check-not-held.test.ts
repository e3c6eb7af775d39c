// The hand-check table's notes (printed on the calc sheet): the two sides of a body that tips agree
// only because the solve gave a contact the pull equilibrium needs; the note says so, as the panel does.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseSketch, solve } from "@/solver";
import { handCheckTable, notHeldAgreement } from "@/solver/report";

const solved = (file: string) => {
  const p = parseSketch(JSON.parse(readFileSync(`tests/fixtures/sketches/${file}`, "utf8")));
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return solve(p.sketch);
};

describe("hand-check notes of a body that is not held", () => {
  it("a stand that tips: the sums agree only with the reactions equilibrium would need", () => {
    const r = solved("thrust-stand-tips.json");
    const [id] = Object.keys(r.bodies);
    expect(r.bodies[id].status).toBe("tips");
    const agreeNote = handCheckTable(r, id, [0, 0], "SI").notes!.find((n) => n.startsWith("The two sides agree"));
    expect(agreeNote).toContain("ΣFx, ΣFy and ΣM only with the reactions equilibrium would need: the body is not held (it tips), a support here would have to give a force it cannot");
  });

  it("a body that holds keeps the plain note", () => {
    const r = solved("pipe-bend-anchor.json");
    const [id] = Object.keys(r.bodies);
    expect(r.bodies[id].status).toBe("holds");
    const agreeNote = handCheckTable(r, id, [0, 0], "SI").notes!.find((n) => n.startsWith("The two sides agree"));
    expect(agreeNote).toMatch(/^The two sides agree to 4 significant figures in ΣFx, ΣFy and ΣM[.;]/);
    expect(notHeldAgreement("holds")).toBe("");
  });
});
