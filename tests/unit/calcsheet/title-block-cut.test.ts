// The title block holds the title in two lines, the revision note in two and each signer in one: what does not fit is
// cut there with an ellipsis and printed whole under the box, so a checker signs a sheet whose
// revision is stated in full (common practice: a calculation's revision note is part of its record).
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { EXAMPLES } from "@/canvas/examples";
import { pdfText } from "../../support/pdf-text";

const file = EXAMPLES.find((e) => e.id === "pipe-bend-anchor")!.sketch;
type Signoff = Array<{ role: "prepared" | "checked" | "approved"; name: string; at: Date }>;
const sheet = (sketchTitle: string, versionMessage: string, workspace: string, signoff: Signoff) =>
  buildCalcSheet({ workspace, sketchTitle, version: 3, versionMessage, savedAt: new Date(0), generatedAt: new Date(0), signoff, file }).then(pdfText);

describe("the calc sheet's title block", () => {
  it("prints a long title, workspace, revision note and signer whole under the box", { timeout: 60_000 }, async () => {
    const title = "DN150 long-radius bend on the riser anchor at the north pump house, hydrotest at fifteen bar, temporary spool";
    const message =
      "Raised the inlet pressure from 10 bar to the 15 bar hydrotest pressure; the outlet pressure now follows from the riser's rise and the bend's loss; the bend's mass includes the water inside it; the anchor is taken as fixed in both directions and in rotation, its couple printed in the reactions table; the flange stubs are part of the body.";
    const workspace = "Riverside Pump Station upgrade, phase two: north pump house and riser works";
    const signoff: Signoff = [{ role: "checked", name: "Maximiliana Oyelaran-Featherstonehaugh (structural checker)", at: new Date("2026-11-30T15:30:00Z") }];
    expect(title.length).toBeLessThanOrEqual(120);
    expect(message.length).toBeLessThanOrEqual(500);
    const { text } = await sheet(title, message, workspace, signoff);
    expect(text).toContain(`Title: ${title}`);
    expect(text).toContain(`Version 3: ${message}`);
    expect(text).toContain(`Workspace: ${workspace} `);
    expect(text).toContain("Checked by: Maximiliana Oyelaran-Featherstonehaugh (structural checker), 2026-11-30 15:30 UTC");
    // the box's own lines are cut, not run over the lines below them
    expect(text).toMatch(/Version 3 — Raised the inlet pressure[^…]*…/);
  });

  it("adds nothing under the box when everything fits", { timeout: 60_000 }, async () => {
    const { text } = await sheet("DN150 bend on the riser anchor", "Hydrotest case: 15 bar at the inlet", "Demo: Riverside Pump Station", [
      { role: "checked", name: "Chen Checker", at: new Date("2026-11-30T15:30:00Z") },
    ]);
    expect(text).toContain("Version 3 — Hydrotest case: 15 bar at the inlet");
    expect(text).not.toContain("Title:");
    expect(text).not.toContain("Version 3:");
    expect(text).toContain("Checked by Chen Checker, 2026-11-30 15:30 UTC");
    expect(text).not.toContain("Checked by:");
    expect(text.split("Workspace:")).toHaveLength(2);
  });
});
