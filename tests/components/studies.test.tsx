// The Cases and Sweep tabs: the case table equals the cases solved one by one, with the governing
// case marked; a sweep plots and marks the crossing; the limit finder answers in words.
import { readFileSync } from "node:fs";
import { act, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock, renderEditor, setUpSweep } from "./editor-helpers";
import { parseSketch, solve, solveCases } from "@/solver/index";
import { formatLimit } from "@/solver/limit";

const load = (n: string) => JSON.parse(readFileSync(`tests/fixtures/sketches/${n}.json`, "utf8"));

const mount = mountResultsDock;

const num = (t: string) => Number(t.replace(/[,▲▼]/g, "").replace("−", "-"));

/** The trailer with a weight-only case, a jet-only case and their factored combination "Factored". */
function trailerWithLoadCases() {
  const file = load("fire-monitor-trailer");
  file.cases = [
    { id: "dead", name: "Dead", factors: { flow: 0 } },
    { id: "jet", name: "Jet", factors: { dead: 0 } },
  ];
  file.combinations = [{ id: "k", name: "Factored", terms: [{ case: "dead", factor: 0.9 }, { case: "jet", factor: 1.4 }] }];
  return file;
}

describe("Cases tab", () => {
  it("refuses a group no load is in, and does not run while a field holds text it refused", async () => {
    const user = userEvent.setup();
    const editor = mount(load("fire-monitor-trailer"));
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Add a case" }));
    const factors = screen.getByRole("textbox", { name: /Group factors of/ });
    // the trailer's weights are in "dead", its jet's port in "flow": "flwo" is a typo
    await user.type(factors, "flwo 2{Enter}");
    expect(screen.getByRole("alert")).toHaveTextContent('no load is in group "flwo"; the sketch\'s groups are dead, flow');
    expect(editor.getState().sketch.cases![0].factors).toBeUndefined();
    const run = screen.getByRole("button", { name: "Run all cases" });
    expect(run).toBeDisabled();
    expect(screen.getByTestId("cases-refused")).toHaveTextContent("Put right the field marked in error first (Group factors of Normal operation)");
    await user.clear(factors);
    await user.type(factors, "Flow 2{Enter}");
    expect(screen.getByRole("alert")).toHaveTextContent('did you mean "flow"?');
    await user.clear(factors);
    await user.type(factors, "flow 2{Enter}");
    expect(editor.getState().sketch.cases![0].factors).toEqual({ flow: 2 });
    expect(screen.queryByTestId("cases-refused")).toBeNull();
    expect(screen.getByRole("button", { name: "Run all cases" })).toBeEnabled();
  });

  it("marks a case as a load case solved only in combinations: it leaves the case table", async () => {
    const user = userEvent.setup();
    const file = trailerWithLoadCases();
    const editor = mount(file);
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("checkbox", { name: "Dead: only in combinations" }));
    await user.click(screen.getByRole("checkbox", { name: "Jet: only in combinations" }));
    expect(editor.getState().sketch.cases!.map((c) => c.onlyInCombinations)).toEqual([true, true]);
    await user.click(screen.getByRole("button", { name: "Run all cases" }));
    const table = await screen.findByTestId("case-reactions");
    expect(within(table).queryByText("Jet")).toBeNull();
    expect(within(table).getAllByText("Factored").length).toBeGreaterThan(0);
    // unticked, the case is solved on its own again
    await user.click(screen.getByRole("checkbox", { name: "Jet: only in combinations" }));
    expect(editor.getState().sketch.cases![1]).not.toHaveProperty("onlyInCombinations", true);
    // the combination's own required factor of safety; blank gives the sketch's back
    const own = screen.getByRole("textbox", { name: "Required factor against overturning in Factored" });
    expect(own).toHaveAttribute("placeholder", "1.5");
    await user.type(own, "1{Enter}");
    expect(editor.getState().sketch.combinations![0].stability).toEqual({ overturning: 1 });
    await user.clear(own);
    await user.type(own, "{Enter}");
    expect(editor.getState().sketch.combinations![0]).not.toHaveProperty("stability");
  });

  it("removing a case used by a combination takes its term along, says so, and Undo brings it back", async () => {
    const user = userEvent.setup();
    const file = trailerWithLoadCases();
    file.sweeps = [{ id: "s", parameter: "theta", from: 0, to: 60, points: 11, case: "jet" }];
    const editor = mount(file);
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Remove case Jet" }));
    expect(screen.getByTestId("removed-note").textContent).toBe("Removed case Jet, and with it its term in Factored, a kept sweep run on it. Undo brings them back.");
    expect(editor.getState().sketch.combinations).toEqual([{ id: "k", name: "Factored", terms: [{ case: "dead", factor: 0.9 }] }]);
    expect(editor.getState().sketch).not.toHaveProperty("sweeps");
    // the sketch still reads, and runs
    await user.click(screen.getByRole("button", { name: "Run all cases" }));
    expect(within(await screen.findByTestId("case-reactions")).getAllByText("Factored").length).toBeGreaterThan(0);
    act(() => editor.getState().undo());
    expect(editor.getState().sketch.cases!.map((c) => c.id)).toEqual(["dead", "jet"]);
    expect(editor.getState().sketch.sweeps).toHaveLength(1);
    // the note said what Undo would bring back: once it has, the note is gone
    expect(screen.queryByTestId("removed-note")).toBeNull();
  });

  it("warns of a saved factor whose group no load is in any more", async () => {
    const user = userEvent.setup();
    const file = load("fire-monitor-trailer");
    file.cases = [{ id: "gust", name: "Gust", factors: { wind: 1.5 } }];
    mount(file);
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    expect(screen.getByTestId("case-warning")).toHaveTextContent('Case Gust scales load group "wind", which no load is in, so that factor changes nothing (the sketch\'s groups: dead, flow).');
  });

  it("adds cases in the table, runs them, and the table equals the cases solved one by one", async () => {
    const user = userEvent.setup();
    const editor = mount(load("fire-monitor-trailer"));
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Add a case" }));
    await user.click(screen.getByRole("button", { name: "Add a case" }));
    const changes = screen.getAllByRole("textbox", { name: /Parameter changes of/ });
    await user.type(changes[0], "theta = 15 deg{Enter}");
    await user.type(changes[1], "theta = 60 deg{Enter}");
    const names = screen.getAllByRole("textbox", { name: /Name of case/ });
    await user.clear(names[1]);
    await user.type(names[1], "High throw{Enter}");
    const doc = editor.getState().sketch;
    expect(doc.cases).toEqual([
      { id: "normal-operation", name: "Normal operation", parameters: { theta: "15 deg" } },
      { id: "case-2", name: "High throw", parameters: { theta: "60 deg" } },
    ]);
    await user.click(screen.getByRole("button", { name: "Run all cases" }));
    const table = await screen.findByTestId("case-reactions");
    // one by one, independently: parse the file with each override and solve
    const one = (theta: string) => {
      const p = parseSketch({ ...load("fire-monitor-trailer"), parameters: { ...load("fire-monitor-trailer").parameters, theta } });
      if (!p.ok) throw new Error();
      return solve(p.sketch);
    };
    const expected = [one("15 deg"), one("60 deg")];
    // one group of rows a case, headed by its name (the table fits its panel without a Case column)
    expect(within(table).getAllByRole("rowheader").map((h) => h.textContent)).toEqual(["Normal operation", "High throw"]);
    const rows = [...table.querySelectorAll<HTMLElement>("tbody tr[data-group]")];
    expect(rows).toHaveLength(6);
    // rows name the supports by their labels
    const idOf = (label: string) => load("fire-monitor-trailer").supports!.find((s: { id: string; label?: string }) => (s.label || s.id) === label)!.id as string;
    rows.forEach((row, i) => {
      const c = expected[Math.floor(i / 3)];
      const support = idOf(row.querySelector("[data-col=support]")!.textContent!);
      const fy = num(row.querySelector("[data-col=fy]")!.textContent!);
      expect(fy).toBeCloseTo(c.reactions[support].fy / 1000, 2);
    });
    // the governing case of each support is the one with its largest resultant
    const parsedDoc = parseSketch(doc);
    if (!parsedDoc.ok) throw new Error();
    const study = solveCases(parsedDoc.file);
    const nameOf = (id: string) => study.runs.find((r) => r.id === id)!.name;
    for (const [support, env] of Object.entries(study.envelope)) {
      const design = rows.filter((r) => idOf(r.querySelector("[data-col=support]")!.textContent!) === support && r.querySelector("[data-col=governs]")!.textContent!.startsWith("design load"));
      expect(design).toHaveLength(1);
      expect(design[0].dataset.group).toBe(nameOf(env.design.case));
      // the governing case of Fy is marked in its cell by shape, with words for a screen reader
      const govFy = rows.find((r) => idOf(r.querySelector("[data-col=support]")!.textContent!) === support && r.dataset.group === nameOf(env.governing.fy!))!;
      const mark = within(govFy.querySelector<HTMLElement>("[data-col=fy]")!).getByRole("img");
      expect(mark.textContent).toMatch(/^[▲▼]$/);
      expect(mark.getAttribute("aria-label")).toMatch(/^governing case of Fy: the largest magnitude over the cases \((its maximum|its minimum)\)$/);
    }
    // the envelope names the case of the jack's smallest margin: where it comes closest to lifting
    const envelope = screen.getByTestId("envelope");
    const jackMargin = within(envelope).getAllByRole("row").find((r) => r.dataset.group === "front jack" && r.querySelector("[data-col=component]")?.textContent === "Margin")!;
    expect(jackMargin.querySelector("[data-col=minCase]")!.textContent).toBe(nameOf(study.envelope.jack.components.margin!.min.case));
    // the line under the factors of safety names the supports by their labels too
    expect(screen.getByText(/^Design load from — /).textContent).toContain(`front jack: ${nameOf(study.envelope.jack.design.case)}`);
    expect(screen.getByTestId("stability").textContent).toMatch(/overturning/);
    expect(screen.getByTestId("stability").textContent).toMatch(/kN·m/);
  });

  it("a wrong parameter name is an error at the field, and nothing changes", async () => {
    const user = userEvent.setup();
    const editor = mount(load("fire-monitor-trailer"));
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Add a case" }));
    // the field's example is one of the sketch's own parameters
    expect(screen.getByRole("textbox", { name: /Parameter changes of/ }).getAttribute("placeholder")).toMatch(/^rho = \d/);
    await user.type(screen.getByRole("textbox", { name: /Parameter changes of/ }), "phi = 3 deg{Enter}");
    expect(screen.getByRole("alert").textContent).toBe('the sketch has no parameter "phi" (it has rho, Q, d, theta)');
    expect(editor.getState().sketch.cases![0].parameters).toBeUndefined();
  });

  it("a value in the wrong unit is refused at the field, naming the unit the sketch gives, and nothing changes", async () => {
    const user = userEvent.setup();
    const editor = mount(load("fire-monitor-trailer"));
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Add a case" }));
    // Q is the nozzle's volume flow: a pressure cannot stand in for it
    await user.type(screen.getByRole("textbox", { name: /Parameter changes of/ }), "Q = 38 psi{Enter}");
    expect(screen.getByRole("alert").textContent).toBe("Q = 38 psi is a pressure, but the sketch gives Q in gpm, a volume flow");
    expect(editor.getState().sketch.cases![0].parameters).toBeUndefined();
    expect(screen.getByRole("button", { name: "Run all cases" })).toBeDisabled();
  });
});

