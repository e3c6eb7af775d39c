"use client";
// One numeric field: takes a number or an expression with units ("350 psi", "2*r", "theta + 5 deg"),
// stores it as typed, and shows under it the value the solver's parser found — or its error.
import { useId, useRef, useState } from "react";
import type { Numeric } from "@/solver/schema";
import { convert, formatNumber, formatQuantity } from "@/solver/units";
import { useAnalysis, useEditor } from "@/canvas/context";
import { numericText, toNumeric } from "@/canvas/model/numeric";
import type { Display } from "./fieldDefs";
import { INPUT } from "./ui";

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
  example?: string;
  hint?: string;
  /** store the typed value; returns an error to show (and nothing is stored) or null */
  onCommit: (value: Numeric | undefined, coalesce: string) => string | null;
  /** visually compact (the x / y pair of a point) */
  compact?: boolean;
  testId?: string;
}

export function formatDisplay(v: number, display: Display, units: "SI" | "US"): string {
  if (display === "rotationalStiffness") return `${formatNumber(v)} N·m/rad`;
  if (display === "ratio") return formatNumber(v);
  return formatQuantity(v, display, units);
}

export function NumericField({ valueKey, label, value, display, optional, example, hint, onCommit, compact, testId }: NumericFieldProps) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const [localError, setLocalError] = useState<string | null>(null);
  // what stays said after the field is left: a required value left blank (the old one was kept),
  // and that a plain number was typed here with US units on screen
  const [kept, setKept] = useState<string | null>(null);
  const [typedPlain, setTypedPlain] = useState(false);
  const sessionRef = useRef(0);
  const units = useEditor((s) => s.units);
  const evaluated = useAnalysis((s) => s.fieldValues.values.get(valueKey));
  const evalError = useAnalysis((s) => s.fieldValues.errors.get(valueKey));
  const text = draft ?? numericText(value);
  const error = localError ?? (text.trim() ? evalError : undefined);
  const describedBy = `${id}-value`;
  // a plain number is SI (degrees for angles) and is its own value: the worker's answer leaves it out
  const typed = toNumeric(text);

  const change = (t: string) => {
    setDraft(t);
    const v = toNumeric(t);
    if (v === undefined && !optional) {
      setLocalError("is required: give a number or an expression");
      return;
    }
    setTypedPlain(typeof v === "number");
    setLocalError(onCommit(v, `${valueKey}#${sessionRef.current}`));
  };

  // US units on screen, a plain number typed: it is SI (the file format's rule), which a US user may
  // not mean. Said plainly, with what to type instead; not an error, as SI is what some want.
  const usUnit = units === "US" && typeof typed === "number" && typed !== 0 && display !== "angle" && display !== "ratio" && display !== "rotationalStiffness" ? convert(typed, display, "US").unit : null;
  // only for what the user typed here (and it stays said once the field is left): a number the
  // mouse placed (or a file brought) is SI by rule
  const plainSI = usUnit && !error && (draft !== null || typedPlain) ? `A plain number is SI: ${formatDisplay(typed as number, display, "SI")} (= ${formatDisplay(typed as number, display, "US")}). Meant ${usUnit}? Type “${text.trim()} ${typedUnit(usUnit)}”.` : null;

  let line: string;
  if (kept && draft === null) line = kept;
  else if (error) line = error;
  else if (plainSI) line = plainSI;
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
          placeholder={example ? `e.g. ${example}` : undefined}
          spellCheck={false}
          autoComplete="off"
          aria-invalid={!!error}
          aria-describedby={describedBy}
          data-testid={testId}
          onFocus={() => {
            sessionRef.current = ++session;
            setDraft(numericText(value));
            setKept(null);
          }}
          onBlur={() => {
            // a required field left blank keeps its value, and says so rather than put it back unseen
            setKept(draft !== null && !draft.trim() && !optional ? `is required: kept ${numericText(value)}` : null);
            setDraft(null);
            setLocalError(null);
          }}
          onChange={(e) => change(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === "Enter" || e.key === "Escape") (e.target as HTMLInputElement).blur();
          }}
        />
      </div>
      <p id={describedBy} className={`mt-0.5 min-h-[15px] text-[11px] leading-snug ${error || plainSI || (kept && draft === null) ? "text-caution" : "num text-ink-faint"}`} aria-live="polite" data-caution={plainSI ? "plain-si" : undefined}>
        {error || plainSI || (kept && draft === null) ? `⚠ ${line}` : line}
      </p>
    </div>
  );
}
