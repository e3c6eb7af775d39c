// The results panel: the status sentence for every status and warning (the solver's worked
// examples), the hand check's sums against the solver's, and the force-on-body / load-on-support
// switch flipping every sign and saying so.
import { readFileSync, readdirSync } from "node:fs";
import { screen, within, act } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock } from "./editor-helpers";
import { handCheckSums, parseSketch, solve, type SolveResult, type Sketch } from "@/solver/index";
import { formatNumber, formatQuantity } from "@/solver/units";
import { statusSentences } from "@/components/results/statusSentence";
import { handCheckBlocks } from "@/components/results/handCheck";

const DIR = "tests/fixtures/sketches";
const load = (name: string) => JSON.parse(readFileSync(`${DIR}/${name}.json`, "utf8"));

function solved(doc: unknown): { sketch: Sketch; result: SolveResult } {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const result = solve(p.sketch);
  result.warnings.unshift(...p.warnings);
  return { sketch: p.sketch, result };
}

const f = (n: number) => formatQuantity(Math.abs(n), "force", "SI");

describe("status sentence", () => {
  it("holds: names the largest reaction and where", () => {
    const { sketch, result } = solved(load("pipe-bend-anchor"));
    const [s] = statusSentences(sketch, result);
    expect(s.tone).toBe("holds");
    expect(s.headline).toBe(`Holds — all supports within their limits; the largest reaction is ${f(result.bodies.bend.largestReaction)} at the anchor block`);
  });

  it("tips: the pivot, and the support that would have to pull, with the force", () => {
    const { sketch, result } = solved(load("thrust-stand-tips"));
    const [s] = statusSentences(sketch, result);
    expect(s.tone).toBe("tips");
    // hand check (W·d/h, common practice): the rear pad must pull (T·h − W·d)/b = (2200·1.5 − 1961·0.8)/1.6
    const pull = (2200 * 1.5 - 200 * 9.80665 * 0.8) / 1.6;
    expect(Math.abs(result.reactions.rear.n!)).toBeCloseTo(pull, 6);
    expect(s.headline).toBe(`Tips about the front pin — the rear pad would have to pull ${f(pull)}`);
  });

  it("tips with a tie: the tie would have to push", () => {
    const { sketch, result } = solved(load("exhaust-stack-one-guy-tips"));
    const [s] = statusSentences(sketch, result);
    expect(s.headline).toMatch(/^Tips about the base pin — the \w+ guy would have to push \d/);
  });

  it("unrestrained: the free direction and what to do", () => {
    const { sketch, result } = solved(load("skid-on-rollers-unrestrained"));
    expect(statusSentences(sketch, result)[0]).toMatchObject({ tone: "unrestrained", headline: "Unrestrained — nothing resists motion in x; add a support or a tie" });
  });

  it("a mechanism the loads do not drive: holds only as drawn, and says which motion is free", () => {
    const { sketch, result } = solved(load("skid-vertical-mechanism"));
    expect(statusSentences(sketch, result)[0].headline).toBe("Holds only as drawn — nothing resists motion in x, but the loads do not push that way; any load that does will move it");
  });

  it("a body balanced on one contact under its centre of gravity: held only as drawn, free to turn about the contact", () => {
    // a 4 m beam of 1 t on one frictionless contact right under its centre of gravity (invented)
    const doc = {
      format: "counterpoise.sketch",
      version: 6,
      title: "Balanced beam",
      parameters: {},
      bodies: [{ id: "b", label: "Beam", outline: [[0, 0], [4, 0], [4, 0.2], [0, 0.2]], mass: "1000 kg", cg: [2, 0.1] }],
      supports: [{ id: "A", label: "A", body: "b", kind: "contact", at: [2, 0], angle: 90 }],
      loads: [],
      ports: [],
      massSources: [],
    };
    const { sketch, result } = solved(doc);
    expect(result.bodies.b.status).toBe("holds");
    expect(statusSentences(sketch, result)[0].headline).toBe(
      "Holds only as drawn — nothing resists motion in x; nothing resists rotation about contact A (2, 0), but the loads do not push that way; any load that does will move it",
    );
  });

  it("slip leads, with the friction needed and the μ available, for the body as a whole and the worst contact", () => {
    const { sketch, result } = solved(load("pump-skid-slip"));
    const [s] = statusSentences(sketch, result);
    expect(s.tone).toBe("slips");
    const slipping = Object.entries(result.reactions).filter(([, r]) => r.friction && r.friction.needed > r.friction.mu);
    const worst = slipping.sort((a, b) => b[1].friction!.needed / b[1].friction!.mu - a[1].friction!.needed / a[1].friction!.mu)[0][1];
    // both feet over μ = 0.02 and the skid as a whole too (|Σt|/Σn = 0.025): it slides, the worse foot follows
    const f = result.bodies.skid.friction!;
    expect(f.needed).toBeGreaterThan(f.available);
    expect(s.headline).toMatch(new RegExp(`^Slips as a whole — .* \\(needs μ = ${Number(f.needed.toPrecision(3))} as a whole, has ${Number(f.available.toPrecision(3))}\\)$`));
    expect(s.details[0]).toMatch(new RegExp(`^Slips at the \\w+ foot — needs ${Number(worst.friction!.needed.toPrecision(3))}, has μ = ${worst.friction!.mu} \\(and at the \\w+ foot\\)`));
  });

  it("lifts, and a slack tie: who still holds the body", () => {
    const stack = solved(load("exhaust-stack-guyed"));
    const [s] = statusSentences(stack.sketch, stack.result);
    expect(s.tone).toBe("lifts");
    expect(s.headline).toMatch(/^The \w+ guy goes slack — the base pin and the \w+ guy still hold the body$/);
    // the slack guy carries nothing: the pin and the west guy that hold it are determinate
    expect(s.details[0]).toBe(
      "Statically determinate as solved: the east guy carries nothing, and the reactions of the supports that do follow from equilibrium alone, whatever their stiffnesses (as drawn, every support engaged, indeterminate of degree 1).",
    );
  });

  it("lifts, with the supports that still bear indeterminate: says so of them, the lifted one left out", () => {
    const trailer = solved(load("fire-monitor-trailer"));
    const [s] = statusSentences(trailer.sketch, trailer.result);
    expect(s.details[0]).toBe("Statically indeterminate (degree 1 with the supports that carry load, the front jack left out): the reactions depend on the support stiffnesses.");
  });

  it("lists the flow checks (inconsistent port, mass imbalance) and unitless trigonometry", () => {
    const fan = solved(load("ducted-fan-checks"));
    const [s] = statusSentences(fan.sketch, fan.result);
    expect(s.details.some((d) => /disagree by more than 0\.5 %/.test(d))).toBe(true);
    expect(s.details.some((d) => /mass in .* differs from mass out/.test(d))).toBe(true);
    const trig = solved(load("trig-unitless"));
    expect(statusSentences(trig.sketch, trig.result)[0].details.join(" ")).toMatch(/sin\(30\) reads 30 as radians: did you mean 30 deg\?/);
  });

  it("has a sentence for every worked example, in US units too", () => {
    for (const file of readdirSync(DIR).filter((n) => n.endsWith(".json"))) {
      const p = parseSketch(JSON.parse(readFileSync(`${DIR}/${file}`, "utf8")));
      if (!p.ok) continue;
      const out = statusSentences(p.sketch, solve(p.sketch), "US");
      expect(out.length, file).toBe(p.sketch.bodies.length);
      for (const s of out) expect(s.headline, file).toMatch(/^(.*: )?(Holds|Lifts|The |Tips|Slips|Slides|Unrestrained|Would move)/);
      for (const s of out) expect(s.headline, file).not.toMatch(/ kN| N\b/);
    }
  });
});