describe("combinations that count a load group twice", () => {
  it("warns in the combination's row; single-group cases do not", async () => {
    const user = userEvent.setup();
    const doc = {
      ...load("fire-monitor-trailer"),
      version: 3,
      cases: [
        { id: "normal", name: "Normal duty" },
        { id: "test", name: "Test", parameters: { Q: "2500 gpm" } },
        { id: "dead", name: "Dead", factors: { flow: 0 } },
        { id: "flow", name: "Flow", factors: { dead: 0 } },
      ],
      combinations: [
        { id: "bad", name: "Bad", terms: [{ case: "normal", factor: 1.2 }, { case: "test", factor: 1.5 }] },
        { id: "good", name: "Good", terms: [{ case: "dead", factor: 1.2 }, { case: "flow", factor: 1.5 }] },
      ],
    };
    mount(doc);
    const container = document.body;
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    const bad = container.querySelector("[data-combination=bad]")!;
    const notes = within(bad as HTMLElement).getAllByRole("note").map((n) => n.textContent);
    // the weights 1.2 + 1.5 = 2.7 times, the flow too; the cases named as the table names them
    // (a case's id stays what it was made as, "normal", when it is renamed "Normal duty")
    expect(notes[0]).toMatch(/^⚠ Load group "dead" \(the weights\) is in Normal duty \(× 1\.2\) and Test \(× 1\.5\): it is counted 2\.7 times\./);
    expect(notes[1]).toMatch(/^⚠ Load group "flow" is in Normal duty \(× 1\.2\) and Test \(× 1\.5\)/);
    expect(within(container.querySelector("[data-combination=good]") as HTMLElement).queryAllByRole("note")).toHaveLength(0);
  });
});

