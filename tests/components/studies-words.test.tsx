// What the Cases and Sweep tabs say, beside their numbers: the case tables fit their panel with
// their keys outside the sideways scroll; a contact over its own μ on a body with friction to
// spare is footnoted; a sweep says where a contact is off the ground; the unit hint follows the
// parameter chosen; "In every case" names every case of a tie and says the searched value stands
// in for each case's own; the points are a whole number; the limit finder searches the range typed.
import { readFileSync } from "node:fs";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock, setUpSweep } from "./editor-helpers";
import { CaseTables } from "@/components/studies/CaseTables";
import { ReportTable } from "@/components/studies/ReportTable";
import { runLimit } from "@/canvas/studies/run";
import { parseSketch, solveCases } from "@/solver/index";
import { formatLimit } from "@/solver/limit";
import { G0 } from "@/solver/constants";
import { evaluateToNumber, evaluateTyped, kindOfUnit } from "@/solver/expressions";
import { unitExample } from "@/components/studies/SweepPanel";

const cart = () => JSON.parse(readFileSync("canvas/examples/washing-cart.json", "utf8"));

function studyOf(file: unknown) {
  const p = parseSketch(file);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return solveCases(p.file);
}

/** A 1 m box of 100 kg on two friction contacts at its bottom corners, μ = 0.1 and 0.9, pushed
 *  sideways by P along the line of the contacts (demo data). */
function twoGrips(P: string) {
  return {
    format: "counterpoise.sketch",
    version: 2,
    title: "two grips",
    parameters: { P },
    bodies: [{ id: "b", label: "crate", mass: "100 kg", cg: [0.5, 0.5], outline: [[0, 0], [1, 0], [1, 1], [0, 1]] }],
    supports: [
      { id: "A", label: "smooth foot", body: "b", kind: "contact", at: [0, 0], angle: 90, mu: 0.1 },
      { id: "B", label: "rubber foot", body: "b", kind: "contact", at: [1, 0], angle: 90, mu: 0.9 },
    ],
    loads: [{ id: "p", body: "b", kind: "force", at: [0.5, 0], fx: "P", fy: 0 }],
    ports: [],
    massSources: [],
  };
}

