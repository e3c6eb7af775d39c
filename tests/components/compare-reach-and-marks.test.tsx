// The comparison is reached from the version history (tick two versions, follow the link), and
// its drawings mark what changed by an outline's dash pattern and a word, never by colour alone.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { drawMarks, OVERLAY_CLASS } from "@/components/review/drawingOverlay";
import { VersionHistory } from "@/components/versions/VersionHistory";
import { jsonResponse } from "./editor-helpers";
import { versionItem as item } from "./version-items";

afterEach(() => vi.unstubAllGlobals());

describe("the version history leads to the comparison", () => {
  it("ticking two versions offers 'Compare vA → vB', oldest first; a third tick replaces the earlier pick; unticking takes the link away", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => jsonResponse({ versions: [item(3, "smaller block"), item(2, "thicker wall"), item(1, "anchor block as quoted")] })));
    const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={qc}>
        <VersionHistory sketchId="sk1" latest={3} canFork={false} onFork={() => {}} compareHref={(a, b) => `/workspaces/w1/sketches/sk1/compare?from=${a}&to=${b}`} />
      </QueryClientProvider>,
    );
    await screen.findByTestId("version-row-1");
    const user = userEvent.setup();
    expect(screen.getByText("Tick two versions to compare them.")).toBeTruthy();
    expect(screen.queryByTestId("compare-picked")).toBeNull();

    // picked newest first, the link still reads from the older to the newer
    await user.click(within(screen.getByTestId("version-row-3")).getByRole("checkbox", { name: "Compare version 3" }));
    expect(screen.queryByTestId("compare-picked")).toBeNull();
    await user.click(screen.getByRole("checkbox", { name: "Compare version 1" }));
    let link = screen.getByRole("link", { name: "Compare v1 → v3" });
    expect(link.getAttribute("href")).toBe("/workspaces/w1/sketches/sk1/compare?from=1&to=3");
    expect(screen.getByText("Compare v1 with v3.")).toBeTruthy();

    // a third tick keeps the last pick (v1) and the new one (v2)
    await user.click(screen.getByRole("checkbox", { name: "Compare version 2" }));
    expect((screen.getByRole("checkbox", { name: "Compare version 3" }) as HTMLInputElement).checked).toBe(false);
    link = screen.getByRole("link", { name: "Compare v1 → v2" });
    expect(link.getAttribute("href")).toBe("/workspaces/w1/sketches/sk1/compare?from=1&to=2");

    await user.click(screen.getByRole("checkbox", { name: "Compare version 2" }));
    expect(screen.queryByTestId("compare-picked")).toBeNull();
    expect(screen.getByText("Tick two versions to compare them.")).toBeTruthy();
  });

  it("offers no ticks where no comparison is wired", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => jsonResponse({ versions: [item(2, "thicker wall"), item(1, "anchor block as quoted")] })));
    const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={qc}>
        <VersionHistory sketchId="sk1" latest={2} canFork={false} onFork={() => {}} />
      </QueryClientProvider>,
    );
    await screen.findByTestId("version-row-1");
    expect(screen.queryAllByRole("checkbox")).toHaveLength(0);
  });
});

describe("marks on a comparison's drawing", () => {
  // jsdom lays nothing out: each element's drawn box is given here, as the browser would measure it
  const BOXES: Record<string, { x: number; y: number; width: number; height: number }> = {
    trailer: { x: 10, y: 20, width: 200, height: 80 },
    wind: { x: 250, y: 30, width: 40, height: 12 },
    supply: { x: 300, y: 90, width: 24, height: 24 },
    // a neighbouring port's name, written just above the trailer's top left corner
    "inlet-name": { x: 0, y: -4, width: 70, height: 14 },
  };
  beforeAll(() => {
    Object.defineProperty(SVGElement.prototype, "getBBox", {
      configurable: true,
      value(this: SVGElement) {
        return BOXES[this.getAttribute("data-id") ?? ""] ?? { x: 0, y: 0, width: 0, height: 0 };
      },
    });
  });

  function drawing(): SVGSVGElement {
    document.body.innerHTML = `<svg xmlns="http://www.w3.org/2000/svg" width="640" height="400"><g transform="translate(40 300)">
      <g data-kind="body" data-id="trailer"><path d="M0 0 L200 0"/></g>
      <g data-kind="load" data-id="wind"><path d="M0 0 L40 0"/></g>
      <g data-kind="port" data-id="supply"><path d="M0 0 L24 0"/></g>
      <g data-kind="support" data-id="leg"><path d="M0 0 L8 0"/></g>
    </g></svg>`;
    return document.querySelector("svg")!;
  }

  it("outlines each element with its own dash pattern and word: changed, added, removed", () => {
    const svg = drawing();
    drawMarks(svg, { trailer: "changed", wind: "added", supply: "removed" });
    const rect = (id: string) => svg.querySelector(`rect[data-mark-id="${id}"]`)!;
    expect(["trailer", "wind", "supply"].map((id) => rect(id).getAttribute("data-mark"))).toEqual(["changed", "added", "removed"]);
    // the outline stands 7 px clear of the element's box
    expect(["x", "y", "width", "height"].map((a) => Number(rect("trailer").getAttribute(a)))).toEqual([3, 13, 214, 94]);
    // told apart without colour: three different dash patterns (solid for added), and three words
    const dashes = ["trailer", "wind", "supply"].map((id) => rect(id).getAttribute("stroke-dasharray"));
    expect(dashes).toEqual(["6 3", "", "2 3"]);
    expect(new Set(dashes).size).toBe(3);
    const words = [...svg.querySelectorAll(`g.${OVERLAY_CLASS}-marks text`)].map((t) => t.textContent);
    expect(words).toEqual(["△ changed", "+ added", "× removed"]);
    // each word sits just above its outline
    const trailerWord = svg.querySelectorAll(`g.${OVERLAY_CLASS}-marks text`)[0];
    expect([Number(trailerWord.getAttribute("x")), Number(trailerWord.getAttribute("y"))]).toEqual([5, 9]);
  });

  it("a word that would cover a neighbour's label goes to the outline's other corner", () => {
    const svg = drawing();
    const name = document.createElementNS("http://www.w3.org/2000/svg", "text");
    name.setAttribute("data-id", "inlet-name");
    name.textContent = "inlet";
    svg.querySelector("g[data-id='trailer']")!.parentElement!.appendChild(name);
    drawMarks(svg, { trailer: "changed" });
    const word = svg.querySelector(`g.${OVERLAY_CLASS}-marks text[data-mark-word="trailer"]`)!;
    // above the right corner (outline 3 … 217), its end 2 px inside it: clear of the label (0 … 70)
    expect([word.getAttribute("x"), word.getAttribute("y"), word.getAttribute("text-anchor")]).toEqual(["215", "9", "end"]);
  });

  it("an element with nothing to mark, or not drawn, gets no mark; drawing again replaces the marks rather than adding to them", () => {
    const svg = drawing();
    drawMarks(svg, { trailer: "changed", ghost: "removed" });
    drawMarks(svg, { wind: "added" });
    expect(svg.querySelectorAll(`g.${OVERLAY_CLASS}-marks`)).toHaveLength(1);
    expect([...svg.querySelectorAll("rect[data-mark]")].map((r) => r.getAttribute("data-mark-id"))).toEqual(["wind"]);
    expect(svg.querySelector('rect[data-mark-id="leg"]')).toBeNull();
  });
});