describe("cases in which the body is not held", () => {
  it("says on screen that a tipping case is not in the envelope", async () => {
    const user = userEvent.setup();
    mount({ ...load("fire-monitor-trailer"), version: 3, cases: [{ id: "normal", name: "Normal" }, { id: "flood", name: "Flood flow", parameters: { Q: "4000 gpm" } }] });
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Run all cases" }));
    const note = await screen.findByTestId("not-in-envelope");
    expect(note.textContent).toMatch(/^⚠ Flood flow — Trailer tips: not in the envelope or the design loads; the body is not held in this case/);
    expect(within(screen.getByTestId("envelope")).queryByText("Flood flow")).toBeNull();
  });
});

/** A post on a fixed base at x = 1 m with a load fy at x = a on its top. */
const post = (fy: number) => ({
  format: "counterpoise.sketch",
  version: 3,
  parameters: { a: "0.5 m" },
  bodies: [{ id: "p", outline: [[0, 0], [2, 0], [2, 1], [0, 1]], mass: 0 }],
  supports: [{ id: "base", body: "p", kind: "fixed", at: [1, 0] }],
  loads: [{ id: "w", body: "p", kind: "force", at: ["a", 1], fx: 0, fy }],
  ports: [],
  massSources: [],
});

/** Sweep a from 0 to 2 m in 21 points (or the range given), plotting the base moment. */
async function sweepPostMoment(user: ReturnType<typeof userEvent.setup>, range: [string, string, string] = ["0", "2", "21"]) {
  await setUpSweep(user, "a", range);
  await user.click(screen.getByRole("checkbox", { name: "base: moment" }));
  await user.click(screen.getByRole("button", { name: "Run the sweep" }));
}

