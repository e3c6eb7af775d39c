"use client";
// Setting the underlay's scale: click two marks on the image, type the real distance between
// them with a unit ("2.4 m", "96 in"); the solver's expression reader turns it into metres.
import { useEffect, useRef, useState } from "react";
import { useEditor, useStores } from "@/canvas/context";
import { calibrateUnderlay } from "@/canvas/commands/underlay";
import type { Command } from "@/canvas/commands/define";
import { fitUnderlayView, readScale, type ScaleReading } from "@/canvas/geometry/underlay";
import { suggestUnitsFor } from "@/solver/expressionErrors";
import { formatNumber } from "@/solver/units";
import type { UnderlayFile } from "@/solver/schema";
import { BUTTON, INPUT, PRIMARY_BUTTON } from "./ui";

/** "5.000 mm a pixel" / "1.27 cm a pixel". */
export function scaleWords(metresPerPixel: number, units: "SI" | "US"): string {
  if (units === "US") return `${formatNumber(metresPerPixel / 0.0254, 4)} in a pixel`;
  return metresPerPixel < 0.01 ? `${formatNumber(metresPerPixel * 1000, 4)} mm a pixel` : metresPerPixel < 1 ? `${formatNumber(metresPerPixel * 100, 4)} cm a pixel` : `${formatNumber(metresPerPixel, 4)} m a pixel`;
}

/**
 * An underlay field's error in its own words: these fields read a value with its unit, never the
 * sketch's parameters, so an unknown name is not told to become one, and the units suggested are
 * the field's own.
 */
export function underlayFieldError(message: string, kind: "length" | "angle"): string {
  return suggestUnitsFor(message, kind).replace(/^unknown name "([^"]+)": define it as a parameter or (use a unit such as [^;]+)$/, 'unknown name "$1": $2 (the underlay takes values with their units, not the sketch\'s parameters)');
}

const BARE_NUMBER = /^\s*[-+]?(\d+(\.\d*)?|\.\d+)(e[-+]?\d+)?\s*$/i;

/**
 * The scale from the two marks and the distance as typed, which must carry its unit: a bare "96"
 * would be read as metres, and one typing inches or feet (a US drawing) would trace at 39 or 3.3
 * times the size with nothing said (a sketch's own fields are SI by contract; this one is typed
 * off a drawing, in whatever unit the drawing is dimensioned in).
 */
export function readTypedScale(a: [number, number], b: [number, number], text: string): ScaleReading {
  if (BARE_NUMBER.test(text)) {
    const n = text.trim();
    return { ok: false, message: `${n} what? Give the unit with the distance, as the drawing is dimensioned: ${n} m, ${n} mm, ${n} ft or ${n} in.` };
  }
  return readScale(a, b, text);
}

/** The distance read, in the units on screen: "= 2 m", "= 6.5 ft". */
function distanceWords(distanceM: number, units: "SI" | "US"): string {
  return units === "US" ? `= ${formatNumber(distanceM / 0.3048, 4)} ft` : `= ${formatNumber(distanceM, 4)} m`;
}

