// A version that is submitted or checked while a newer version of the sketch exists is still
// checked and approved on its own (the sign-off is of one version), but the checker and the
// approver are told, beside the steps and in the step's dialog, that it does not carry over to the
// newer version: nobody marks v3 checked believing they signed off the v4 the author went on to save.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeAll, describe, expect, it } from "vitest";
import type { SignOffData } from "@/components/review/SignOff";
import { showSignOff } from "./signoff-support";
import { withModalDialogs } from "./dialog-support";

beforeAll(withModalDialogs);

const data = (over: Partial<SignOffData>): SignOffData => ({
  state: "submitted",
  sentence: "Submitted for checking.",
  entries: [],
  titleBlock: { prepared: { name: "Eddie Editor", date: "2026-11-30T10:00:00Z" }, checked: null, approved: null },
  allowed: [],
  ...over,
});

const show = (d: SignOffData) => showSignOff(d, undefined, 3);

describe("a sign-off step on a superseded version", () => {
  it("a submitted version with v4 saved since: the checker is told the check is of this version only", async () => {
    show(data({ newer: 4, allowed: ["check", "return"], you: { role: "checker", isAuthor: false, isChecker: false } }));
    expect(screen.getByTestId("signoff-superseded").textContent).toBe("v4 was saved after this version: a check or approval given here is of this version only and does not carry over to v4.");
    await userEvent.click(screen.getByTestId("signoff-check"));
    expect(within(screen.getByTestId("signoff-dialog")).getByTestId("signoff-dialog-superseded").textContent).toBe(
      "You are marking a superseded version checked: v4 was saved after it, and this check does not carry over to v4.",
    );
  });

  it("a checked version with v4 saved since: the approver is told the same", async () => {
    show(data({ state: "checked", sentence: "Checked; waiting for approval.", newer: 4, allowed: ["approve"], you: { role: "owner", isAuthor: false, isChecker: false } }));
    expect(screen.getByTestId("signoff-superseded").textContent).toContain("does not carry over to v4");
    await userEvent.click(screen.getByTestId("signoff-approve"));
    expect(within(screen.getByTestId("signoff-dialog")).getByTestId("signoff-dialog-superseded").textContent).toBe(
      "You are approving a superseded version: v4 was saved after it, and this approval does not carry over to v4.",
    );
  });

  it("the latest version says nothing of it; a returned one keeps its own note (only the latest is submitted)", async () => {
    const { unmount } = show(data({ allowed: ["check", "return"], you: { role: "checker", isAuthor: false, isChecker: false } }));
    expect(screen.queryByTestId("signoff-superseded")).toBeNull();
    await userEvent.click(screen.getByTestId("signoff-check"));
    expect(screen.queryByTestId("signoff-dialog-superseded")).toBeNull();
    unmount();
    show(data({ state: "returned", sentence: "Returned to its author with comments.", newer: 4, you: { role: "editor", isAuthor: true, isChecker: false } }));
    expect(screen.getByTestId("signoff-superseded").textContent).toBe("v4 is newer: only the latest version is submitted for checking.");
  });
});