/** The limit finder run for a target typed in its box. */
async function findLimit(user: ReturnType<typeof userEvent.setup>, target: string) {
  await user.clear(screen.getByRole("textbox", { name: "Target value" }));
  await user.type(screen.getByRole("textbox", { name: "Target value" }), target);
  await user.click(screen.getByRole("button", { name: "Find" }));
}

describe("Sweep tab", () => {
  it("keeps the sweep run, its plot and its limit while another tab is looked at", async () => {
    const user = userEvent.setup();
    mount(post(-1000));
    await sweepPostMoment(user);
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "moment at base");
    await findLimit(user, "100");
    // M_base = 1000 N·(a − 1 m) = 100 N·m at a = 1.1 m (statics, as above)
    const answer = "The moment at base reaches 100 N·m at a = 1.100 m (to 4 significant figures).";
    expect((await screen.findByTestId("limit-answer")).textContent).toBe(answer);
    await user.click(screen.getByRole("tab", { name: "Reactions" }));
    expect(screen.getByRole("tabpanel", { name: "Reactions" })).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Run the sweep" })).toBeNull();
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    expect(screen.getByTestId("limit-answer").textContent).toBe(answer);
    expect(screen.getByTestId("crossings")).toBeVisible();
  });

  it("the limit finder takes a fixed support's moment in lbf·ft (1 lbf·ft = 1.3558179483 N·m, NIST SP 811)", async () => {
    const user = userEvent.setup();
    // a post on a fixed base at x = 1 m, 1 kN down at x = a: M_base = 1000 N·(a − 1 m) (statics),
    // so M = 1 lbf·ft at a = 1 m + 1.3558179483 N·m / 1000 N = 1.0013558 m
    const editor = mount(post(-1000));
    editor.getState().setUnits("US");
    await sweepPostMoment(user);
    // the moment changes sign at a = 1 m, which is no event: nothing is marked
    expect((await screen.findByTestId("crossings")).textContent).toContain("No margin crosses zero in this range.");
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "moment at base");
    expect(screen.getByRole("group", { name: "Limit finder" }).textContent).toContain("lbf·ft?");
    await findLimit(user, "1");
    // a found limit is given to 4 significant figures, with the search's tolerance (1e-9 of the 2 m range)
    // (1e-9 of the 2 m range, 2e-9 m, is finer than the 0.001 m the answer is written to: not said)
    expect((await screen.findByTestId("limit-answer")).textContent).toBe("The moment at base reaches 1 lbf·ft at a = 1.001 m (to 4 significant figures).");
  });

  it("on a light rig the target is typed in N·m, the unit of the reactions table beside it", async () => {
    const user = userEvent.setup();
    // the post again with 100 N at x = a (a = 0.5 m: M_base = −50 N·m): M_base = 100 N·(a − 1 m),
    // so M = 20 N·m at a = 1.2 m (statics, common practice)
    mount(post(-100));
    // the ends may carry their own unit: 0 mm to 200 cm is a from 0 to 2 (a is written in m)
    await sweepPostMoment(user, ["0 mm", "200 cm", "21"]);
    await screen.findByTestId("crossings");
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "moment at base");
    expect(screen.getByRole("group", { name: "Limit finder" }).textContent).toContain("N·m?");
    expect(screen.getByRole("group", { name: "Limit finder" }).textContent).not.toContain("kN·m?");
    await findLimit(user, "20");
    expect((await screen.findByTestId("limit-answer")).textContent).toBe("The moment at base reaches 20 N·m at a = 1.200 m (to 4 significant figures).");
    // a target with its own unit is taken as written, and quoted in the unit on screen: 0.03 kN·m = 30 N·m at a = 1.3 m
    await findLimit(user, "0.03 kN m");
    await waitFor(() => expect(screen.getByTestId("limit-answer").textContent).toBe("The moment at base reaches 30 N·m at a = 1.300 m (to 4 significant figures)."));
    // 20 lbf·ft = 27.12 N·m (1 lbf·ft = 1.3558179483 N·m, NIST SP 811), out of reach: every figure
    // of the answer in N·m, none in the unit typed
    // M = 100·(a − 1) N·m is linear: the line through the last samples is the exact one, 271.2 N·m at
    // a = 1 + 2.712 = 3.712 m; the range offered goes half as far again past 2 m (to 4.568), rounded out
    await findLimit(user, "200 lbf ft");
    expect((await screen.findByTestId("limit-answer")).textContent).toBe(
      "No crossing in this range: the moment at base stays below 271.2 N·m (it runs from −100 N·m to 100 N·m) for a from 0 to 2 m. It comes closest at a = 2.000 m, where it is 100 N·m. Past 2 m it is still heading for 271.2 N·m: a straight line through the last samples reaches it near a = 3.712 m (an extrapolation, not a finding).",
    );
    await user.click(screen.getByRole("button", { name: "Search from 0 to 4.57 m" }));
    await waitFor(() =>
      expect(screen.getByTestId("limit-answer").textContent).toBe(
        "The moment at base reaches 271.2 N·m at a = 3.712 m (to 4 significant figures). Searched from 0 to 4.57 m as typed now; the plot shows 0 to 2 m.",
      ),
    );
    // the form says the range searched; no wider range is offered once found
    expect(screen.getByRole("textbox", { name: "To" })).toHaveValue("4.57");
    expect(screen.queryByTestId("limit-wider")).toBeNull();
    await user.clear(screen.getByRole("textbox", { name: "To" }));
    await user.type(screen.getByRole("textbox", { name: "To" }), "2");
    // the wrong kind of quantity is refused in words, naming the target
    await findLimit(user, "3 kg");
    expect((await screen.findByRole("alert")).textContent).toBe("Target: 3 kg is a mass (kg), but this field needs a moment (N·m).");
    // said beside the limit finder, and the answer to the earlier target is gone
    expect(within(screen.getByRole("group", { name: "Limit finder" }).parentElement!).getByTestId("limit-error")).toBeTruthy();
    expect(screen.queryByTestId("limit-answer")).toBeNull();
    // out of reach: M_base runs from −100 N·m (a = 0) to 100 N·m (a = 2 m), in words with units
    await findLimit(user, "200");
    expect((await screen.findByTestId("limit-answer")).textContent).toMatch(/^No crossing in this range: the moment at base stays below 200 N·m \(it runs from −100 N·m to 100 N·m\) for a from 0 to 2 m\. It comes closest at a = 2\.000 m, where it is 100 N·m\. Past 2 m it is still heading for 200 N·m: a straight line through the last samples reaches it near a = 3\.000 m/);
    expect(screen.queryByTestId("limit-error")).toBeNull();
  });

  it("says when the chosen case sets the swept parameter itself", async () => {
    const user = userEvent.setup();
    const { exampleById } = await import("@/canvas/examples");
    // the exhaust stack's saved sweep: v on the case "Engine stopped, 30 m/s wind", which sets v
    mount(exampleById("exhaust-stack")!.sketch);
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    expect(screen.getByTestId("case-sets-parameter").textContent).toBe("This case sets v = 30 m/s; the sweep's values stand in for it.");
    await user.selectOptions(screen.getByRole("combobox", { name: "Case or combination to sweep" }), "");
    expect(screen.queryByTestId("case-sets-parameter")).toBeNull();
  });

  it("says that the swept flow factor multiplies a case's own, and a pump-off case stays without flow", async () => {
    const user = userEvent.setup();
    const { exampleById } = await import("@/canvas/examples");
    // the washing cart's cases: "Pump off (parked)" runs the flow × 0
    mount(exampleById("washing-cart")!.sketch);
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    await user.selectOptions(screen.getByRole("combobox", { name: "Parameter to sweep" }), "flowFactor");
    await user.selectOptions(screen.getByRole("combobox", { name: "Case to sweep" }), "case:pump-off");
    expect(screen.getByTestId("case-sets-parameter").textContent).toBe("This case runs without flow (flow × 0); the sweep's flow factor multiplies it, so every point is without flow too.");
    await user.selectOptions(screen.getByRole("combobox", { name: "Case to sweep" }), "case:raised");
    expect(screen.queryByTestId("case-sets-parameter")).toBeNull();
  });

  it("plots a sweep, lists the crossing, and the limit finder answers in words", async () => {
    const user = userEvent.setup();
    mount(load("fire-monitor-trailer"));
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    await user.selectOptions(screen.getByRole("combobox", { name: "Parameter to sweep" }), "theta");
    // picking an angle offers ±90° about its value (theta = 15 deg here)
    expect(screen.getByRole("textbox", { name: "From" })).toHaveValue("-75");
    expect(screen.getByRole("textbox", { name: "To" })).toHaveValue("105");
    await setUpSweep(user, "theta", ["0", "80", "81"]);
    // the friction margins of the contacts with friction are plotted unless unticked: the
    // trailer slides long before its jack lifts, and "when does it start to move?" needs both
    const friction = screen.getAllByRole("checkbox", { name: /: friction margin$/ });
    expect(friction.map((c) => [c.closest("label")?.textContent, (c as HTMLInputElement).checked])).toEqual([
      ["rear stabiliser leg: friction margin", true],
      ["wheel: friction margin", true],
      ["front jack: friction margin", true],
    ]);
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    const crossings = await screen.findByTestId("crossings");
    expect(crossings.textContent).toMatch(/margin at front jack crosses zero between theta = 18 and 19 deg/);
    // the plotted values download as CSV (tests/unit/studies/sweep-csv.test.ts checks the file)
    expect(screen.getByRole("button", { name: "Download the sweep's values as CSV" })).toBeVisible();
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "margin at front jack");
    await user.click(screen.getByRole("button", { name: "Find" }));
    const answer = await screen.findByTestId("limit-answer");
    expect(answer.textContent).toMatch(/^The margin at front jack reaches 0 kN at theta = 18\.1\d deg \(to 4 significant figures\)\.$/);
  });
});

