// The editor's words for a screen reader (the drawing's summary and the announcement after a
// change) write forces in the unit of the results panel: the result's one unit, chosen from the
// largest force of the whole result (all in kN once any force reaches 1 kN: common practice on a
// calculation by hand), not each figure's own.
import { screen, waitFor } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { renderEditor } from "./editor-helpers";
import { sharedWeight } from "../fixtures/one-unit";

describe("the editor's words use the result's one force unit", () => {
  // 1.2 kN at mid-span of a beam without mass: 600 N on each support (statics, common practice);
  // on its own 600 N would be written in N, beside a 1.2 kN load the panel writes 0.6 kN
  it("the drawing's summary and the announcement say 0.6 kN, as the reactions table does", async () => {
    await renderEditor(sharedWeight);
    await waitFor(() => expect(screen.getByTestId("canvas-summary")).toHaveTextContent(/the largest reaction is 0\.6 kN/));
    await waitFor(() => expect(screen.getByTestId("result-announcer")).toHaveTextContent(/the largest reaction is 0\.6 kN/), { timeout: 5000 });
    expect(screen.getByTestId("canvas-summary").textContent).not.toMatch(/600 N/);
  });
});
