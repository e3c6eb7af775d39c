// The result is said to a screen reader once it settles: not while a drag lasts (each pointer move
// changes the panel), and once after it ends; the region is a polite status.
import { act, render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { moveElement } from "@/canvas/commands/move";
import type { Command } from "@/canvas/commands/define";
import { ResultAnnouncer } from "@/components/editor/ResultAnnouncer";
import { beam } from "./editor-helpers";

const wait = (ms: number) => act(() => new Promise((r) => setTimeout(r, ms)));

describe("the result said aloud", () => {
  it("is a polite status, said once the result settles, and not while a drag lasts", async () => {
    const editor = createEditorStore({ sketch: beam("F1") });
    render(
      <EditorProvider editor={editor}>
        <ResultAnnouncer settleMs={60} />
      </EditorProvider>,
    );
    const region = screen.getByRole("status");
    expect(region).toHaveTextContent("");
    await wait(150);
    // 10 kN at mid-span and the beam's 100 kg: half of 10.98 kN on each support (statics, common practice)
    expect(region).toHaveTextContent("Holds — all supports within their limits; the largest reaction is 5.49 kN at the left pin");

    // drag the 10 kN load 1.5 m toward the right pad, move by move
    act(() => editor.getState().beginGesture());
    for (let i = 1; i <= 5; i++) {
      act(() => editor.getState().updateGesture(moveElement({ ids: ["l1"], delta: [0.3 * i, 0] }) as Command<unknown>));
      await wait(100);
      // each move changes the result, but nothing new is said while the drag lasts
      expect(region).toHaveTextContent(/5\.49 kN at the left pin$/);
    }
    act(() => editor.getState().endGesture());
    await wait(150);
    // the load at 3.5 m of the 4 m span: 10 kN × 3.5/4 + 0.49 kN = 9.24 kN at the right pad (statics, common practice)
    expect(region).toHaveTextContent(/the largest reaction is 9\.24 kN at the right pad$/);
  });
});
