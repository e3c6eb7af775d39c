// A comment pin drawn over the version's drawing leans its head clear of the drawing's numbers
// (a reaction's value beside a support stays readable), its tip on the point it marks; the button
// laid over its head for the keyboard follows the head. jsdom lays nothing out: the text boxes
// are given here as a browser would measure them.
import { afterEach, describe, expect, it } from "vitest";
import { drawPins } from "@/components/review/drawingOverlay";

const NS = "http://www.w3.org/2000/svg";
type Box = { x: number; y: number; width: number; height: number };
const proto = SVGElement.prototype as unknown as { getBBox?: () => Box };
const before = proto.getBBox;
afterEach(() => {
  proto.getBBox = before;
  document.body.innerHTML = "";
});

/** A drawing whose content group is shifted by (40, 300), with one value label at `label` (content pixels). */
function drawing(label: Box): SVGSVGElement {
  const svg = document.createElementNS(NS, "svg");
  const group = document.createElementNS(NS, "g");
  group.setAttribute("transform", "translate(40 300)");
  const support = document.createElementNS(NS, "g");
  support.setAttribute("data-id", "s1");
  const value = document.createElementNS(NS, "text");
  value.textContent = "12.4 kN";
  value.setAttribute("data-box", JSON.stringify(label));
  support.appendChild(value);
  group.appendChild(support);
  svg.appendChild(group);
  document.body.appendChild(svg);
  proto.getBBox = function (this: SVGElement) {
    const b = this.getAttribute("data-box");
    return b ? (JSON.parse(b) as Box) : { x: 0, y: 0, width: 0, height: 0 };
  };
  return svg;
}

const pin = (n: number, point: [number, number]) => ({ threadId: `t${n}`, n, name: `Comment ${n}`, at: { point }, resolved: false, selected: false });

describe("comment pins beside the drawing's numbers", () => {
  it("the head leans left of a value written at the point's upper right; the button follows the head", () => {
    // the pin marks (2 m, 1 m) at 100 px a metre: (200, −100) in the content group
    const svg = drawing({ x: 204, y: -130, width: 44, height: 14 });
    const [spot] = drawPins(svg, [pin(1, [2, 1])], 100);
    const g = svg.querySelector('[data-thread="t1"]')!;
    expect(g.getAttribute("data-lean")).toBe("-40");
    expect(g.getAttribute("transform")).toBe("translate(200.0 -100.0)");
    expect(g.querySelector("path")!.getAttribute("transform")).toBe("rotate(-40)");
    // the number stays upright, in the head: 18 px from the tip at −40° (sin 0.6428, cos 0.7660)
    const n = g.querySelector("text")!;
    expect([n.getAttribute("x"), n.getAttribute("y"), n.textContent]).toEqual(["-11.6", "-13.8", "1"]);
    // the button's spot is the head, in the svg's pixels (the group's shift added)
    expect(spot).toMatchObject({ threadId: "t1", x: 228.4, y: 186.2 });
  });

  it("with no number near, stands upright as ever; a second pin on the same point does not cover the first", () => {
    const svg = drawing({ x: 500, y: 500, width: 40, height: 14 });
    const [a, b] = drawPins(svg, [pin(1, [2, 1]), pin(2, [2, 1])], 100);
    expect(svg.querySelector('[data-thread="t1"]')!.getAttribute("data-lean")).toBe("0");
    expect(svg.querySelector('[data-thread="t1"] path')!.hasAttribute("transform")).toBe(false);
    expect(a).toMatchObject({ x: 240, y: 182 });
    expect(svg.querySelector('[data-thread="t2"]')!.getAttribute("data-lean")).toBe("125");
    // the heads 22 px across: the second's starts below the first's
    expect(b.y - 11).toBeGreaterThanOrEqual(a.y + 11);
  });
});
