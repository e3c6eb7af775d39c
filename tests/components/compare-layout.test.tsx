// The comparison keeps its choice of drawings in the address: opened with ?drawings=overlay it lays
// them over each other, and switching writes the choice back (a link sent to a colleague shows the
// same view).
import { readFileSync } from "node:fs";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { withResizeObserver } from "./dialog-support";

const { CompareScreen } = await import("@/components/review/CompareScreen");

const trailer = JSON.parse(readFileSync("canvas/examples/fire-monitor-trailer.json", "utf8"));
const heavier = { ...trailer, bodies: [{ ...trailer.bodies[0], mass: "1250 kg" }] };

beforeAll(() => {
  withResizeObserver();
});
afterEach(() => {
  vi.unstubAllGlobals();
  window.history.replaceState(null, "", "/");
});

function serve() {
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string) => {
      const body = path.endsWith("/versions")
        ? { versions: [2, 1].map((number) => ({ number, message: `v${number}`, createdAt: "2026-11-30T10:00:00Z", authorName: "Eddie Editor", status: "holds", reviewState: "draft" })) }
        : { version: { number: Number(path.split("/").pop()), message: "", document: path.endsWith("/1") ? trailer : heavier } };
      return new Response(JSON.stringify(body), { status: 200, headers: { "content-type": "application/json" } });
    }),
  );
}

const show = (layout?: "side" | "overlay") =>
  render(
    <QueryClientProvider client={new QueryClient()}>
      <CompareScreen workspaceId="w1" sketchId="s1" sketchTitle="Trailer" from={1} to={2} layout={layout} />
    </QueryClientProvider>,
  );

describe("the comparison's drawings in the address", () => {
  it("opens overlaid when the address says so, and switching to side by side takes it out of the address", async () => {
    serve();
    window.history.replaceState(null, "", "/workspaces/w1/sketches/s1/compare?from=1&to=2&drawings=overlay");
    show("overlay");
    expect(await screen.findByTestId("compare-overlay")).toBeTruthy();
    await userEvent.setup().click(screen.getByRole("radio", { name: "Side by side" }));
    expect(await screen.findByTestId("compare-side-by-side")).toBeTruthy();
    expect(window.location.search).toBe("?from=1&to=2");
  });

  it("opens side by side by default, and choosing Overlaid puts drawings=overlay in the address", async () => {
    serve();
    window.history.replaceState(null, "", "/workspaces/w1/sketches/s1/compare?from=1&to=2");
    show();
    expect(await screen.findByTestId("compare-side-by-side")).toBeTruthy();
    await userEvent.setup().click(screen.getByRole("radio", { name: /Overlaid/ }));
    expect(await screen.findByTestId("compare-overlay")).toBeTruthy();
    expect(window.location.search).toBe("?from=1&to=2&drawings=overlay");
  });
});
