// The underlay in the editor: its commands (each one undo step), the scale from two marks and a
// typed distance, and a body traced over a test image at the drawing's real size.
import { describe, expect, it } from "vitest";
import { createEditorStore, READ_ONLY_NOTICE } from "@/canvas/store";
import type { Command } from "@/canvas/commands";
import { calibrateUnderlay, lockUnderlay, moveUnderlay, placeUnderlay, removeUnderlay, rotateUnderlay, setUnderlayOpacity, showUnderlay, underlayCentre } from "@/canvas/commands/underlay";
import { fitNewUnderlay, readScale, underlayOnScreen } from "@/canvas/geometry/underlay";
import { emptySketch } from "@/canvas/model/elements";
import { rectangleOutline } from "@/canvas/model/factory";
import { bodyCommand } from "@/canvas/placement";
import { imageToWorld } from "@/solver/underlay";
import { parseSketch } from "@/solver";
import type { UnderlayFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { findMarks, markedDrawing, MARKED } from "../fixtures/uploads";

const c = <A,>(cmd: Command<A>) => cmd as unknown as Command<unknown>;
const UPLOAD = "0b7d1f52-9a51-4c8e-8f4e-2a7b8c1d0e11";
const base: UnderlayFile = { upload: UPLOAD, width: MARKED.width, height: MARKED.height, origin: [-2, 3], metresPerPixel: 0.01, rotation: 0, opacity: 0.6 };

function withUnderlay() {
  const store = createEditorStore({ sketch: emptySketch("Traced skid") });
  store.getState().apply(c(placeUnderlay({ underlay: base })));
  return store;
}

const u = (store: ReturnType<typeof withUnderlay>) => store.getState().sketch.underlay!;
const close = (a: Vec2, b: Vec2, tol = 1e-9) => expect(Math.hypot(a[0] - b[0], a[1] - b[1])).toBeLessThan(tol);

describe("underlay commands", () => {
  it("place, move, turn about the centre, fade, hide, lock and remove: one undo step each, and undo walks back", () => {
    const store = withUnderlay();
    const s = () => store.getState();
    s().apply(c(moveUnderlay({ to: [0.5, 2] })));
    expect(u(store).origin).toEqual([0.5, 2]);
    const centre = underlayCentre(u(store));
    s().apply(c(rotateUnderlay({ rotation: 30 })));
    expect(u(store).rotation).toBe(30);
    // turning keeps the image's centre where it was
    close(underlayCentre(u(store)), centre, 1e-5);
    s().apply(c(rotateUnderlay({ rotation: 390 })));
    expect(u(store).rotation).toBe(30); // the same turn: nothing to record
    s().apply(c(setUnderlayOpacity({ opacity: 0.3 })), { coalesce: "op" });
    s().apply(c(setUnderlayOpacity({ opacity: 0.25 })), { coalesce: "op" });
    s().apply(c(setUnderlayOpacity({ opacity: 7 })), { coalesce: "op" });
    expect(u(store).opacity).toBe(1);
    s().apply(c(showUnderlay({ shown: false })));
    s().apply(c(lockUnderlay({ locked: true })));
    expect(u(store)).toMatchObject({ hidden: true, locked: true });
    expect(s().past.map((e) => e.label)).toEqual([
      "Put a drawing under the sketch",
      "Move the underlay",
      "Turn the underlay to 30°",
      "Underlay at 30 % opacity",
      "Hide the underlay",
      "Lock the underlay",
    ]);
    // the document with its underlay is a valid sketch file
    const parsed = parseSketch(s().sketch);
    expect(parsed.ok).toBe(true);
    s().apply(c(removeUnderlay({})));
    expect(s().sketch.underlay).toBeUndefined();
    for (let i = 0; i < 7; i++) s().undo();
    expect(s().sketch.underlay).toBeUndefined();
    s().redo();
    expect(u(store)).toEqual(base);
  });

  it("commands on a sketch with no underlay change nothing", () => {
    const store = createEditorStore({ sketch: emptySketch() });
    for (const cmd of [moveUnderlay({ to: [1, 1] }), rotateUnderlay({ rotation: 5 }), setUnderlayOpacity({ opacity: 0.2 }), showUnderlay({ shown: false }), lockUnderlay({ locked: true }), removeUnderlay({})])
      expect(store.getState().apply(c(cmd as Command<unknown>))).toBe(false);
    expect(store.getState().past).toEqual([]);
  });

  it("a new image fits in four fifths of the visible canvas, centred", () => {
    const view = { scale: 100, x: 200, y: 500 };
    const vp = { width: 1000, height: 700 };
    const placed = fitNewUnderlay({ width: 2000, height: 1000 }, view, vp);
    const on = underlayOnScreen({ ...base, width: 2000, height: 1000, ...placed }, view);
    expect(on.width).toBeCloseTo(800, 9);
    expect(on.height).toBeCloseTo(400, 9);
    expect(on.x).toBeCloseTo(100, 9);
    expect(on.y).toBeCloseTo(150, 9);
  });
});

describe("the scale from two marks", () => {
  it("reads the distance with its unit through the solver's expressions", () => {
    const a: Vec2 = [0, 0];
    const b: Vec2 = [480, 0];
    expect(readScale(a, b, "2.4 m")).toMatchObject({ ok: true, distanceM: 2.4, pixels: 480 });
    expect((readScale(a, b, "2.4 m") as { metresPerPixel: number }).metresPerPixel).toBeCloseTo(0.005, 15);
    // 96 in = 2.4384 m (1 in = 0.0254 m exactly, NIST SP 811)
    expect((readScale(a, b, "96 in") as { metresPerPixel: number }).metresPerPixel).toBeCloseTo(2.4384 / 480, 15);
    expect((readScale(a, b, "8 ft") as { distanceM: number }).distanceM).toBeCloseTo(2.4384, 12);
    expect(readScale(a, b, "2 kg")).toEqual({ ok: false, message: "2 kg is a mass (kg), but this field needs a length (m)" });
    expect(readScale(a, b, "")).toMatchObject({ ok: false, message: /Type the real distance/ });
    expect(readScale(a, b, "0 m")).toEqual({ ok: false, message: "The real distance must be more than zero." });
    expect(readScale(a, a, "1 m")).toEqual({ ok: false, message: "The two marks are on the same pixel: pick two points apart." });
  });

  it("refuses a scale no drawing has (a typo in the exponent or the unit), and the file format refuses it too", () => {
    const a: Vec2 = [0, 0];
    const b: Vec2 = [800, 0];
    expect(readScale(a, b, "1e30 m")).toMatchObject({ ok: false, message: /^That makes 1\.25e\+27 m a pixel; a drawing to trace is between 0\.001 mm and 100 m a pixel/ });
    expect(readScale(a, b, "0.0001 mm")).toMatchObject({ ok: false });
    // a site plan at 50 m a pixel and a detail at 0.01 mm a pixel still read
    expect(readScale(a, b, "40 km")).toMatchObject({ ok: true, metresPerPixel: 50 });
    expect(readScale(a, b, "8 mm")).toMatchObject({ ok: true });
    const withUnderlay = (u: Record<string, unknown>) =>
      parseSketch({ ...emptySketch(), underlay: { upload: "u1", width: 800, height: 600, origin: [0, 0], metresPerPixel: 0.005, ...u } });
    expect(withUnderlay({}).ok).toBe(true);
    const far = withUnderlay({ origin: [-2.5e29, 5e29], metresPerPixel: 1.25e27 });
    expect(far.ok).toBe(false);
    if (!far.ok) expect(far.errors.map((e) => e.path).sort()).toEqual(["underlay.metresPerPixel", "underlay.origin[0]", "underlay.origin[1]"]);
  });

  it("calibrating on the test drawing gives 5 mm a pixel, keeps the first mark in place, and a traced body has the drawing's size within a pixel", async () => {
    const image = await markedDrawing();
    const marks = await findMarks(image);
    expect(marks).toHaveLength(2);
    close(marks[0], MARKED.a, 0.05);
    close(marks[1], MARKED.b, 0.05);

    const store = withUnderlay();
    const before = imageToWorld(u(store), marks[0]);
    const reading = readScale(marks[0], marks[1], "2.0 m");
    if (!reading.ok) throw new Error(reading.message);
    // 2.0 m over 400 px
    expect(reading.metresPerPixel).toBeCloseTo(0.005, 6);
    store.getState().apply(c(calibrateUnderlay({ a: marks[0], b: marks[1], distance: "2.0 m", metresPerPixel: reading.metresPerPixel })));
    const cal = u(store);
    expect(cal.metresPerPixel).toBe(reading.metresPerPixel);
    expect(cal.calibration).toEqual({ a: [300, 520], b: [700, 520], distance: "2.0 m" });
    close(imageToWorld(cal, marks[0]), before, 2e-6);
    // the two marks are now 2.0 m apart in the world
    const wa = imageToWorld(cal, marks[0]);
    const wb = imageToWorld(cal, marks[1]);
    expect(Math.hypot(wb[0] - wa[0], wb[1] - wa[1])).toBeCloseTo(2.0, 6);

    // trace the skid's outline (its corners on the drawing) as a rectangle body
    const { x, y, w, h } = MARKED.skid;
    const s = store.getState();
    s.apply(bodyCommand(s.sketch, rectangleOutline(imageToWorld(cal, [x, y + h]), imageToWorld(cal, [x + w, y]))));
    const outline = store.getState().sketch.bodies[0].outline as Vec2[];
    const xs = outline.map((p) => p[0]);
    const ys = outline.map((p) => p[1]);
    // 600 px × 240 px at 5 mm a pixel: 3.0 m × 1.2 m, within a pixel
    expect(Math.abs(Math.max(...xs) - Math.min(...xs) - 3.0)).toBeLessThanOrEqual(cal.metresPerPixel);
    expect(Math.abs(Math.max(...ys) - Math.min(...ys) - 1.2)).toBeLessThanOrEqual(cal.metresPerPixel);
    expect(store.getState().past.map((e) => e.label)).toEqual(["Put a drawing under the sketch", "Set the underlay's scale (2.0 m)", "Add body"]);
  });

  it("turned, the traced sides keep their lengths", () => {
    const store = withUnderlay();
    const s = store.getState();
    s.apply(c(calibrateUnderlay({ a: MARKED.a, b: MARKED.b, distance: "2.0 m", metresPerPixel: 0.005 })));
    store.getState().apply(c(rotateUnderlay({ rotation: 30 })));
    const cal = u(store);
    const { x, y, w, h } = MARKED.skid;
    const corners = ([[x, y + h], [x + w, y + h], [x + w, y], [x, y]] as Vec2[]).map((p) => imageToWorld(cal, p));
    store.getState().apply(bodyCommand(store.getState().sketch, corners));
    const o = store.getState().sketch.bodies[0].outline as Vec2[];
    const side = (i: number) => Math.hypot(o[(i + 1) % 4][0] - o[i][0], o[(i + 1) % 4][1] - o[i][1]);
    expect(side(0)).toBeCloseTo(3.0, 5);
    expect(side(1)).toBeCloseTo(1.2, 5);
    // the bottom edge runs at 30°
    expect((Math.atan2(o[1][1] - o[0][1], o[1][0] - o[0][0]) * 180) / Math.PI).toBeCloseTo(30, 4);
  });
});

describe("a read-only editor", () => {
  it("refuses commands, gestures and editing tools, and says why", () => {
    const store = withUnderlay();
    store.getState().setReadOnly(true);
    const before = store.getState().sketch;
    expect(store.getState().apply(c(moveUnderlay({ to: [9, 9] })))).toBe(false);
    expect(store.getState().sketch).toBe(before);
    expect(store.getState().notice).toBe(READ_ONLY_NOTICE);
    store.getState().beginGesture("Move");
    expect(store.getState().gesture).toBeNull();
    store.getState().updateGesture(c(moveUnderlay({ to: [9, 9] })));
    expect(store.getState().sketch).toBe(before);
    store.getState().setTool({ kind: "place", element: "pin" });
    store.getState().setTool({ kind: "calibrate", points: [] });
    expect(store.getState().tool).toEqual({ kind: "select" });
    // reading is not editing: the hand check's point may still be picked
    store.getState().setTool({ kind: "pick-point" });
    expect(store.getState().tool).toEqual({ kind: "pick-point" });
    expect(store.getState().past).toHaveLength(1);
  });
});