describe("a sweep on a combination", () => {
  it("runs on the combination's factored load set, says so, finds the limit there and keeps it on the calc sheet", async () => {
    const { runLimit } = await import("@/canvas/studies/run");
    const user = userEvent.setup();
    const doc = load("fire-monitor-trailer");
    doc.cases = [
      { id: "dead", name: "Dead", factors: { flow: 0 } },
      { id: "jet", name: "Jet", factors: { dead: 0 }, parameters: { theta: "30 deg" } },
    ];
    doc.combinations = [{ id: "k", name: "Light trailer, strong jet", terms: [{ case: "dead", factor: 0.9 }, { case: "jet", factor: 1.4 }] }];
    const editor = mount(doc);
    await setUpSweep(user, "theta", ["0", "80", "81"]);
    const on = screen.getByRole("combobox", { name: "Case or combination to sweep" });
    expect(within(on).getByRole("group", { name: "Combinations (factored load sets)" })).toBeTruthy();
    await user.selectOptions(on, "Light trailer, strong jet");
    expect(screen.getByTestId("combination-sweep-note").textContent).toBe(
      "Each point is solved as one factored load set (0.9 × Dead + 1.4 × Jet), with the sweep's theta in every case, standing in for Jet (theta = 30 deg).",
    );
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    const crossings = await screen.findByTestId("crossings");
    // the limit on the combination, from the worker's own function (checked against a closed form in
    // tests/unit/solver/combination-sweep.test.ts), and the sweep's marked crossing brackets it
    const jack = { support: "jack", component: "margin" as const };
    const expected = runLimit(doc, { parameter: "theta", from: 0, to: 80, combinationId: "k", quantity: jack, target: 0 });
    const drawn = runLimit(doc, { parameter: "theta", from: 0, to: 80, quantity: jack, target: 0 });
    if (!expected.found || !drawn.found) throw new Error("expected crossings");
    expect(Math.abs(expected.value - drawn.value)).toBeGreaterThan(1);
    const lo = Math.floor(expected.value);
    expect(crossings.textContent).toContain(`margin at front jack crosses zero between theta = ${lo} and ${lo + 1} deg`);
    expect(screen.getByTestId("sweep-ran-on").textContent).toBe("theta from 0 to 80 deg, 81 points — combination Light trailer, strong jet");
    // the form moved back to the sketch as drawn, not run again: the limit finder searches what the plot shows
    await user.selectOptions(on, "As drawn");
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "margin at front jack");
    await user.click(screen.getByRole("button", { name: "Find" }));
    expect((await screen.findByTestId("limit-answer")).textContent).toContain(`at theta = ${formatLimit(expected.value)} deg (to 4 significant figures`);
    await user.selectOptions(on, "Light trailer, strong jet");
    await user.click(screen.getByRole("button", { name: "Keep on the calc sheet" }));
    expect(editor.getState().sketch.sweeps![0]).toMatchObject({ parameter: "theta", from: 0, to: 80, points: 81, combination: "k" });
    expect(editor.getState().sketch.sweeps![0].case).toBeUndefined();
  });
});

