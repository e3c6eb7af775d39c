// The properties form and the parameters table as an engineer uses them: the file format's zod
// schema refuses text at the field (and stores nothing), and the parameters table shows each
// parameter's name, expression and value, or the reason it has none.
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { beam, renderEditor, storedSketch } from "./editor-helpers";

const outlineRow = (name: RegExp) => within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name });

describe("properties form: the schema's refusals at the field", () => {
  it("a load group that does not start with a letter is refused under the field, and the stored group stays", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    await user.click(outlineRow(/Point force l1/));
    const form = within(screen.getByTestId("element-form"));
    const field = form.getByLabelText("Load group");
    await user.type(field, "snow");
    await waitFor(() => expect((storedSketch(mem)!.loads[0] as { group?: string }).group).toBe("snow"), { timeout: 3000 });
    await user.clear(field);
    await user.type(field, "2nd");
    // the schema's own words (solver/schema.ts), at this field
    expect(field).toHaveAttribute("aria-invalid", "true");
    expect(field).toHaveAccessibleDescription(/must start with a letter and use letters, digits, spaces, _ or -/);
    // what was stored last: the blank typed on the way (no group), never "2nd"
    await new Promise((r) => setTimeout(r, 900));
    expect((storedSketch(mem)!.loads[0] as { group?: string }).group).toBeUndefined();
    // leaving the field drops the refused text and its reason
    await user.tab();
    expect(field).toHaveValue("");
    expect(field).not.toHaveAttribute("aria-invalid");
    expect(form.queryByText(/must start with a letter/)).toBeNull();
  }, 15_000);

  it("Enter ends the entry but keeps the focus in the field (a number, a text), and the next entry there is its own undo step", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    await user.click(outlineRow(/Point force l1/));
    const form = within(screen.getByTestId("element-form"));
    const magnitude = form.getByLabelText("Magnitude");
    await user.clear(magnitude);
    await user.type(magnitude, "12 kN{Enter}");
    // not thrown back to the top of the page: the next Tab goes on from here
    expect(magnitude).toHaveFocus();
    await user.clear(magnitude);
    await user.type(magnitude, "14 kN{Enter}");
    expect(magnitude).toHaveFocus();
    await waitFor(() => expect((storedSketch(mem)!.loads[0] as { magnitude?: unknown }).magnitude).toBe("14 kN"), { timeout: 3000 });
    // two entries, two steps: one Undo goes back to the first
    screen.getByTestId("tray-body").focus();
    await user.keyboard("{Control>}z{/Control}");
    await waitFor(() => expect((storedSketch(mem)!.loads[0] as { magnitude?: unknown }).magnitude).toBe("12 kN"), { timeout: 3000 });
    const label = form.getByLabelText("Label");
    await user.clear(label);
    await user.type(label, "Drum{Enter}");
    expect(label).toHaveFocus();
    expect(label).toHaveValue("Drum");
  }, 15_000);

  it("Ctrl+S in a field saves (not the browser's Save page), with what is typed there", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    const title = screen.getByLabelText("Title");
    await user.clear(title);
    await user.type(title, "Beam, checked{Enter}");
    expect(title).toHaveFocus();
    await user.keyboard("{Control>}s{/Control}");
    expect(screen.getByTestId("notice")).toHaveTextContent("Kept in this browser. Sign in to save it to a workspace.");
    await waitFor(() => expect(storedSketch(mem)?.title).toBe("Beam, checked"));
    // the field's own keys stay the field's: Ctrl+A selects its text, nothing in the sketch
    await user.keyboard("{Control>}a{/Control}");
    expect(screen.getAllByRole("button", { name: /^Body b/ })[0]).toHaveAttribute("aria-pressed", "false");
  }, 15_000);

  it("on a touch screen Enter (the on-screen keyboard's Done) leaves the field, so that keyboard goes", async () => {
    window.matchMedia = ((query: string) => ({ matches: query === "(pointer: coarse)", media: query, addEventListener() {}, removeEventListener() {} })) as unknown as typeof window.matchMedia;
    try {
      const user = userEvent.setup();
      const { mem } = await renderEditor(beam());
      await user.click(outlineRow(/Point force l1/));
      const magnitude = within(screen.getByTestId("element-form")).getByLabelText("Magnitude");
      await user.clear(magnitude);
      await user.type(magnitude, "12 kN{Enter}");
      expect(magnitude).not.toHaveFocus();
      await waitFor(() => expect((storedSketch(mem)!.loads[0] as { magnitude?: unknown }).magnitude).toBe("12 kN"), { timeout: 3000 });
    } finally {
      delete (window as { matchMedia?: unknown }).matchMedia;
    }
  }, 15_000);

  it("a number field shows the expression's value with its unit, or the parser's error, under the field", async () => {
    const user = userEvent.setup();
    await renderEditor({ ...beam(), parameters: { r: "0.25 m" } });
    await user.click(outlineRow(/Contact s2/));
    const form = within(screen.getByTestId("element-form"));
    const angle = form.getByLabelText("Pushes toward");
    await user.clear(angle);
    await user.type(angle, "theta + 5 deg");
    expect(angle).toHaveAttribute("aria-invalid", "true");
    expect(angle).toHaveAccessibleDescription(/unknown name "theta"/);
    await user.clear(angle);
    await user.type(angle, "80 deg + 10 deg");
    expect(angle).not.toHaveAttribute("aria-invalid", "true");
    expect(angle).toHaveAccessibleDescription("= 90°");
    const x = form.getByLabelText("Position x");
    await user.clear(x);
    await user.type(x, "2*r");
    expect(x).toHaveAccessibleDescription("= 0.5 m");
  }, 15_000);

  it("the sketch's gravity direction takes an angle and is stored; a length is refused at the field", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor({ ...beam(), parameters: { slope: "5 deg" } });
    const field = within(screen.getByTestId("sketch-form")).getByLabelText("Gravity direction");
    await user.type(field, "-90 deg - slope");
    expect(field).toHaveAccessibleDescription("= −95°");
    await waitFor(() => expect(storedSketch(mem)?.gravityAngle).toBe("-90 deg - slope"), { timeout: 3000 });
    // the drawing says so, in words beside an arrow, so a turned gravity is never forgotten
    await waitFor(() => expect(screen.getByTestId("gravity-turned").textContent).toBe("gravity at −95°, 5° off −y"));
    await user.clear(field);
    await user.type(field, "2 m");
    expect(field).toHaveAttribute("aria-invalid", "true");
  }, 15_000);

  it("a port's momentum-flux factor β: blank is 1, 4/3 multiplies the momentum flux, below 1 is refused at the field", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor({
      ...beam(),
      ports: [{ id: "p1", body: "b1", kind: "outlet", at: [4, 0.5], angle: 0, massFlow: 3, velocity: 20, label: "jet" }],
    });
    await user.click(outlineRow(/Outlet p1/));
    const form = within(screen.getByTestId("element-form"));
    // ṁV = 3 kg/s × 20 m/s = 60 N
    expect(form.getByText(/Resolved:/).textContent).toMatch(/momentum flux ṁV = 60(\.0+)? N/);
    const beta = form.getByLabelText("Momentum-flux factor β");
    await user.type(beta, "4/3");
    expect(beta).toHaveAccessibleDescription("= 1.333");
    await waitFor(() => expect((storedSketch(mem)!.ports[0] as { beta?: unknown }).beta).toBe("4/3"), { timeout: 3000 });
    await waitFor(() => expect(form.getByText(/Resolved:/).textContent).toMatch(/βṁV \(β = 1\.333\) = 80(\.0+)? N/));
    await user.clear(beta);
    await user.type(beta, "0.9");
    expect(beta).toHaveAttribute("aria-invalid", "true");
    expect(beta).toHaveAccessibleDescription(/must be from 1 to 2/);
  }, 15_000);
});

