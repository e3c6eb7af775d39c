// A CSV is of the sketch on screen: while the input has errors the panel shows the last good result,
// faded and marked, but a downloaded file carries no such mark, so neither CSV is offered then.
import { readFileSync } from "node:fs";
import { act, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { setParameter } from "@/canvas/commands";
import { mountResultsDock } from "./editor-helpers";

const load = (n: string) => JSON.parse(readFileSync(`tests/fixtures/sketches/${n}.json`, "utf8"));

describe("CSV while the result shown is the last good one", () => {
  it("the reactions' and the hand check's CSV are refused, with the reason, and come back once the input is put right", async () => {
    const user = userEvent.setup();
    const editor = mountResultsDock(load("thrust-stand-tips"));
    const reactionsCsv = () => screen.getByRole("button", { name: "Download the reactions as CSV" });
    expect(reactionsCsv()).toBeEnabled();
    act(() => void editor.getState().apply(setParameter({ name: "T", expression: "2.2 kN +" })));
    await waitFor(() => expect(reactionsCsv()).toBeDisabled());
    expect(reactionsCsv()).toHaveAccessibleDescription(/input has errors/);
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    const handCsv = screen.getByRole("button", { name: "Download the hand check as CSV" });
    expect(handCsv).toBeDisabled();
    expect(handCsv).toHaveAccessibleDescription(/input has errors/);
    act(() => void editor.getState().apply(setParameter({ name: "T", expression: "2.2 kN" })));
    await waitFor(() => expect(screen.getByRole("button", { name: "Download the hand check as CSV" })).toBeEnabled());
    await user.click(screen.getByRole("tab", { name: "Reactions" }));
    expect(reactionsCsv()).toBeEnabled();
  });
});
