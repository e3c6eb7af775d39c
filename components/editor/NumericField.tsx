"use client";
// One numeric field: takes a number or an expression with units ("350 psi", "2*r", "theta + 5 deg"),
// stores it as typed, and shows under it the value the solver's parser found — or its error.
// Nothing is lost: text that does not evaluate is stored as typed and marked; what the file cannot
// hold (a blank where a value is required) is not stored, and the sketch goes back to the field's
// last good value; Escape goes back to that value too (see "Editing a field" in DEVELOPERS.md).
import { useEffect, useId, useRef, useState } from "react";
import type { Numeric } from "@/solver/schema";
import { convert, formatNumber, formatQuantity } from "@/solver/units";
import { useAnalysis, useEditor } from "@/canvas/context";
import { numericText, toNumeric } from "@/canvas/model/numeric";
import { suggestUnitsFor } from "@/solver/expressionErrors";
import { messageInWords } from "@/components/results/errorPlace";
import { exampleIn, type Display, type Example } from "./fieldDefs";
import type { LastGood } from "./useCommit";
import { endVisitHere, INPUT, leaveField } from "./ui";

let session = 0;

/** A unit as the expression parser reads it: "in²" → "in^2", "lbf·ft" → "lbf ft". */
const typedUnit = (unit: string) => unit.replace(/²/g, "^2").replace(/³/g, "^3").replace(/·/g, " ");

export interface NumericFieldProps {
  /** key of the value in the analysis: `${elementId}.${path}` or a top-level path like "gravity" */
  valueKey: string;
  label: string;
  value: Numeric | undefined;
  display: Display;
  optional?: boolean;
  /** the placeholder's example, in the units on screen */
  example?: Example;
  hint?: string;
  /** said at the field, marked as an error, while it is blank: what the element lacks without it */
  needed?: string;
  /** store the typed value; returns an error to show (and nothing is stored) or null */
  onCommit: (value: Numeric | undefined, coalesce: string) => string | null;
  /** the field's last good value from before the edit `visit` (a coalesce key), or null: what
   *  Escape and a refused blank go back to. Without it they go back to the value the field had
   *  when it was entered. */
  lastGood?: LastGood;
  /** the field's own refusal (a value or a blank it would not store), or null: for the form around it */
  onProblem?: (problem: string | null) => void;
  /** visually compact (the x / y pair of a point) */
  compact?: boolean;
  testId?: string;
}

export function formatDisplay(v: number, display: Display, units: "SI" | "US"): string {
  if (display === "rotationalStiffness") return `${formatNumber(v)} N·m/rad`;
  if (display === "ratio") return formatNumber(v);
  return formatQuantity(v, display, units);
}

/**
 * The text of a stored value nobody typed here: a plain number as JavaScript writes it but with no
 * "+" in its exponent (1e30, 1e-7), free of rounding noise (0.1 + 0.2 is 0.3), and a small one
 * with its figures (2e-10, not 0); an expression as it is.
 */
export function storedText(v: Numeric | undefined): string {
  if (typeof v !== "number") return numericText(v);
  if (!Number.isFinite(v)) return "";
  const n = Math.abs(v) < 1e-3 ? Number(v.toPrecision(12)) || 0 : Number(numericText(v));
  return String(n).replace("e+", "e");
}

/** What a field that may not be blank says while it is: "Mass: required." */
export const requiredWords = (label: string) => `${label}: required.`;