describe("hand check", () => {
  it("sums, term by term, to the solver's totals about any point, and the difference is zero", () => {
    const { result } = solved(load("fire-monitor-trailer"));
    const eq = result.equations.trailer;
    for (const P of [[0, 0], [1.2, 0.3], [-4, 7]] as [number, number][]) {
      const blocks = handCheckBlocks(eq, P);
      const sums = handCheckSums(eq, P);
      for (const b of blocks) {
        expect(b.forces.reduce((a, t) => a + t.value, 0)).toBeCloseTo(sums.forces[b.key], 6);
        expect(b.momentum.reduce((a, t) => a + t.value, 0)).toBeCloseTo(sums.momentum[b.key], 6);
        expect(Math.abs(b.imbalance)).toBeLessThan(1e-6 * (1 + Math.abs(b.forcesSum)));
      }
      // an independent check of the moment: Σ (r − P) × F over every force term
      const m = eq.forces.reduce((a, t) => a + (t.at ? (t.at[0] - P[0]) * t.fy - (t.at[1] - P[1]) * t.fx : 0) + t.m, 0);
      expect(blocks[2].forcesSum).toBeCloseTo(m, 6);
    }
  });
});

const mountDock = mountResultsDock;

const cells = (col: string) => [...document.querySelectorAll(`[data-testid=reactions] td[data-col=${col}]`)].map((c) => c.textContent!);
const num = (t: string) => (t === "—" ? null : Number(t.replace(/,/g, "").replace("−", "-")));