describe("the case tables", () => {
  it("fit the panel: one group of rows a case (no Case column), the key to ▲ / ▼ above and outside the sideways scroll", () => {
    const study = studyOf(cart());
    render(<CaseTables result={study} units="SI" />);
    const table = screen.getByTestId("case-reactions");
    const heads = within(table).getAllByRole("columnheader").map((h) => h.textContent);
    expect(heads[0]).toBe("Support");
    expect(heads.some((h) => h?.startsWith("Case"))).toBe(false);
    expect(within(table).getAllByRole("rowheader").map((h) => h.textContent)).toEqual(cart().cases.map((c: { name: string }) => c.name));
    // the key is a paragraph before the table, not inside the box that scrolls sideways
    const key = screen.getByText(/^▲ \/ ▼: the governing case of that component/);
    const scroller = table.closest(".overflow-x-auto")!;
    expect(scroller.contains(key)).toBe(false);
    expect(key.compareDocumentPosition(table) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    // the factors of safety: a group a case and body, so neither is a column
    const stability = screen.getByTestId("stability");
    const sHeads = within(stability).getAllByRole("columnheader").map((h) => h.textContent);
    expect(sHeads[0]).toBe("Against");
    expect(sHeads.some((h) => h === "Case" || h === "Body")).toBe(false);
    expect(within(stability).getAllByRole("rowheader")[0].textContent).toBe(`${cart().cases[0].name} — Washing cart`);
    // the envelope: a group a support
    expect(within(screen.getByTestId("envelope")).getAllByRole("rowheader").map((h) => h.textContent)).toEqual(["rear wheels (braked)", "front caster"]);
  });

  it("a caption is said above the table, outside its sideways scroll, and names the table for a screen reader", () => {
    render(<ReportTable table={{ id: "t", title: "T", columns: [{ key: "a", label: "A", align: "left" }], rows: [["x"]] }} fileName="t" testId="t" caption="Forces on the body from each support, as drawn." />);
    const table = screen.getByTestId("t");
    const caption = screen.getByTestId("t-caption");
    expect(table.closest(".overflow-x-auto")!.contains(caption)).toBe(false);
    expect(screen.getByRole("table", { name: "Forces on the body from each support, as drawn." })).toBe(table);
  });

  it("names every case of a tie for the governing value in the tables themselves, and once", () => {
    // two crews aim the lance alike: their cases give the same reactions
    const doc = cart();
    doc.cases = [
      { id: "a", name: "Aimed down, day crew", parameters: { theta: "-75 deg" } },
      { id: "b", name: "Aimed down, night crew", parameters: { theta: "-75 deg" } },
      { id: "off", name: "Pump off", flowFactor: 0 },
    ];
    render(<CaseTables result={studyOf(doc)} units="SI" />);
    const both = "Aimed down, day crew and Aimed down, night crew (equal)";
    // the envelope's governing case: both crews wherever one of them governs
    const envelope = screen.getByTestId("envelope");
    const governing = (support: string, component: string) =>
      [...envelope.querySelectorAll<HTMLElement>("tr[data-group]")].find((r) => r.dataset.group === support && r.querySelector("[data-col=component]")!.textContent === component)!.querySelector("[data-col=governs]")!.textContent;
    for (const c of ["Fx", "Fy", "Normal n", "Tangential t"]) expect(governing("rear wheels (braked)", c), c).toBe(both);
    expect(governing("front caster", "Margin")).toBe(both);
    // parked, the caster carries the most: the pump-off case alone governs its Fy
    expect(governing("front caster", "Fy")).toBe("Pump off");
    // the cases table marks both crews' rows, not only the first
    const rows = [...screen.getByTestId("case-reactions").querySelectorAll<HTMLElement>("tr[data-group]")];
    const rear = (group: string) => rows.find((r) => r.dataset.group === group && r.querySelector("[data-col=support]")!.textContent === "rear wheels (braked)")!;
    for (const g of ["Aimed down, day crew", "Aimed down, night crew"]) {
      expect(rear(g).querySelector("[data-col=fy]")!.textContent, g).toMatch(/^▲/);
      expect(rear(g).querySelector("[data-col=governs]")!.textContent, g).toMatch(/^design load; governs /);
    }
    expect(screen.getByTestId("design-loads").textContent).toContain(both);
    // said in the tables, so no separate list says it again
    expect(screen.queryByTestId("governing-ties")).toBeNull();
    expect(screen.getByText(/^Design load from — /).textContent).toBe(`Design load from — rear wheels (braked): ${both} · front caster: Pump off`);
  });

  it("footnotes a contact that slips while its body passes the sliding check (statics, common practice)", () => {
    // P = 200 N along the line of the feet: n = W/2 = 490.3 N at each, and the tangential springs
    // share P alike, t = 100 N each. The smooth foot needs 100 / 490.3 = 0.204 > μ = 0.1: it slips.
    // The body: Σ μ·n / |Σ t| = (0.1 + 0.9)·490.3 / 200 = 2.452 ≥ 1.5: it passes.
    const W = 100 * G0;
    const study = studyOf(twoGrips("200 N"));
    render(<CaseTables result={study} units="SI" />);
    const rows = [...screen.getByTestId("case-reactions").querySelectorAll<HTMLElement>("tr[data-group]")];
    const state = (name: string) => rows.find((r) => r.querySelector("[data-col=support]")!.textContent === name)!.querySelector("[data-col=state]")!;
    expect(state("smooth foot").textContent).toBe("slips*");
    expect(state("rubber foot").textContent).toBe("bearing");
    const sliding = [...screen.getByTestId("stability").querySelectorAll("tr")].find((r) => r.querySelector("[data-col=check]")?.textContent === "sliding")!;
    expect(Number(sliding.querySelector("[data-col=factor]")!.textContent)).toBeCloseTo((0.5 * W) / 200, 2);
    expect(sliding.querySelector("[data-col=verdict]")!.textContent).toBe("pass");
    expect(screen.getByTestId("slips-note").textContent).toMatch(/^\* slips: that contact needs more friction than its own μ gives \(\|t\| more than μ·n\), but its body as a whole holds: all its contacts together give the friction it needs/);
  });

  it("no footnote where the body fails the sliding check too: then it slides as a whole", () => {
    // P = 600 N: Σ μ·n / |Σ t| = 490.3 / 600 = 0.817, below 1.5 (and below 1: it slides)
    render(<CaseTables result={studyOf(twoGrips("600 N"))} units="SI" />);
    expect(screen.queryByTestId("slips-note")).toBeNull();
    expect(screen.getByTestId("case-reactions").textContent).not.toContain("*");
  });
});

describe("the Sweep tab's words", () => {
  it("says a contact is off the ground over the whole range, and why the friction margin has a gap", async () => {
    const user = userEvent.setup();
    mountResultsDock(cart());
    await setUpSweep(user, "theta", ["-58", "0", "30"]);
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    const list = await screen.findByTestId("crossings");
    // from −58° up the cart has tipped back off its front caster (it lifts at about −59°)
    expect(list.textContent).toContain("No margin crosses zero in this range.");
    expect(screen.getByTestId("off-stretch").textContent).toBe("front caster is off the ground over the whole range (theta from −58 to 0 deg): its margin stays below zero, so no crossing is marked.");
    expect(screen.getByTestId("not-held-stretch").textContent).toBe(
      "The friction margin at rear wheels (braked) is not plotted over the whole range (theta from −58 to 0 deg), where Washing cart tips: a body that is not held has no friction margin (its reactions are only what would hold it).",
    );
  });

  it("says from where to where over part of the range", async () => {
    const user = userEvent.setup();
    mountResultsDock(cart());
    await setUpSweep(user, "theta", ["-90", "0", "19"]);
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    await screen.findByTestId("crossings");
    expect(screen.getByTestId("off-stretch").textContent).toBe("front caster is off the ground from theta = −55 to 0 deg.");
  });

  it("the unit hint follows the parameter chosen, before any run", async () => {
    const user = userEvent.setup();
    mountResultsDock(cart());
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    const hint = screen.getByTestId("sweep-unit-hint");
    expect(hint.textContent).toBe("Numbers in deg, the unit theta is written in, or give a unit of the same kind (“0.3 rad”).");
    await user.selectOptions(screen.getByRole("combobox", { name: "Parameter to sweep" }), "p_pump");
    expect(hint.textContent).toBe("Numbers in bar, the unit p_pump is written in, or give a unit of the same kind (“150 psi”).");
    await user.selectOptions(screen.getByRole("combobox", { name: "Parameter to sweep" }), "flowFactor");
    expect(hint.textContent).toBe("The flow factor is a plain number (1: the flow as drawn). The flow factor scales mass flows (and velocities), not port gauge pressures: those are as entered; write them as expressions of a parameter if they change with flow.");
  });

  it("every unit hint's example reads as a value of the parameter's kind (2 tonne, not 2 t, which is no unit here)", () => {
    for (const unit of ["deg", "rad", "m", "mm", "m / s", "kg", "bar", "Pa", "kPa", "m^3 / s", "lps"]) {
      const example = unitExample(unit);
      const v = evaluateTyped(example);
      expect(typeof v === "number" ? null : kindOfUnit(v.formatUnits()), `${example} for ${unit}`).toBe(kindOfUnit(unit));
    }
    // 50 m³/h = 50/3600 m³/s (1 h = 3600 s, NIST SP 811)
    expect(evaluateToNumber(unitExample("m^3 / s"), "volumeFlow")).toBeCloseTo(50 / 3600, 15);
  });

  it("refuses points that are not a whole number, naming the field and keeping what was typed", async () => {
    const user = userEvent.setup();
    mountResultsDock(cart());
    await setUpSweep(user, "theta", ["-90", "0", "2.6"]);
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    expect(screen.getByRole("alert").textContent).toBe("Points: a whole number from 2 to 20,000.");
    expect(screen.getByRole("textbox", { name: "Points" })).toHaveValue("2.6");
    expect(screen.getByRole("textbox", { name: "Points" })).toHaveAttribute("aria-invalid", "true");
    expect(screen.queryByTestId("sweep-chart")).toBeNull();
  });

  it("the limit finder searches the range as typed now, and says the plot shows another", async () => {
    const user = userEvent.setup();
    mountResultsDock(cart());
    await setUpSweep(user, "theta", ["-90", "0", "19"]);
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    await screen.findByTestId("crossings");
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "margin at front caster");
    // the caster lifts at about −59°: from −50° on it is off the ground, so no crossing there
    await user.clear(screen.getByRole("textbox", { name: "From" }));
    await user.type(screen.getByRole("textbox", { name: "From" }), "-50");
    expect(screen.getByTestId("limit-range-note").textContent).toBe("Find searches theta from −50 to 0 deg, as typed now; the plot shows −90 to 0 deg (run the sweep to plot the new range).");
    await user.click(screen.getByRole("button", { name: "Find" }));
    // the cart tips all through (its caster would have to pull): no crossing, and the words say the
    // margin there is what the caster would need, −35.81 N at −50° (the case "Lance raised to −50°"
    // of the demo gives the same n); the ends say which way it goes (the caster bears again toward −59°)
    const answer = (await screen.findByTestId("limit-answer")).textContent!;
    expect(answer).toMatch(
      /^No crossing in this range: Washing cart is not held anywhere in it \(it tips, or nothing holds it, all through theta from −50 to 0 deg\); the margin at front caster there is what its supports would need, not a load they carry\. It comes closest at theta = −50\.00 deg, where it is −35\.81 N\. Below −50 deg it is still heading for 0 N: a straight line through the last samples reaches it near theta = −(\d+\.\d+) deg \(an extrapolation, not a finding\)\./,
    );
    const back = Number(/near theta = −(\d+\.\d+) deg/.exec(answer)![1]);
    expect(back).toBeGreaterThan(59);
    expect(back).toBeLessThan(62);
    expect(answer).toMatch(/Searched from −50 to 0 deg as typed now; the plot shows −90 to 0 deg\.$/);
  });

  it("In every case: names each case of a tie, and says the searched value stands in for the case's own", async () => {
    const user = userEvent.setup();
    const doc = cart();
    mountResultsDock(doc);
    await setUpSweep(user, "theta", ["-90", "0", "19"]);
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    await screen.findByTestId("crossings");
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "margin at front caster");
    await user.click(screen.getByRole("button", { name: "In every case" }));
    const box = await screen.findByTestId("limit-everywhere");
    // the cases "aimed down" and "raised" differ only in theta, which the search sets: they tie
    const front = { support: "front", component: "margin" as const };
    const one = (caseId: string) => runLimit(doc, { parameter: "theta", from: -90, to: 0, caseId, quantity: front, target: 0 });
    const [down, raised] = [one("aimed-down"), one("raised")];
    if (!down.found || !raised.found) throw new Error("the caster lifts in both");
    expect(raised.value).toBe(down.value);
    expect(within(box).getByRole("status").textContent).toMatch(
      new RegExp(`^The margin at front caster reaches 0 k?N first in Lance aimed down at −75° \\(tank foot\\) and Lance raised to −50°: equal first, each at theta = ${formatLimit(down.value)} deg\\.$`),
    );
    const rows = [...box.querySelectorAll("tbody tr")].map((tr) => tr.textContent);
    expect(rows.filter((r) => r?.endsWith("— equal first"))).toHaveLength(2);
    expect(screen.getByTestId("limit-everywhere-overrides").textContent).toBe(
      "Each is searched over theta from −90 to 0 deg: the searched value stands in for the theta a case sets itself (Lance aimed down at −75° (tank foot): −75 deg; Lance raised to −50°: −50 deg; Rinse at 150 bar, lance at −50°: −50 deg).",
    );
  });
});

describe("the Cases tab's fields", () => {
  it("a case's name shows whole (it wraps), and its id line is one line in every row", async () => {
    const user = userEvent.setup();
    mountResultsDock(cart());
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    const name = screen.getByRole("textbox", { name: "Name of case aimed-down" });
    expect(name.tagName).toBe("TEXTAREA");
    expect(name).toHaveValue("Lance aimed down at −75° (tank foot)");
    for (const line of screen.getAllByTestId("case-id-line")) {
      expect(line.className).toContain("whitespace-nowrap");
      expect(line.className).not.toContain("flex-wrap");
    }
    // Enter commits, and a line break is never part of a name
    await user.clear(name);
    await user.type(name, "Lance at the tank foot{Enter}");
    expect(name).toHaveValue("Lance at the tank foot");
  });
});
