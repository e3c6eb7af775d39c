// A kept sweep's ends are numbers in the unit its parameter is written in. Editing the parameter
// from "4 bar" to "400 kPa" would silently turn "p from 0 to 10 bar" into 0 to 10 kPa on the calc
// sheet; leaving the field rewrites the kept sweeps' ends as the same pressures in kPa (1 bar =
// 100 kPa: NIST SP 811), in the same undo step, and the status line says so.
import { screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { sweepsInNewUnit } from "@/canvas/studies/display";
import { FLOW_FACTOR } from "@/solver/sweep";
import { skidWithKeptSweeps } from "../fixtures/skid-kept-sweeps";
import { renderEditor, storedSketch } from "./editor-helpers";

/** p's expression typed afresh in the parameters table, and the field left with Enter. */
async function retypeP(user: ReturnType<typeof userEvent.setup>, text: string) {
  const field = screen.getByRole("textbox", { name: "Expression of parameter p" });
  await user.click(field);
  await user.clear(field);
  await user.type(field, text);
  await user.keyboard("{Enter}");
}

describe("the kept sweeps' ends when their parameter's unit changes", () => {
  it("are the same values in the new unit, said for the status line", () => {
    const moved = sweepsInNewUnit(skidWithKeptSweeps(), "p", "bar", "kPa");
    expect(moved?.sweeps.map((w) => [w.id, w.from, w.to])).toEqual([["sweep-1", 0, 1000], ["sweep-2", 0, 2000]]);
    expect(moved?.words).toBe(
      "The kept sweep of p from 0 to 10 bar now runs from 0 to 1,000 kPa; the kept sweep of p from 0 to 20 bar now runs from 0 to 2,000 kPa: the same values, in the unit p is written in now.",
    );
    // 1 m/s = 3.6 km/hr exactly, without the float's noise
    const speed = { sweeps: [{ id: "w", parameter: "v", from: 20, to: 45, points: 11 }] };
    expect(sweepsInNewUnit(speed, "v", "m / s", "km / hr")?.sweeps[0]).toMatchObject({ from: 72, to: 162 });
  });

  it("are left alone for the same unit, a plain number, a unit of another kind, the flow factor or another parameter", () => {
    const s = skidWithKeptSweeps();
    expect(sweepsInNewUnit(s, "p", "bar", "bar")).toBeNull();
    expect(sweepsInNewUnit(s, "p", "bar", "")).toBeNull();
    expect(sweepsInNewUnit(s, "p", "", "kPa")).toBeNull();
    expect(sweepsInNewUnit(s, "p", "bar", "m")).toBeNull();
    expect(sweepsInNewUnit(s, "q", "bar", "kPa")).toBeNull();
    expect(sweepsInNewUnit({ sweeps: [{ id: "f", parameter: FLOW_FACTOR, from: 0, to: 2, points: 3 }] }, FLOW_FACTOR, "bar", "kPa")).toBeNull();
  });

  it("follow an edit in the parameters table, and one Undo puts the unit and the ends back", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(skidWithKeptSweeps());
    await retypeP(user, "400 kPa");
    await waitFor(() => expect(screen.getByTestId("notice")).toHaveTextContent("The kept sweep of p from 0 to 10 bar now runs from 0 to 1,000 kPa;"));
    await waitFor(() => expect(storedSketch(mem)?.sweeps?.map((w) => [w.from, w.to])).toEqual([[0, 1000], [0, 2000]]), { timeout: 3000 });
    expect(storedSketch(mem)?.parameters).toEqual({ p: "400 kPa" });
    // the typed edit and the sweeps' new ends are one step
    await user.keyboard("{Control>}z{/Control}");
    await waitFor(() => expect(storedSketch(mem)?.parameters).toEqual({ p: "4 bar" }), { timeout: 3000 });
    expect(storedSketch(mem)?.sweeps?.map((w) => [w.from, w.to])).toEqual([[0, 10], [0, 20]]);
  }, 20_000);

  it("a visit that leaves the unit as it was changes no sweep", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(skidWithKeptSweeps());
    await retypeP(user, "6 bar");
    await waitFor(() => expect(storedSketch(mem)?.parameters).toEqual({ p: "6 bar" }), { timeout: 3000 });
    expect(storedSketch(mem)?.sweeps?.map((w) => [w.from, w.to])).toEqual([[0, 10], [0, 20]]);
    expect(screen.getByTestId("notice")).not.toHaveTextContent("now runs from");
  }, 20_000);

  it("the Sweep tab's From and To follow too: plain numbers become the same values, a value with its unit stays", async () => {
    const user = userEvent.setup();
    await renderEditor(skidWithKeptSweeps());
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    const from = screen.getByRole("textbox", { name: "From" });
    const to = screen.getByRole("textbox", { name: "To" });
    // the first kept sweep's settings, in bar
    expect([(from as HTMLInputElement).value, (to as HTMLInputElement).value]).toEqual(["0", "10"]);
    await user.clear(from);
    await user.type(from, "2");
    await user.clear(to);
    await user.type(to, "900 kPa");
    await retypeP(user, "400 kPa");
    await waitFor(() => expect(screen.getByTestId("sweep-unit-hint")).toHaveTextContent("Numbers in kPa"));
    expect((from as HTMLInputElement).value).toBe("200");
    expect((to as HTMLInputElement).value).toBe("900 kPa");
    // the kept list says the kept sweeps' new ends in the new unit
    expect(screen.getByTestId("kept-sweeps")).toHaveTextContent("p from 0 to 1,000 kPa, 11 points");
    // and back: 200 kPa is 2 bar
    await retypeP(user, "4 bar");
    await waitFor(() => expect((from as HTMLInputElement).value).toBe("2"));
    expect(screen.getByTestId("kept-sweeps")).toHaveTextContent("p from 0 to 10 bar, 11 points");
  }, 30_000);
});
