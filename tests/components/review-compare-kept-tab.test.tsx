// "Compare" on the kept work a fresh tab offers compares that very draft (the tab named in the
// address), not the newest draft of whatever tab kept one since; and "Kept work" links it so.
import { readFileSync } from "node:fs";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { withResizeObserver } from "./dialog-support";

import { CompareScreen } from "@/components/review/CompareScreen";

const trailer = JSON.parse(readFileSync("canvas/examples/fire-monitor-trailer.json", "utf8"));

beforeAll(() => withResizeObserver());
afterEach(() => {
  vi.unstubAllGlobals();
  window.localStorage.clear();
});

function serve() {
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string) => {
      const body =
        path === "/api/sketches/s1"
          ? { sketch: { latestVersion: 1 } }
          : path.endsWith("/versions")
            ? { versions: [{ number: 1, message: "v1", createdAt: "2026-11-30T10:00:00Z", authorName: "Eddie Editor", status: "holds", reviewState: "draft" }] }
            : { version: { number: 1, message: "first", document: trailer } };
      return new Response(JSON.stringify(body), { status: 200, headers: { "content-type": "application/json" } });
    }),
  );
}

const kept = (tab: string, keptAt: string, mass: string) =>
  window.localStorage.setItem(`counterpoise:draft:s1:${tab}`, JSON.stringify({ sketchId: "s1", tab, baseVersion: 1, latestVersion: 1, message: "", keptAt, sketch: { ...trailer, bodies: [{ ...trailer.bodies[0], mass }] } }));

describe("comparing the kept work a tab offered", () => {
  it("compares the draft of the tab in the address, though another tab kept a newer one", async () => {
    kept("offered", "2026-11-30T10:00:00.000Z", "1250 kg");
    kept("later", "2026-11-30T11:00:00.000Z", "2000 kg");
    serve();
    render(
      <QueryClientProvider client={new QueryClient()}>
        <CompareScreen workspaceId="w1" sketchId="s1" sketchTitle="Trailer" from={1} to="draft" draftTab="offered" />
      </QueryClientProvider>,
    );
    const back = await screen.findByRole("link", { name: "Bring my changes back on top of the newest version" });
    expect(back.getAttribute("href")).toBe("/sketches/s1?restore=1&draft=offered");
    expect(document.body.textContent).toContain("950 kg→1250 kg");
    expect(document.body.textContent).not.toContain("2000 kg");
  });

  it("changes still open in the editor tab that asked (a save conflict's Compare) are looked at here, not brought back or discarded", async () => {
    kept("editing", "2026-11-30T10:00:00.000Z", "1250 kg");
    serve();
    render(
      <QueryClientProvider client={new QueryClient()}>
        <CompareScreen workspaceId="w1" sketchId="s1" sketchTitle="Trailer" from={1} to="draft" draftTab="editing" draftOpen />
      </QueryClientProvider>,
    );
    const note = await screen.findByTestId("draft-open-elsewhere");
    expect(note.textContent).toBe("Your changes are still open in the editor tab you came from: go back there to bring v1 in, or to save them as a fork. Nothing here changes them.");
    expect(document.body.textContent).toContain("950 kg→1250 kg");
    expect(screen.queryByRole("link", { name: "Bring my changes back on top of the newest version" })).toBeNull();
    expect(screen.queryByRole("button", { name: "Discard them" })).toBeNull();
    expect(window.localStorage.getItem("counterpoise:draft:s1:editing")).not.toBeNull();
  });
});
