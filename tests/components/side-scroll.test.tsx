// A wide table on a narrow screen scrolls sideways and says so: a fade with › at its right edge
// while there is more to its right (the comparison's reactions, whose last column is the change of
// state, and every report table), gone once scrolled to the end.
import { act, render, screen } from "@testing-library/react";
import { afterAll, describe, expect, it } from "vitest";
import { SideScroll } from "@/components/studies/ReportTable";
import { ReactionsTable } from "@/components/review/CompareTables";
import { compareSketches } from "@/lib/review/compare";
import { readFileSync } from "node:fs";

const sizes = { scrollWidth: 0, clientWidth: 0 };
// jsdom lays nothing out: the box's widths are given here (on HTMLElement, over Element's own)
Object.defineProperty(HTMLElement.prototype, "scrollWidth", { configurable: true, get: () => sizes.scrollWidth });
Object.defineProperty(HTMLElement.prototype, "clientWidth", { configurable: true, get: () => sizes.clientWidth });
afterAll(() => {
  delete (HTMLElement.prototype as { scrollWidth?: number }).scrollWidth;
  delete (HTMLElement.prototype as { clientWidth?: number }).clientWidth;
});

describe("a table wider than its box", () => {
  it("shows › while there is more to the right, and not once scrolled to the end", () => {
    sizes.scrollWidth = 620;
    sizes.clientWidth = 358;
    render(
      <SideScroll>
        <table>
          <tbody>
            <tr>
              <td>front jack</td>
            </tr>
          </tbody>
        </table>
      </SideScroll>,
    );
    expect(screen.getByTestId("more-to-the-right")).toBeTruthy();
    const box = screen.getByRole("table").parentElement!;
    act(() => {
      box.scrollLeft = 262;
      box.dispatchEvent(new Event("scroll"));
    });
    expect(screen.queryByTestId("more-to-the-right")).toBeNull();
  });

  it("the comparison's reactions table has it on a narrow screen, and none when it fits", () => {
    const trailer = JSON.parse(readFileSync("canvas/examples/fire-monitor-trailer.json", "utf8"));
    const heavier = { ...trailer, bodies: [{ ...trailer.bodies[0], mass: "1250 kg" }] };
    sizes.scrollWidth = 640;
    sizes.clientWidth = 358;
    const { unmount } = render(<ReactionsTable comparison={compareSketches(trailer, heavier)} />);
    expect(screen.getByTestId("more-to-the-right")).toBeTruthy();
    unmount();
    sizes.clientWidth = 900;
    sizes.scrollWidth = 900;
    render(<ReactionsTable comparison={compareSketches(trailer, heavier)} />);
    expect(screen.queryByTestId("more-to-the-right")).toBeNull();
  });
});
