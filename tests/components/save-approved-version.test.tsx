// Editing a version that is under review or approved: the toolbar says its sign-off state beside
// its number, and the save dialog says that the check and approval stay with that version while
// the new one starts its own review (a saved version never changes; common practice for a
// checked-and-approved calculation: a revision is checked and approved again).
import { act, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import type { ReviewState } from "@/lib/review/rules";
import { reviewNote } from "@/components/versions/editor/reviewNote";
import { withModalDialogs, withResizeObserver } from "./dialog-support";
import { beamWithInlet, changeInletArea, jsonResponse } from "./editor-helpers";

const { SavedSketchEditor } = await import("@/components/versions/editor/SavedSketchEditor");

beforeAll(() => {
  withModalDialogs();
  withResizeObserver();
});
afterEach(() => vi.unstubAllGlobals());



/** Sketch sk1 at v3, whose sign-off is in `state` (`null`: the sign-off cannot be read). */
function serve(state: ReviewState | null) {
  const asked: string[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string) => {
      asked.push(path);
      if (path === "/api/sketches/sk1") return jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", workspaceName: "Bay 4", title: "Beam on a pin and a contact", role: "editor", latestVersion: 3 } });
      if (path === "/api/sketches/sk1/versions/3") return jsonResponse({ version: { number: 3, document: beamWithInlet() } });
      if (path === "/api/sketches/sk1/versions/3/signoff" && state) return jsonResponse({ state });
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
  return asked;
}

async function openAndSave(state: ReviewState | null) {
  const asked = serve(state);
  render(<SavedSketchEditor id="sk1" />);
  await screen.findByTestId("version-bar");
  await act(async () => {});
  await waitFor(() => expect(asked).toContain("/api/sketches/sk1/versions/3/signoff"));
  // a change to save: the inlet's area
  await changeInletArea();
  fireEvent.keyDown(document.body, { key: "s", ctrlKey: true });
  return screen.findByTestId("save-dialog");
}

describe("saving on top of a version under review", () => {
  it("an approved v3: the toolbar says so, and the dialog says the new version needs its own check and approval", async () => {
    const dialog = await openAndSave("approved");
    await waitFor(() => expect(screen.getByTestId("version-label")).toHaveTextContent("v3 · approved"));
    expect(within(dialog).getByTestId("save-review-note")).toHaveTextContent(
      "v3 is approved. Its approval stays with v3: the new version is a draft that needs checking and approval of its own before it replaces v3 on a job.",
    );
  });

  it("a checked v3 asks to tell the checker and the approver", async () => {
    const dialog = await openAndSave("checked");
    await waitFor(() => expect(screen.getByTestId("version-review-state")).toHaveTextContent("· checked"));
    expect(within(dialog).getByTestId("save-review-note")).toHaveTextContent("the new version needs its own check, so tell the checker and the approver");
  });

  it("a prepared v3, or one whose sign-off cannot be read, says nothing about review", async () => {
    const dialog = await openAndSave("draft");
    expect(within(dialog).queryByTestId("save-review-note")).toBeNull();
    expect(screen.queryByTestId("version-review-state")).toBeNull();
    expect(screen.getByTestId("version-label")).toHaveTextContent(/^v3/);
  });

  it("the unreadable case", async () => {
    const dialog = await openAndSave(null);
    expect(within(dialog).queryByTestId("save-review-note")).toBeNull();
  });
});

describe("reviewNote", () => {
  it("has words for submitted, checked and approved only", () => {
    expect(reviewNote("submitted", 2)).toBe("v2 is submitted for checking. The checker reads v2, not the new version: tell them, and submit the new version when it is ready.");
    for (const s of ["draft", "returned", "withdrawn"] as const) expect(reviewNote(s, 2)).toBeNull();
    expect(reviewNote(null, 2)).toBeNull();
  });
});
