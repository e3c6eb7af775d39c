// The calc sheet's sweep chart: each crossing's label on a line of its own, over a paper-coloured
// halo, so a label that runs across another crossing's dashed line stays readable in the PDF.
import { describe, expect, it } from "vitest";
import { lineChartSvg } from "@/lib/calcsheet/chart";
import { haloBehindLabels } from "@/lib/calcsheet/pdf";

describe("sweep chart markers", () => {
  it("prints each crossing's label once over its halo, one line a marker", () => {
    const points: Array<[number, number]> = [0, 25, 50, 75, 100].map((x) => [x, 1 - x / 50]);
    const svg = lineChartSvg({
      title: "t",
      xLabel: "Vout (m/s)",
      yLabel: "kN",
      series: [{ label: "margin", points, markZero: true }],
      markers: [
        { x: 74.86, label: "Rear wheel (braked): lift-off at 74.86 m/s" },
        { x: 35.01, label: "Rear wheel (braked): slip at 35.01 m/s" },
      ],
    });
    const labels = [...svg.matchAll(/<text [^>]*y="([\d.]+)"[^>]*paint-order="stroke"[^>]*>([^<]*)<\/text>/g)].map((m) => [m[2], Number(m[1])] as const);
    expect(labels.map(([t]) => t)).toEqual(["Rear wheel (braked): lift-off at 74.86 m/s", "Rear wheel (braked): slip at 35.01 m/s"]);
    expect(labels[1][1] - labels[0][1]).toBe(10);
    // for the PDF (its renderer ignores paint-order) each becomes the halo, then the letters on it
    const pdf = haloBehindLabels(svg);
    expect(pdf.split("slip at 35.01 m/s").length - 1).toBe(2);
    expect(pdf).toMatch(/fill="#fbfaf6" stroke="#fbfaf6" stroke-width="3" stroke-linejoin="round">Rear wheel \(braked\): slip at 35\.01 m\/s<\/text><text [^>]*fill="#b4462b"[^>]*>Rear wheel \(braked\): slip at 35\.01 m\/s/);
  });
});
