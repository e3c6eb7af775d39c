// A parameter typed as it is written on paper, "Q = 1500 gpm", in the new parameter's name box:
// before, it was refused ("letters, digits and _ only"); now Enter adds Q with the expression
// 1500 gpm, the box says what Enter will do, and a bad name is still said at the box.
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { splitAssignment } from "@/components/editor/ParametersTable";
import { beam, renderEditor, storedSketch } from "./editor-helpers";

describe("a parameter typed whole in the name box", () => {
  it("splits at the first '=' and trims both sides", () => {
    expect(splitAssignment("Q = 1500 gpm")).toEqual({ name: "Q", expression: "1500 gpm" });
    expect(splitAssignment("theta=30 deg")).toEqual({ name: "theta", expression: "30 deg" });
    expect(splitAssignment("Q =")).toEqual({ name: "Q", expression: "" });
    expect(splitAssignment("Q")).toBeNull();
  });

  it("Enter adds it with its expression; the value is worked out with its unit", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    const params = within(screen.getByTestId("parameters"));
    const box = params.getByLabelText("New parameter name");
    await user.type(box, "Q =");
    expect(params.getByTestId("parameter-typed-whole")).toHaveTextContent("Type its value after “=”, or in the expression box");
    expect(params.getByRole("button", { name: "Add" })).toBeDisabled();
    await user.type(box, " 1500 gpm");
    expect(params.getByTestId("parameter-typed-whole")).toHaveTextContent("Enter adds Q = 1500 gpm");
    await user.keyboard("{Enter}");
    await waitFor(() => expect(storedSketch(mem)?.parameters).toMatchObject({ Q: "1500 gpm" }), { timeout: 3000 });
    // 1500 US gal/min = 94.64 L/s (1 US gal = 3.785411784 L, NIST SP 811)
    expect(params.getByLabelText("Name of parameter Q").closest("tr")!).toHaveTextContent("94.64 L/s");
    expect(box).toHaveValue("");
  });

  it("a bad name before the '=' is said at the box and nothing is added; text in the expression box keeps the name box a name", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    const params = within(screen.getByTestId("parameters"));
    const box = params.getByLabelText("New parameter name");
    await user.type(box, "2Q = 1500 gpm");
    expect(params.getByText("⚠ letters, digits and _ only, starting with a letter")).toBeInTheDocument();
    expect(params.getByRole("button", { name: "Add" })).toBeDisabled();
    await user.clear(box);
    await user.type(params.getByLabelText("New parameter expression"), "30 deg");
    await user.type(box, "theta = 30 deg");
    expect(params.getByText("⚠ letters, digits and _ only, starting with a letter")).toBeInTheDocument();
  });
});
