// Kept changes made on v1, brought onto v2 where a colleague changed the same fields: the editor's
// "kept changes are back" notice and the comparison of the kept changes name each field as the
// screens do (the element's kind, label and id, the form's word) with both values in the units
// on screen, never as a file path such as "bodies[trailer].mass".
import { readFileSync } from "node:fs";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { act, render, screen } from "@testing-library/react";
import { renderToString } from "react-dom/server";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { emptySketch } from "@/canvas/model/elements";
import type { SketchFile } from "@/solver/schema";
import { keepDraft } from "@/components/versions/editor/drafts";
import { current } from "@/components/versions/editor/restoreDraft";
import { CompareScreen } from "@/components/review/CompareScreen";
import { withModalDialogs, withResizeObserver } from "./dialog-support";
import { jsonResponse } from "./editor-helpers";
import { setSearch } from "../support/navigation";

const { SavedSketchEditor } = await import("@/components/versions/editor/SavedSketchEditor");

/** Demo data: the trailer (950 kg, Q = 1250 gpm) as v1. */
const v1: SketchFile = { ...emptySketch(), ...current(JSON.parse(readFileSync("canvas/examples/fire-monitor-trailer.json", "utf8")) as SketchFile) };
const withMass = (doc: SketchFile, mass: string, q: string): SketchFile => ({ ...doc, parameters: { ...doc.parameters, Q: q }, bodies: [{ ...doc.bodies[0], mass }, ...doc.bodies.slice(1)] });
/** v2, saved by a colleague: 1100 kg, 1300 gpm. Mine, kept on v1: 1250 kg, 1400 gpm. */
const v2 = withMass(v1, "1100 kg", "1300 gpm");
const mine = withMass(v1, "1250 kg", "1400 gpm");

beforeAll(() => {
  withModalDialogs();
  withResizeObserver();
});
afterEach(() => {
  vi.unstubAllGlobals();
  window.localStorage.clear();
});

function serve() {
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string) => {
      if (path === "/api/sketches/sk1") return jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", workspaceName: "Bay 4", title: "Trailer", role: "editor", latestVersion: 2 } });
      const v = /^\/api\/sketches\/sk1\/versions\/(\d+)$/.exec(path);
      if (v) return jsonResponse({ version: { number: Number(v[1]), message: "", createdAt: "2026-11-30T10:00:00Z", document: v[1] === "2" ? v2 : v1 } });
      if (path === "/api/sketches/sk1/versions") return jsonResponse({ versions: [1, 2].map((number) => ({ number, message: "", createdAt: "2026-11-30T10:00:00Z", authorName: "Eddie Editor", status: "holds", reviewState: "draft" })) });
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
}

const keep = () => keepDraft({ sketchId: "sk1", tab: "othertab", baseVersion: 1, latestVersion: 1, message: "", sketch: mine });

describe("fields both sides changed, in words", () => {
  it("the kept changes brought back name the body's mass and the parameter, with both values", async () => {
    keep();
    serve();
    setSearch("restore=1&draft=othertab");
    render(<SavedSketchEditor id="sk1" />);
    const notice = await screen.findByTestId("restored-work");
    await act(async () => {});
    expect(notice.textContent).toContain(
      "Your kept changes are back on top of v2. You and a later version both changed these, and yours are used — check them before saving: Parameter Q (yours 1400 gpm; v2 has 1300 gpm); Body Monitor trailer (trailer): mass (yours 1250 kg; v2 has 1100 kg).",
    );
    expect(notice.textContent).not.toMatch(/bodies\[|parameters\./);
  });

  it("the comparison of the kept changes says the same above its tables", async () => {
    keep();
    serve();
    render(
      <QueryClientProvider client={new QueryClient()}>
        <CompareScreen workspaceId="w1" sketchId="sk1" sketchTitle="Trailer" from={2} to="draft" draftTab="othertab" />
      </QueryClientProvider>,
    );
    const clash = await screen.findByTestId("kept-work-conflicts");
    expect(clash.querySelector("p")!.textContent).toBe("You and a later version both changed these, and bringing your changes back uses yours:");
    expect([...clash.querySelectorAll("li")].map((li) => li.textContent)).toEqual([
      "Parameter Q (yours 1400 gpm; v2 has 1300 gpm)",
      "Body Monitor trailer (trailer): mass (yours 1250 kg; v2 has 1100 kg)",
    ]);
  });

  it("the server's page of the kept changes waits for the browser, which alone can read them (no mismatch when hydrating)", async () => {
    serve();
    const page = () => (
      <QueryClientProvider client={new QueryClient()}>
        <CompareScreen workspaceId="w1" sketchId="sk1" sketchTitle="Trailer" from={2} to="draft" draftTab="othertab" />
      </QueryClientProvider>
    );
    // nothing kept here: the server still does not say so, as it cannot know
    const html = renderToString(page());
    expect(html).not.toContain("There are no kept changes");
    expect(html).toContain("animate-pulse");
    // the browser says it
    render(page());
    expect(await screen.findByText("There are no kept changes for this sketch in this browser.")).toBeTruthy();
  });
});