describe("the limit in every case", () => {
  it("lists the value in each case and combination and names where it comes first", async () => {
    const { runLimit } = await import("@/canvas/studies/run");
    const user = userEvent.setup();
    const { exampleById } = await import("@/canvas/examples");
    const doc = exampleById("exhaust-stack")!.sketch;
    mount(doc);
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    await screen.findByTestId("crossings");
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "margin at upwind edge");
    await user.click(screen.getByRole("button", { name: "In every case" }));
    const box = await screen.findByTestId("limit-everywhere");
    // each row against the single search on that run (its closed forms: tests/unit/studies/exhaust-stack-example.test.ts)
    const upwind = { support: "upwind", component: "margin" as const };
    const one = (on: { caseId?: string; combinationId?: string }) => {
      const r = runLimit(doc, { parameter: "v", from: 20, to: 45, quantity: upwind, target: 0, ...on });
      return r.found ? `v = ${formatLimit(r.value)} m/s` : "no crossing in this range";
    };
    const rows = [...box.querySelectorAll("tbody tr")].map((tr) => [...tr.querySelectorAll("th, td")].map((td) => td.textContent));
    expect(within(box).getByRole("table", { name: "Where the margin at upwind edge reaches 0 kN, in each case and combination" })).toBeTruthy();
    expect(rows).toEqual([
      ["Case Engine running, 30 m/s wind", one({ caseId: "running" })],
      ["Case Engine stopped, 30 m/s wind", one({ caseId: "stopped" })],
      ["Case Engine stopped, 38 m/s storm", one({ caseId: "storm" })],
      ["Combination Uplift check: 0.9 × weight + 1.5 × wind", `${one({ combinationId: "uplift" })} — first`],
    ]);
    // the storm case sets v itself, but the sweep's value stands in: it lifts where "stopped" does
    expect(rows[2][1]).toBe(rows[1][1]);
    expect(within(box).getByRole("status").textContent).toBe("The margin at upwind edge reaches 0 kN first in Uplift check: 0.9 × weight + 1.5 × wind.");
    // every value to 4 significant figures, each search to 1e-9 of the 25 m/s range: finer than the figures, not said
    expect(screen.getByTestId("limit-everywhere-precision").textContent).toBe("Values to 4 significant figures.");
    // the searched v stands in for the v a case sets itself, said with the values it replaces
    expect(screen.getByTestId("limit-everywhere-overrides").textContent).toBe(
      "Each is searched over v from 20 to 45 m/s: the searched value stands in for the v a case sets itself (Engine running, 30 m/s wind: 30 m/s; Engine stopped, 30 m/s wind: 30 m/s; Engine stopped, 38 m/s storm: 38 m/s; Wind only, 30 m/s: 30 m/s).",
    );
  });
});

