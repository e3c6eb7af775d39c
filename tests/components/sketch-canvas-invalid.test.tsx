// A field whose expression cannot be worked out (an angle naming a parameter that does not exist)
// must not reach the canvas as NaN: the element is marked as having an error, by shape and words.
import { waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { exampleById } from "@/canvas/examples";
import { setField } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands";
import { drawnTexts, onCanvas, stage } from "./canvas-support";

afterEach(() => vi.restoreAllMocks());

/** The washing-cart example on a canvas, drawn once. */
const cartOnCanvas = () => onCanvas(exampleById("washing-cart")!.sketch);

describe("SketchCanvas with a field in error", () => {
  it("draws no NaN and marks the element: a dashed ring with a question mark and the field named", async () => {
    const warn = vi.spyOn(console, "warn");
    const editor = await cartOnCanvas();
    editor.getState().apply(setField({ id: "lance", field: "angle", value: "phi + 5 deg" }) as Command<unknown>);
    editor.getState().select(["lance"]);
    await waitFor(() => expect(drawnTexts().some((t) => /angle: cannot be worked out/.test(t))).toBe(true));
    for (const layer of stage().getLayers()) layer.draw();
    const nan = warn.mock.calls.map((c) => String(c[0])).filter((m) => /NaN|not a valid/i.test(m));
    expect(nan).toEqual([]);
  });

  it("marks an element whose position cannot be worked out instead of leaving it out", async () => {
    const warn = vi.spyOn(console, "warn");
    const editor = await cartOnCanvas();
    editor.getState().apply(setField({ id: "lance", field: ["at", 1], value: "nozzle_height" }) as Command<unknown>);
    await waitFor(() => expect(drawnTexts().some((t) => /position: cannot be worked out/.test(t))).toBe(true));
    expect(drawnTexts()).toContain("lance tip");
    for (const layer of stage().getLayers()) layer.draw();
    expect(warn.mock.calls.map((c) => String(c[0])).filter((m) => /NaN|not a valid/i.test(m))).toEqual([]);
  });
});