export function UnderlayScale({ u, disabled }: { u: UnderlayFile; disabled: boolean }) {
  const { editor } = useStores();
  const tool = useEditor((s) => s.tool);
  const units = useEditor((s) => s.units);
  const [text, setText] = useState("");
  const calibrating = tool.kind === "calibrate";
  const marks = calibrating ? tool.points : [];
  const reading = marks.length === 2 ? readTypedScale(marks[0], marks[1], text) : null;
  // the second mark is a click on the drawing, which takes the focus as the pointer goes down (after
  // the field has mounted): the distance is typed next, so the field takes it back once the click
  // is over; typed into the drawing, "1200 mm" would run its shortcuts instead
  const distanceRef = useRef<HTMLInputElement>(null);
  const bothMarks = marks.length === 2 ? marks : null;
  useEffect(() => {
    if (!bothMarks) return;
    const frame = requestAnimationFrame(() => distanceRef.current?.focus());
    return () => cancelAnimationFrame(frame);
  }, [bothMarks]);

  const start = () => {
    const d = u.calibration?.distance;
    // a distance kept without its unit was read as metres: offered back with it
    setText(d === undefined ? "" : typeof d === "number" || BARE_NUMBER.test(d) ? `${String(d).trim()} m` : d);
    editor.getState().setTool({ kind: "calibrate", points: [] });
    editor.getState().notify("Setting the scale: click the first of two marks a known distance apart on the drawing. Esc to stop.");
  };
  const stop = () => editor.getState().setTool({ kind: "select" });
  const commit = () => {
    if (!reading?.ok) return;
    const s = editor.getState();
    s.apply(calibrateUnderlay({ a: marks[0], b: marks[1], distance: text.trim(), metresPerPixel: reading.metresPerPixel }) as Command<unknown>);
    s.setTool({ kind: "select" });
    // nothing traced yet: show the whole drawing at its new size (it grew or shrank about the first mark)
    const after = editor.getState();
    if (!after.sketch.bodies.length && after.sketch.underlay) after.setView(fitUnderlayView(after.sketch.underlay, after.viewport.width, after.viewport.height));
    s.notify(`Scale set: ${formatNumber(reading.pixels, 4)} px between the marks is ${text.trim()}, so ${scaleWords(reading.metresPerPixel, units)}. Lock the underlay before tracing over it.`);
  };

  const c = u.calibration;
  return (
    <div className="space-y-1.5 rounded border border-rule-soft px-2 py-1.5" data-testid="underlay-scale">
      <p className="text-[12px] text-ink-soft">
        Scale: <span className="num font-medium text-ink" data-testid="underlay-mpp" data-mpp={u.metresPerPixel}>{scaleWords(u.metresPerPixel, units)}</span>
        {c ? (
          <span className="text-ink-faint">
            {" "}
            · from {typeof c.distance === "number" ? `${formatNumber(c.distance, 4)} m` : c.distance} between two marks
          </span>
        ) : (
          <span className="text-caution"> · not set from the drawing yet</span>
        )}
      </p>
      {!calibrating ? (
        <button type="button" className={BUTTON} disabled={disabled || u.hidden} onClick={start} data-testid="underlay-calibrate">
          Set the scale from two marks
        </button>
      ) : marks.length < 2 ? (
        <div className="space-y-1.5">
          <div className="flex items-center gap-2">
            <p className="flex-1 text-[12px] text-accent-deep" aria-live="polite">
              {marks.length === 0 ? "Click the first mark on the drawing…" : "Click the second mark…"}
            </p>
            <button type="button" className={BUTTON} onClick={stop}>
              Stop
            </button>
          </div>
          <TypedMarks u={u} onMarks={(points) => editor.getState().setTool({ kind: "calibrate", points })} />
        </div>
      ) : (
        <form
          className="space-y-1"
          onSubmit={(e) => {
            e.preventDefault();
            commit();
          }}
        >
          <label htmlFor="underlay-distance" className="block text-[12px] font-medium text-ink-soft">
            Real distance between the marks ({formatNumber(Math.hypot(marks[1][0] - marks[0][0], marks[1][1] - marks[0][1]), 4)} px apart)
          </label>
          <input
            id="underlay-distance"
            ref={distanceRef}
            autoFocus
            className={INPUT}
            value={text}
            placeholder="e.g. 2.4 m or 96 in"
            aria-invalid={text.trim() !== "" && reading?.ok === false}
            aria-describedby="underlay-distance-note"
            onChange={(e) => setText(e.target.value)}
            data-testid="underlay-distance"
          />
          <p id="underlay-distance-note" className={`text-[11.5px] leading-snug ${reading && !reading.ok && text.trim() ? "text-caution" : "text-ink-faint"}`}>
            {reading?.ok ? `${distanceWords(reading.distanceM, units)}, so ${scaleWords(reading.metresPerPixel, units)}` : text.trim() && reading ? underlayFieldError(reading.message, "length") : "A length with its unit: m, mm, ft, in…"}
          </p>
          <div className="flex gap-1.5">
            <button type="submit" className={PRIMARY_BUTTON} disabled={!reading?.ok} data-testid="underlay-set-scale">
              Set the scale
            </button>
            <button type="button" className={BUTTON} onClick={start}>
              Pick again
            </button>
            <button type="button" className={BUTTON} onClick={stop}>
              Cancel
            </button>
          </div>
        </form>
      )}
    </div>
  );
}

/**
 * The two marks typed as image pixels (read off an image viewer), for the keyboard and for a
 * precise scale bar: the same as clicking them. Pixels count from the image's top-left corner.
 */
function TypedMarks({ u, onMarks }: { u: UnderlayFile; onMarks: (points: [number, number][]) => void }) {
  const [values, setValues] = useState(["", "", "", ""]);
  const [problem, setProblem] = useState<string | null>(null);
  const names = ["first mark x", "first mark y", "second mark x", "second mark y"];
  const use = () => {
    const n = values.map((v) => Number(v.trim()));
    const bad = n.findIndex((v, i) => values[i].trim() === "" || !Number.isFinite(v) || v < 0 || v > (i % 2 ? u.height : u.width));
    if (bad >= 0) {
      setProblem(`The ${names[bad]} must be a pixel of the image: 0 to ${bad % 2 ? u.height : u.width}.`);
      document.getElementById(`underlay-mark-${bad}`)?.focus();
      return;
    }
    setProblem(null);
    onMarks([
      [n[0], n[1]],
      [n[2], n[3]],
    ]);
  };
  return (
    <form
      className="space-y-1"
      aria-label="Type the two marks"
      onSubmit={(e) => {
        e.preventDefault();
        use();
      }}
    >
      <p className="text-[11.5px] leading-snug text-ink-faint" id="underlay-marks-note">
        Or type them, in pixels of the image ({u.width} × {u.height}) from its top-left corner:
      </p>
      <div className="grid grid-cols-4 gap-1">
        {names.map((name, i) => (
          <input
            key={name}
            id={`underlay-mark-${i}`}
            // the keyboard's way in: the button it came from is gone
            autoFocus={i === 0}
            className={INPUT}
            inputMode="decimal"
            aria-label={name}
            aria-describedby={problem ? "underlay-marks-problem" : "underlay-marks-note"}
            placeholder={name.endsWith("x") ? "x" : "y"}
            value={values[i]}
            onChange={(e) => setValues(values.map((v, j) => (j === i ? e.target.value : v)))}
            data-testid={`underlay-mark-${i}`}
          />
        ))}
      </div>
      {problem ? (
        <p id="underlay-marks-problem" className="text-[11.5px] text-caution" role="alert">
          {problem}
        </p>
      ) : null}
      <button type="submit" className={BUTTON} data-testid="underlay-use-marks">
        Use these marks
      </button>
    </form>
  );
}