describe("results panel", () => {
  it("switches between force on the body and load on the support: every sign flips, and it says so", async () => {
    const user = userEvent.setup();
    mountDock(load("fire-monitor-trailer"));
    expect(screen.getByTestId("status-sentence")).toHaveTextContent(/lifts off at the front jack$/);
    const cols = ["fx", "fy", "m", "n", "t"];
    const before = Object.fromEntries(cols.map((c) => [c, cells(c).map(num)]));
    const dir = cells("angle").map(num);
    expect(screen.getByRole("caption")).toHaveTextContent("Forces on the body from each support");
    // the margin is said to be lift-off, not friction (a slipping contact still has a margin)
    expect(screen.getByRole("caption")).toHaveTextContent("t: the friction force along the contact's surface, positive 90° counter-clockwise from its normal n (a contact facing up: positive toward −x).");
    expect(screen.getByRole("caption")).toHaveTextContent("Margin: how far a bearing contact's normal force (a taut tie's tension) is from zero, where it lifts off (goes slack); one that has lifted or gone slack carries nothing and has none (—)");
    // the lifted jack carries nothing: no margin (the solver's −k·gap is no force), said under the table
    const jack = [...document.querySelectorAll("[data-testid=reactions] tr[data-support=jack] td")].map((c) => c.textContent);
    expect(jack.at(-2)).toBe("lifts");
    expect(jack.at(-1)).toBe("—");
    expect(screen.getAllByTestId("reactions-note").map((n) => n.textContent)).toEqual([
      "A lifted contact carries nothing, so it has no margin to show (—). At what value of a parameter it takes load again, the limit finder on its margin answers (Sweep tab).",
    ]);
    await user.click(within(screen.getByTestId("sense")).getByRole("radio", { name: "Load on the support" }));
    for (const c of cols) cells(c).map(num).forEach((v, i) => expect(v === null ? null : v + 0).toBe(before[c][i] === null ? null : -before[c][i]! + 0));
    cells("angle").map(num).forEach((a, i) => {
      if (a !== null) expect(Math.abs(((a - dir[i]! + 720) % 360) - 180)).toBeLessThan(0.1);
    });
    expect(screen.getByRole("caption")).toHaveTextContent("Loads on the supports: every reaction reversed, n and t too (a bearing contact's n is negative here)");
    expect(screen.getAllByTestId("reactions-note")[0]).toHaveTextContent("Loads on the supports are the reactions with the sign reversed");
  });

  it("shows the hand check's sums about the point picked", async () => {
    const user = userEvent.setup();
    const editor = mountDock(load("thrust-stand-tips"));
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    act(() => editor.getState().setMomentPoint([1.6, 0]));
    expect(screen.getByTestId("moment-x")).toHaveValue("1.6");
    const p = parseSketch(load("thrust-stand-tips"));
    const sums = handCheckSums(solve((p as { sketch: Sketch }).sketch).equations.stand, [1.6, 0]);
    expect(within(screen.getByTestId("hand-m")).getByTestId("forces-sum")).toHaveTextContent(`${formatNumber(sums.forces.m / 1000, 4, { keepZeros: true })} kN·m`);
    expect(within(screen.getByTestId("hand-fy")).getAllByTestId("term-value").length).toBeGreaterThan(2);
  });

  it("keeps cautions and the model's assumptions beside the results", () => {
    mountDock(load("pipe-bend-anchor"));
    const aside = screen.getByTestId("cautions");
    expect(aside).toHaveTextContent("reviewed by a qualified engineer");
    expect(aside).toHaveTextContent("water hammer");
    expect(aside).toHaveTextContent("Rigid body");
  });

  it("in a narrower window keeps the short caution on a line that opens to the same lists", () => {
    mountDock(load("pipe-bend-anchor"));
    const line = screen.getByTestId("cautions-line");
    // the summary is the one-line caution; the lists are inside the disclosure
    expect(line.querySelector("summary")).toHaveTextContent("reviewed by a qualified engineer");
    expect(line).toHaveTextContent("water hammer");
    expect(line).toHaveTextContent("Rigid body");
    // one labelled region: the line's lists do not repeat the aside's heading id
    expect(document.querySelectorAll("#cautions-title")).toHaveLength(1);
  });
});
