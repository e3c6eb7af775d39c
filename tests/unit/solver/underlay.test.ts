// The underlay's scale: calibrating on two marks a known distance apart, and tracing over it.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { calibrate, imageToWorld, rescaleAbout, worldToImage } from "@/solver";

describe("underlay scale", () => {
  it("two marks 480 px apart that are 2.4 m apart give 5 mm per pixel", () => {
    expect(calibrate([100, 200], [580, 200], 2.4)).toBeCloseTo(0.005, 15);
    expect(calibrate([0, 0], [300, 400], 10)).toBeCloseTo(0.02, 15);
    expect(() => calibrate([3, 3], [3, 3], 1)).toThrow(/same pixel/);
  });

  it("a body traced over a test image has the image's real size, within a pixel", async () => {
    // A test image: a dark 600 × 240 px rectangle (a skid 3.0 m × 1.2 m at 5 mm per pixel) with two
    // calibration marks 400 px apart, said to be 2.0 m apart.
    const W = 900;
    const H = 500;
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}"><rect width="${W}" height="${H}" fill="#fff"/><rect x="150" y="130" width="600" height="240" fill="#222"/><rect x="99" y="450" width="3" height="3" fill="#f00"/><rect x="499" y="450" width="3" height="3" fill="#f00"/></svg>`;
    const img = await sharp(Buffer.from(svg)).png().toBuffer();
    const { data, info } = await sharp(img).raw().toBuffer({ resolveWithObject: true });
    // find the marks (red pixels) and the dark rectangle's corners in the image, like a person clicking
    const red: Array<[number, number]> = [];
    let minX = Infinity;
    let maxX = -Infinity;
    let minY = Infinity;
    let maxY = -Infinity;
    for (let y = 0; y < info.height; y++) {
      for (let x = 0; x < info.width; x++) {
        const i = (y * info.width + x) * info.channels;
        const [r, g, b] = [data[i], data[i + 1], data[i + 2]];
        if (r > 200 && g < 60 && b < 60) red.push([x, y]);
        if (r < 60 && g < 60 && b < 60) {
          minX = Math.min(minX, x);
          maxX = Math.max(maxX, x + 1);
          minY = Math.min(minY, y);
          maxY = Math.max(maxY, y + 1);
        }
      }
    }
    const left = red.filter((p) => p[0] < 300);
    const right = red.filter((p) => p[0] >= 300);
    const centre = (ps: Array<[number, number]>): [number, number] => [ps.reduce((a, p) => a + p[0], 0) / ps.length, ps.reduce((a, p) => a + p[1], 0) / ps.length];
    const mpp = calibrate(centre(left), centre(right), 2.0);
    expect(mpp).toBeCloseTo(0.005, 12);
    const placement = { origin: [-1, 2] as [number, number], metresPerPixel: mpp, rotation: 0 };
    // trace the rectangle's corners
    const a = imageToWorld(placement, [minX, maxY]);
    const b = imageToWorld(placement, [maxX, minY]);
    expect(Math.abs(b[0] - a[0] - 3.0)).toBeLessThanOrEqual(mpp);
    expect(Math.abs(b[1] - a[1] - 1.2)).toBeLessThanOrEqual(mpp);
  });

  it("world and image coordinates round-trip, turned and offset", () => {
    const u = { origin: [3, -1] as [number, number], metresPerPixel: 0.004, rotation: 30 };
    const w = imageToWorld(u, [250, 120]);
    const back = worldToImage(u, w);
    expect(back[0]).toBeCloseTo(250, 9);
    expect(back[1]).toBeCloseTo(120, 9);
    // the image's x axis runs at 30° in the world
    const o = imageToWorld(u, [0, 0]);
    const x = imageToWorld(u, [100, 0]);
    expect((Math.atan2(x[1] - o[1], x[0] - o[0]) * 180) / Math.PI).toBeCloseTo(30, 9);
  });

  it("rescaling about a mark keeps that mark where it was", () => {
    const u = { origin: [0, 0] as [number, number], metresPerPixel: 0.01, rotation: 15 };
    const before = imageToWorld(u, [40, 60]);
    const after = imageToWorld(rescaleAbout(u, [40, 60], 0.002), [40, 60]);
    expect(after[0]).toBeCloseTo(before[0], 12);
    expect(after[1]).toBeCloseTo(before[1], 12);
  });
});
