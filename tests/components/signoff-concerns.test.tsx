// The sign-off dialogs put the version's own findings first — a factor of safety short, a case
// in which a body is not held — when it is submitted, checked or approved, so nobody takes a step
// past them unseen; the superseded version's page says why it offers no submit.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeAll, describe, expect, it } from "vitest";
import type { SignOffData } from "@/components/review/SignOff";
import { showSignOff } from "./signoff-support";
import { withModalDialogs } from "./dialog-support";

beforeAll(withModalDialogs);

const data = (over: Partial<SignOffData>): SignOffData => ({
  state: "draft",
  sentence: "Prepared; not yet submitted for checking.",
  entries: [],
  titleBlock: { prepared: { name: "Eddie Editor", date: "2026-11-30T10:00:00Z" }, checked: null, approved: null },
  allowed: [],
  ...over,
});

const show = (d: SignOffData, concerns: string[] = []) => showSignOff(d, concerns, 2);

describe("the version's findings in the sign-off dialogs", () => {
  it.each([
    ["submit", "Submit for checking", "Before you submit it (say in the note why it stands), this version shows:"],
    ["check", "Mark checked", "Before you mark it checked, this version shows:"],
    ["approve", "Approve", "Before you approve, this version shows:"],
  ] as const)("%s lists them first", async (step, button, heading) => {
    show(data({ allowed: [step] }), ["Sliding factor of safety 1.213, below the required 1.5 (as drawn)"]);
    await userEvent.setup().click(screen.getByRole("button", { name: button }));
    const box = within(screen.getByTestId("signoff-dialog")).getByTestId("signoff-concerns");
    expect(box.querySelector("p")!.textContent).toBe(heading);
    expect(within(box).getByText("Sliding factor of safety 1.213, below the required 1.5 (as drawn)")).toBeTruthy();
    // the findings ask to say why it stands: the note's label names that place
    expect(within(screen.getByTestId("signoff-dialog")).getByLabelText("Why it stands despite the above (optional; kept in the sign-off record)").tagName).toBe("TEXTAREA");
  });

  it("without findings the note keeps its own words", async () => {
    show(data({ state: "checked", allowed: ["approve"] }));
    await userEvent.setup().click(screen.getByRole("button", { name: "Approve" }));
    const dialog = within(screen.getByTestId("signoff-dialog"));
    expect(dialog.getByLabelText("A note for the record (optional)").tagName).toBe("TEXTAREA");
    expect(dialog.queryByText(/Why it stands/)).toBeNull();
  });

  it("a return needs no such list; without findings there is none", async () => {
    show(data({ state: "submitted", allowed: ["return"] }), ["anything"]);
    await userEvent.setup().click(screen.getByRole("button", { name: "Return with comments" }));
    expect(within(screen.getByTestId("signoff-dialog")).queryByTestId("signoff-concerns")).toBeNull();
  });

  it("a superseded version says why it offers no submit", () => {
    show(data({ state: "returned", allowed: [], newer: 3 }));
    expect(screen.getByTestId("signoff-superseded").textContent).toBe("v3 is newer: only the latest version is submitted for checking.");
    expect(screen.queryByRole("button", { name: "Submit for checking" })).toBeNull();
  });
});