describe("sweeps kept on the calc sheet", () => {
  it("keeps several, refuses a second copy, opens one back into the form and removes one", async () => {
    const user = userEvent.setup();
    const { exampleById } = await import("@/canvas/examples");
    // the exhaust stack keeps one sweep already: v from 20 to 45 m/s on "Engine stopped, 30 m/s wind"
    const editor = mount(exampleById("exhaust-stack")!.sketch);
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    const list = () => within(screen.getByTestId("kept-sweeps")).getAllByRole("listitem").map((li) => li.textContent);
    expect(list()).toEqual(["v from 20 to 45 m/s, 101 points — case Engine stopped, 30 m/s windOpen×"]);
    // the form opens on it: keeping it again adds nothing
    await user.click(screen.getByRole("button", { name: "Keep on the calc sheet" }));
    expect(screen.getByRole("status").textContent).toBe("This sweep is on the calc sheet already.");
    expect(editor.getState().sketch.sweeps).toHaveLength(1);
    // the same speeds on the uplift combination: a second sweep
    await user.selectOptions(screen.getByRole("combobox", { name: "Case or combination to sweep" }), "Uplift check: 0.9 × weight + 1.5 × wind");
    await user.click(screen.getByRole("button", { name: "Keep on the calc sheet" }));
    expect(editor.getState().sketch.sweeps!.map((k) => [k.id, k.case, k.combination])).toEqual([
      ["wind-speed", "stopped", undefined],
      ["sweep-2", undefined, "uplift"],
    ]);
    expect(list()[1]).toBe("v from 20 to 45 m/s, 101 points — combination Uplift check: 0.9 × weight + 1.5 × windOpen×");
    // open the first: the form is back on its case; remove it: the combination's stays
    await user.click(screen.getByRole("button", { name: "Open the kept sweep wind-speed" }));
    expect(screen.getByRole("combobox", { name: "Case or combination to sweep" })).toHaveValue("case:stopped");
    await user.click(screen.getByRole("button", { name: "Remove the kept sweep wind-speed" }));
    expect(editor.getState().sketch.sweeps!.map((k) => k.id)).toEqual(["sweep-2"]);
    // undo brings it back
    editor.getState().undo();
    expect(editor.getState().sketch.sweeps!.map((k) => k.id)).toEqual(["wind-speed", "sweep-2"]);
  });
});

describe("a plot the sketch has moved on from", () => {
  it("says so once a value it is solved from changes, not for a kept sweep or a new title", async () => {
    const { setParameter, setSketchField } = await import("@/canvas/commands");
    const user = userEvent.setup();
    const editor = mount(load("fire-monitor-trailer"));
    await setUpSweep(user, "theta", ["0", "80", "41"]);
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    await screen.findByTestId("crossings");
    expect(screen.queryByTestId("sweep-stale")).toBeNull();
    await user.click(screen.getByRole("button", { name: "Keep on the calc sheet" }));
    act(() => void editor.getState().apply(setSketchField({ field: "title", value: "Trailer, renamed" })));
    expect(screen.queryByTestId("sweep-stale")).toBeNull();
    act(() => void editor.getState().apply(setParameter({ name: "Q", expression: "1500 gpm" })));
    expect(screen.getByTestId("sweep-stale").textContent).toBe("The sketch has changed since this plot was run: run the sweep again to see it as it is now.");
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    await waitFor(() => expect(screen.queryByTestId("sweep-stale")).toBeNull());
  });
});

