// @vitest-environment jsdom
// Results on the drawing, by shape and word (never colour alone): a slack tie sags dashed with
// "slack", a slipping contact says "slips", an unrestrained body shows its free direction,
// momentum flux at a port is a dashed arrow labelled ṁV, the weight sits at the centre of gravity.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { solveFile, type SolveResult } from "@/solver/index";
import { renderSketchSvg } from "@/canvas/render/svg";

const fixture = (name: string) => JSON.parse(readFileSync(`tests/fixtures/sketches/${name}.json`, "utf8"));
const parse = (svg: string) => new DOMParser().parseFromString(svg, "image/svg+xml");

function drawn(name: string) {
  const doc = fixture(name);
  const result = solveFile(doc) as SolveResult;
  expect(result.ok, name).toBe(true);
  const svg = parse(renderSketchSvg(doc, result));
  return { result, svg, texts: [...svg.querySelectorAll("text")].map((t) => t.textContent ?? "") };
}

/** the element's own group, where its symbol and state are drawn */
const groupOf = (svg: Document, id: string) => svg.querySelector(`[data-id="${id}"]`)!;

describe("states on the drawing", () => {
  it("a slack tie: a dashed sagging line and the word", () => {
    const { result, svg } = drawn("exhaust-stack-guyed");
    const slack = Object.entries(result.reactions).find(([, r]) => r.state === "slack")![0];
    const g = groupOf(svg, slack);
    expect(g.textContent).toContain("slack");
    expect(g.querySelector("[stroke-dasharray]")).not.toBeNull();
    // the taut guy has neither
    const taut = Object.entries(result.reactions).find(([, r]) => r.kind === "tie" && r.state === "taut")![0];
    expect(groupOf(svg, taut).textContent).not.toContain("slack");
  });

  it("a slipping contact says so; a lifted contact shows the word 'lifts'", () => {
    const slip = drawn("pump-skid-slip");
    // each contact's own warning (the body's "slides as a whole" is said in its status, not on a symbol)
    const slipping = slip.result.warnings.filter((w) => w.code === "SLIP").flatMap((w) => w.ids).filter((id) => id !== "skid");
    expect(slipping.length).toBeGreaterThan(0);
    for (const id of slipping) expect(groupOf(slip.svg, id).textContent).toContain("slips");
    const lift = drawn("pump-set-hold-down");
    const lifted = Object.entries(lift.result.reactions).find(([, r]) => r.state === "lifted")![0];
    expect(groupOf(lift.svg, lifted).textContent).toContain("lifts");
  });

  it("an unrestrained body shows the direction nothing resists", () => {
    const { texts } = drawn("skid-on-rollers-unrestrained");
    expect(texts).toContain("free to move: nothing resists");
  });

  it("momentum flux at each port is a dashed arrow labelled ṁV with its unit; the weight is labelled W", () => {
    const { result, texts, svg } = drawn("pipe-bend-anchor");
    const flux = texts.filter((t) => /^ṁV [\d.,]+ k?N$/.test(t));
    expect(flux).toHaveLength(2);
    expect(svg.querySelectorAll(".results [stroke-dasharray]").length).toBeGreaterThanOrEqual(2);
    expect(result.bodies.bend.status).toBe("holds");
    // the bend is given no mass; the trailer has its weight drawn and labelled
    expect(texts.some((t) => /^W /.test(t))).toBe(false);
    expect(drawn("fire-monitor-trailer").texts.some((t) => /^W [\d.,]+ k?N$/.test(t))).toBe(true);
  });
});