export function NumericField({ valueKey, label, value, display, optional, example, hint, needed, onCommit, lastGood, onProblem, compact, testId }: NumericFieldProps) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const [localError, setLocalError] = useState<string | null>(null);
  // a blank the field would not store, once the field is left: it stays blank and marked while
  // the sketch keeps the value it had (`over`); a change of that value from elsewhere ends it
  const [left, setLeft] = useState<{ over: Numeric | undefined; message: string } | null>(null);
  if (left && left.over !== value) setLeft(null);
  // what was typed for the stored number ("1e30", "2.50"): shown as typed while it is that number
  const [typedText, setTypedText] = useState<{ text: string; value: number } | null>(null);
  // that a plain number was typed here with US units on screen (said on after the field is left)
  const [typedPlain, setTypedPlain] = useState(false);
  const sessionRef = useRef(0);
  // the value when the field was entered: what Escape and a refused blank go back to when no
  // history says what the last good value was
  const startRef = useRef<{ value: Numeric | undefined } | null>(null);
  const escapedRef = useRef(false);
  const units = useEditor((s) => s.units);
  const evaluated = useAnalysis((s) => s.fieldValues.values.get(valueKey));
  const evalErrorRaw = useAnalysis((s) => s.fieldValues.errors.get(valueKey));
  // an unknown name's error suggests this field's units (kg, tonne, lb for a mass)
  // in the form's words, units as engineers write them ("kg/m²", not "kg / m^2")
  const evalError = evalErrorRaw === undefined ? undefined : messageInWords(null, "", suggestUnitsFor(evalErrorRaw, display));
  const refusedBlank = draft === null && left !== null && left.over === value ? left : null;
  const shown = typedText && typedText.value === value ? typedText.text : storedText(value);
  const text = draft ?? (refusedBlank ? "" : shown);
  const problem = localError ?? refusedBlank?.message ?? null;
  const error = problem ?? (text.trim() ? evalError : needed);
  const describedBy = `${id}-value`;
  // a plain number is SI (degrees for angles) and is its own value: the worker's answer leaves it out
  const typed = toNumeric(text);

  useEffect(() => {
    if (!onProblem) return;
    onProblem(problem);
    return () => onProblem(null);
  }, [onProblem, problem]);

  /** "Magnitude is needed. The sketch keeps 10 kN until you give one." */
  const keeps = (why: string, kept: Numeric | undefined) =>
    kept === undefined ? why : `${why} The sketch keeps ${typeof kept === "number" ? formatDisplay(kept, display, units) : kept} until you give one.`;

  const visit = () => `${valueKey}#${sessionRef.current}`;
  /** The value to go back to: the last good one from before this edit, else the one it started from. */
  const goBackTo = (): Numeric | undefined => {
    const good = lastGood?.(visit());
    if (good) return good.value;
    return startRef.current ? startRef.current.value : value;
  };

  const change = (t: string) => {
    setDraft(t);
    const v = toNumeric(t);
    const coalesce = visit();
    if (v === undefined) {
      const refused = optional ? onCommit(undefined, coalesce) : requiredWords(label);
      if (refused) {
        // the sketch cannot hold the blank: it goes back to the field's last good value (not what
        // was typed on the way to blank, nor an earlier bad entry, which undo still reaches)
        const back = goBackTo();
        const kept = back === undefined ? value : back;
        if (kept !== undefined && kept !== value) onCommit(kept, coalesce);
        setLocalError(keeps(refused, kept));
        return;
      }
      setLocalError(null);
      return;
    }
    setTypedPlain(typeof v === "number");
    const refused = onCommit(v, coalesce);
    setLocalError(refused);
    if (!refused && typeof v === "number") setTypedText({ text: t.trim(), value: v });
  };

  // US units on screen, a plain number typed: it is SI (the file format's rule), which a US user may
  // not mean. Said plainly, with what to type instead; not an error, as SI is what some want.
  const usUnit = units === "US" && typeof typed === "number" && typed !== 0 && display !== "angle" && display !== "ratio" && display !== "rotationalStiffness" ? convert(typed, display, "US").unit : null;
  // only for what the user typed here (and it stays said once the field is left): a number the
  // mouse placed (or a file brought) is SI by rule
  const plainSI = usUnit && !error && (draft !== null || typedPlain) ? `A plain number is SI: ${formatDisplay(typed as number, display, "SI")} (= ${formatDisplay(typed as number, display, "US")}). Meant ${usUnit}? Type “${text.trim()} ${typedUnit(usUnit)}”.` : null;

  // SI on screen, a small plain number typed as a pressure: pascals, which "10" meaning bar is not.
  // Said beside the value (not a caution: 250 Pa in a duct is real)
  const pascals = units === "SI" && display === "pressure" && typeof typed === "number" && typed !== 0 && Math.abs(typed) < 1e4 && (draft !== null || typedPlain);
  let line: string;
  if (error) line = error;
  else if (plainSI) line = plainSI;
  else if (pascals) line = `= ${formatDisplay(typed as number, display, "SI")} (a plain number is pascals: ${text.trim()} bar is “${text.trim()} bar”)`;
  else if (!text.trim()) line = hint ?? (optional ? "not given" : "");
  else if (evaluated !== undefined) line = `= ${formatDisplay(evaluated, display, units)}`;
  else if (typeof typed === "number") line = `= ${formatDisplay(typed, display, units)}`;
  else line = "";

  return (
    <div className={compact ? "min-w-0 flex-1" : ""}>
      <label htmlFor={id} className={compact ? "sr-only" : "mb-0.5 block text-[12px] font-medium text-ink-soft"}>
        {label}
      </label>
      <div className="relative">
        {compact && <span className="pointer-events-none absolute left-2 top-1/2 -translate-y-1/2 text-[11px] text-ink-faint" aria-hidden="true">{label.slice(-1)}</span>}
        <input
          id={id}
          className={`${INPUT} ${compact ? "pl-5" : ""}`}
          value={text}
          placeholder={example ? `e.g. ${exampleIn(example, units)}` : undefined}
          spellCheck={false}
          autoComplete="off"
          aria-invalid={!!error}
          aria-describedby={describedBy}
          data-testid={testId}
          onFocus={() => {
            sessionRef.current = ++session;
            startRef.current = { value };
            setDraft(text);
            // a blank still refused stays marked while it is being typed in
            setLocalError(refusedBlank?.message ?? null);
            setLeft(null);
          }}
          onBlur={() => {
            // a refused blank stays blank and marked at the field; Escape puts the kept value back
            const blank = draft !== null && !draft.trim();
            setLeft(blank && localError && !escapedRef.current ? { over: value, message: localError } : null);
            escapedRef.current = false;
            startRef.current = null;
            setDraft(null);
            setLocalError(null);
          }}
          onChange={(e) => change(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === "Escape") {
              // back to the last good value from before this edit (a bad entry stays in the history)
              escapedRef.current = true;
              const back = goBackTo();
              if (back !== value) onCommit(back, visit());
              setTypedPlain(false);
            }
            // Enter ends the visit (its undo step) and stays in the field, so a keyboard user is not
            // sent back to the top of the page; Escape leaves the field for the drawing (a panel
            // over the drawing closes on the next Escape)
            if (e.key === "Enter") endVisitHere(e.currentTarget);
            if (e.key === "Escape") leaveField(e.currentTarget);
          }}
        />
      </div>
      <p id={describedBy} className={`mt-0.5 min-h-[15px] text-[11px] leading-snug ${error || plainSI ? "text-caution" : "num text-ink-faint"}`} aria-live="polite" data-caution={plainSI ? "plain-si" : undefined}>
        {error || plainSI ? `⚠ ${line}` : line}
      </p>
    </div>
  );
}
