// A reader whose role takes the version's next step but who is offered no button is told why, in
// the rules table's words: the author of a submitted version may not check it (no self-check).
import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { whyNoStep, type SignOffData } from "@/components/review/SignOff";
import { showSignOff } from "./signoff-support";
import { SIGN_OFF_RULES } from "@/lib/review/rules";

const submitted = (over: Partial<SignOffData>): SignOffData => ({
  state: "submitted",
  sentence: "Submitted for checking.",
  entries: [],
  titleBlock: { prepared: { name: "Olivia Owner", date: "2026-11-30T10:00:00Z" }, checked: null, approved: null },
  allowed: [],
  ...over,
});

const show = (d: SignOffData) => showSignOff(d, undefined, 3);

describe("why the reader is offered no sign-off step", () => {
  it("an owner who prepared a submitted version: someone else must check it", () => {
    show(submitted({ you: { role: "owner", isAuthor: true, isChecker: false } }));
    expect(screen.getByTestId("signoff-why-not").textContent).toBe(SIGN_OFF_RULES.check.refused.author);
    expect(screen.queryByTestId("signoff-check")).toBeNull();
  });

  it("a checker who prepared it is told the same", () => {
    expect(whyNoStep(submitted({ you: { role: "checker", isAuthor: true, isChecker: false } }))).toBe("You prepared this version: someone else must check it.");
  });

  it("says nothing when a step is open, when the role takes no part, or when the state alone stops it", () => {
    // a checker who did not prepare it has buttons
    expect(whyNoStep(submitted({ allowed: ["check", "return"], you: { role: "checker", isAuthor: false, isChecker: false } }))).toBeNull();
    // a viewer takes no step in any state: no sentence about it
    expect(whyNoStep(submitted({ you: { role: "viewer", isAuthor: false, isChecker: false } }))).toBeNull();
    // an editor waits for the checker: the state sentence says so already
    expect(whyNoStep(submitted({ you: { role: "editor", isAuthor: true, isChecker: false } }))).toBeNull();
    // an owner on a checked version has the approval note instead
    expect(
      whyNoStep(submitted({ state: "checked", approval: { reason: "r", remedy: null, membersPath: "/m" }, you: { role: "owner", isAuthor: true, isChecker: false } })),
    ).toBeNull();
    // an answer without `you` (an older server) shows nothing
    show(submitted({}));
    expect(screen.queryByTestId("signoff-why-not")).toBeNull();
  });
});