describe("parameters table", () => {
  it("lists name, expression and value for each parameter, in the units on screen", async () => {
    await renderEditor({ ...beam(), parameters: { p: "350 psi", d: "50 mm", F: "p * pi/4 * d^2" } });
    const table = within(screen.getByTestId("parameters"));
    expect(table.getByLabelText("Expression of parameter F")).toHaveValue("p * pi/4 * d^2");
    const rows = table.getAllByRole("row").slice(1);
    const valueOf = (name: string) => rows.find((r) => within(r).queryByLabelText(`Name of parameter ${name}`))!.querySelectorAll("td")[2].textContent;
    // as typed, and in SI beside it: 350 × 6894.757 Pa = 2.413 MPa (NIST SP 811)
    expect(valueOf("p")).toBe("350 psi (2.413 MPa)");
    // 350 psi × π/4 × (0.05 m)² = 2413.165 kPa × 1.9635e-3 m² = 4.738 kN (1 psi = 6894.757 Pa, NIST SP 811)
    expect(valueOf("F")).toBe("4.738 kN");
    const user = userEvent.setup();
    await user.click(within(screen.getByTestId("units")).getByRole("radio", { name: "US" }));
    // 4738.3 N / 4.4482216 N/lbf = 1065 lbf (NIST SP 811)
    expect(valueOf("F")).toMatch(/^1,?065 lbf$/);
    expect(valueOf("p")).toBe("350 psi");
    expect(valueOf("d")).toBe("50 mm (0.164 ft)");
  });

  it("shows an expression's error in the value column, and refuses a bad or taken name with its reason", async () => {
    const user = userEvent.setup();
    await renderEditor({ ...beam(), parameters: { L: "4 m", w: "3 * nothing" } });
    const params = within(screen.getByTestId("parameters"));
    const wRow = params.getByLabelText("Name of parameter w").closest("tr")!;
    expect(wRow.querySelectorAll("td")[2]).toHaveTextContent(/⚠ .*nothing/);
    const newName = params.getByLabelText("New parameter name");
    await user.type(newName, "2L");
    expect(params.getByText("⚠ letters, digits and _ only, starting with a letter")).toBeInTheDocument();
    await user.clear(newName);
    await user.type(newName, "L");
    expect(params.getByText("⚠ L is already a parameter")).toBeInTheDocument();
    await user.clear(newName);
    await user.type(newName, "pi");
    expect(params.getByText(/is a mathematical constant in expressions/)).toBeInTheDocument();
    expect(params.getByRole("button", { name: "Add" })).toBeDisabled();
    // renaming to a taken name is refused at the field and changes nothing
    const name = params.getByLabelText("Name of parameter w");
    await user.clear(name);
    await user.type(name, "L");
    expect(name).toHaveAttribute("aria-invalid", "true");
    await user.tab();
    // left with a name it cannot take: the text stays with its reason, the parameter keeps its name
    expect(params.getByLabelText("Name of parameter w")).toHaveValue("L");
    expect(name).toHaveAccessibleDescription("⚠ Name: L is already a parameter");
    // Escape puts the old name back and the reason goes
    await user.click(name);
    await user.keyboard("{Escape}");
    expect(params.getByLabelText("Name of parameter w")).toHaveValue("w");
    expect(params.queryByText(/Name: L is already a parameter/)).toBeNull();
  });

  it("an edited expression updates the value; delete removes the row, and undo brings it back", async () => {
    const user = userEvent.setup();
    await renderEditor({ ...beam(), parameters: { L: "4 m" } });
    const params = within(screen.getByTestId("parameters"));
    const expr = params.getByLabelText("Expression of parameter L");
    await user.clear(expr);
    await user.type(expr, "2.5 ft");
    // 2.5 ft × 0.3048 m/ft = 0.762 m (NIST SP 811)
    expect(expr.closest("tr")!.querySelectorAll("td")[2]).toHaveTextContent("2.5 ft");
    await user.click(params.getByRole("button", { name: "Delete parameter L" }));
    expect(params.queryByLabelText("Name of parameter L")).toBeNull();
    await user.click(screen.getByTestId("undo"));
    expect(within(screen.getByTestId("parameters")).getByLabelText("Expression of parameter L")).toHaveValue("2.5 ft");
  });
});

describe("without a mouse", () => {
  it("every control of the tray, the element list, the properties and the parameters has a name", async () => {
    const user = userEvent.setup();
    await renderEditor({ ...beam(), parameters: { L: "4 m" } });
    const ROLES = ["textbox", "combobox", "button", "checkbox", "radio", "spinbutton"];
    const withoutName = () =>
      ROLES.flatMap((role) => screen.queryAllByRole(role))
        .filter((el) => {
          try {
            expect(el).toHaveAccessibleName();
            return false;
          } catch {
            return true;
          }
        })
        .map((el) => el.outerHTML.slice(0, 160));
    expect(withoutName()).toEqual([]);
    // the forms of a body and of a friction contact
    for (const row of [/Body b1/, /Contact s2/]) {
      await user.click(within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name: row }));
      expect(withoutName()).toEqual([]);
    }
  });
});