describe("a kept sweep that names what is gone", () => {
  it("says so in the list, where it can be put right", async () => {
    const user = userEvent.setup();
    const file = trailerWithLoadCases();
    file.sweeps = [
      { id: "s1", parameter: "theta", from: 0, to: 60, points: 11, case: "gone" },
      { id: "s2", parameter: "zz", from: 0, to: 1, points: 11 },
      { id: "s3", parameter: "theta", from: 0, to: 60, points: 11, combination: "k" },
      { id: "s4", parameter: "theta", from: 0, to: 60, points: 11, quantities: [{ support: "no-such-foot", component: "n" }] },
    ];
    mount(file);
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    const items = within(screen.getByTestId("kept-sweeps")).getAllByRole("listitem");
    expect(items.map((li) => within(li).queryByTestId("kept-sweep-problem")?.textContent ?? null)).toEqual([
      'its case "gone" is gone: the calc sheet cannot plot it. Open it, pick another, and keep it again.',
      'the sketch has no parameter "zz" any more: the calc sheet cannot plot it. Open it, pick another, and keep it again.',
      null,
      'its support "no-such-foot" is gone: the calc sheet cannot plot it. Open it, pick another, and keep it again.',
    ]);
  });
});

describe("load groups in the properties", () => {
  it("puts a load into a group that a case's factor then scales", async () => {
    const { renderEditor, storedSketch } = await import("./editor-helpers");
    const { emptySketch } = await import("@/canvas/model/elements");
    const { newBody } = await import("@/canvas/model/factory");
    const user = userEvent.setup();
    const beam = {
      ...emptySketch("Beam"),
      bodies: [newBody("b1", [[0, 0], [4, 0], [4, 0.5], [0, 0.5]], "Beam")],
      supports: [
        { id: "s1", body: "b1", kind: "pin" as const, at: [0, 0] as [number, number] },
        { id: "s2", body: "b1", kind: "roller" as const, at: [4, 0] as [number, number], angle: 90 },
      ],
      loads: [{ id: "l1", body: "b1", kind: "force" as const, at: [2, 0.5] as [number, number], magnitude: "10 kN", angle: -90 }],
    };
    const { mem } = await renderEditor(beam);
    await user.click(within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name: /Point force l1/ }));
    const field = within(screen.getByTestId("element-form")).getByLabelText("Load group");
    await user.type(field, "snow");
    await user.tab();
    await waitFor(() => expect((storedSketch(mem)!.loads[0] as { group?: string }).group).toBe("snow"));
    // a case with "snow 1.5" scales that load: the roller carries half of 15 kN and half the weight
    const doc = { ...storedSketch(mem)!, cases: [{ id: "c", name: "Snow", factors: { snow: 1.5 } }] };
    const p = parseSketch(doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const run = solveCases(p.file).runs[0];
    if (!run.ok) throw new Error();
    const W = p.sketch.bodies[0].mass * p.sketch.gravity;
    expect(run.result.reactions.s2.fy).toBeCloseTo(7500 + W / 2, 9);
  });
});

describe("CSV of the result tables", () => {
  it("the reactions table downloads with units in its header and the sign of the chosen sense", async () => {
    const user = userEvent.setup();
    const blobs: Blob[] = [];
    const orig = URL.createObjectURL;
    URL.createObjectURL = ((b: Blob) => (blobs.push(b), "blob:x")) as typeof URL.createObjectURL;
    try {
      mount(load("thrust-stand-tips"));
      await user.click(screen.getByRole("button", { name: "Download the reactions as CSV" }));
      await user.click(screen.getByRole("radio", { name: "Load on the support" }));
      await user.click(screen.getByRole("button", { name: "Download the reactions as CSV" }));
    } finally {
      URL.createObjectURL = orig;
    }
    const [onBody, onSupport] = await Promise.all(blobs.map((b) => b.text()));
    expect(onBody.split("\r\n")[0]).toBe("Support,Kind,Fx (kN),Fy (kN),Resultant (kN),Direction (°),M (kN·m),Normal n (kN),Tangential t (kN),State,Margin (kN)");
    const fxBody = Number(onBody.split("\r\n")[1].split(",")[2]);
    const fxSupport = Number(onSupport.split("\r\n")[1].split(",")[2]);
    expect(fxBody).toBeCloseTo(-2.2, 6);
    expect(fxSupport).toBeCloseTo(2.2, 6);
    // each support by its label, as the table on screen names it
    const labels = load("thrust-stand-tips").supports.map((s: { id: string; label?: string }) => s.label || s.id);
    expect(onBody.split("\r\n").slice(1, 1 + labels.length).map((row) => row.split(",")[0])).toEqual(labels);
  });

  it("a download is named after the sketch: “Jet thrust stand, overturning check” → Jet-thrust-stand-overturning-check-reactions.csv", async () => {
    const user = userEvent.setup();
    const names: string[] = [];
    const click = HTMLAnchorElement.prototype.click;
    const orig = URL.createObjectURL;
    URL.createObjectURL = (() => "blob:x") as typeof URL.createObjectURL;
    HTMLAnchorElement.prototype.click = function (this: HTMLAnchorElement) {
      names.push(this.download);
    };
    try {
      await renderEditor(load("thrust-stand-tips"));
      await user.click(await screen.findByRole("button", { name: "Download the reactions as CSV" }));
    } finally {
      HTMLAnchorElement.prototype.click = click;
      URL.createObjectURL = orig;
    }
    expect(names).toEqual(["Jet-thrust-stand-overturning-check-reactions.csv"]);
  });
});
