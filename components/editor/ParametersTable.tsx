"use client";
// Parameters: named values every expression may use ("theta", "rho", "Q"). Name, expression, value.
import { useDeferredValue, useId, useMemo, useRef, useState } from "react";
import { evaluateToNumber, reservedNameReason, type FieldKind } from "@/solver/expressions";
import { useAnalysis, useEditor, useStores } from "@/canvas/context";
import { deleteParameter, renameParameter, setParameter } from "@/canvas/commands/fields";
import { setStudy } from "@/canvas/commands/studies";
import { sweepsInNewUnit, sweptUnitIn } from "@/canvas/studies/display";
import type { Command } from "@/canvas/commands/define";
import { numericText, toNumeric } from "@/canvas/model/numeric";
import { formatNumber, formatQuantity, prettyUnit, type Quantity, type UnitSystem } from "@/solver/units";
import { parseSketch } from "@/solver/parse";
import { NO_UNIT } from "@/solver/cases";
import type { SketchFile } from "@/solver/schema";
import type { FieldError } from "@/solver/types";
import { BUTTON, HEADING, ICON_BUTTON, INPUT } from "./ui";

const NAME = /^[A-Za-z_][A-Za-z0-9_]*$/;


const KINDS: Array<[FieldKind, Quantity]> = [
  ["length", "length"], ["angle", "angle"], ["mass", "mass"], ["force", "force"], ["moment", "moment"], ["pressure", "pressure"],
  ["velocity", "velocity"], ["massFlow", "massFlow"], ["volumeFlow", "volumeFlow"], ["area", "area"], ["density", "density"],
  ["lineLoad", "lineLoad"], ["acceleration", "acceleration"],
];

/** A parameter's value in a unit people read: mathjs keeps "(bar^0.5 m^1.5)/kg^0.5" for √(p/ρ); that is a velocity. */
export function readableValue(value: number, unit: string, units: UnitSystem): string {
  if (!unit) return formatNumber(value);
  const plain = /^[A-Za-z]+(\^[23])?(\s*\/\s*[A-Za-z]+(\^[23])?)?$/.test(unit);
  if (plain) {
    // as typed ("6 in"), and in the units on screen when they differ ("6 in (0.1524 m)"); angles read the same in both
    const typed = `${formatNumber(value)} ${prettyUnit(unit)}`;
    for (const [kind, q] of KINDS) {
      if (kind === "angle") continue;
      try {
        const shown = formatQuantity(evaluateToNumber(`${value} * (${unit})`, kind), q, units);
        return shown.replace(/\s+/g, " ") === typed.replace(/\s+/g, " ") ? typed : `${typed} (${shown})`;
      } catch {
        // not this dimension
      }
    }
    return typed;
  }
  for (const [kind, q] of KINDS) {
    try {
      const si = evaluateToNumber(`${value} * (${unit})`, kind);
      return formatQuantity(si, q, units);
    } catch {
      // not this dimension
    }
  }
  return `${formatNumber(value)} ${prettyUnit(unit)}`;
}

/** A plain number as typed: "30", "-2.5", "1e3" (no unit, no name, no operation). */
const PLAIN_NUMBER = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?$/i;

/** The kinds a bare parameter may have been meant as, each with its SI unit as one types it. */
const MEANT_AS: Array<[string, string]> = [
  ["a speed", "m/s"], ["a length", "m"], ["a mass", "kg"], ["a force", "N"], ["a pressure", "Pa"], ["a mass flow", "kg/s"],
  ["a volume flow", "m^3/s"], ["an area", "m^2"], ["a density", "kg/m^3"], ["a load per length", "N/m"], ["a moment", "N*m"],
  ["an acceleration", "m/s^2"], ["an angle", "deg"],
];

/** An input error of units: a field given a quantity of another kind, or terms that cannot be added. */
const UNIT_TROUBLE = /\bunits?\b|but this field needs/i;

/**
 * A parameter typed as a bare number ("v = 30") that the fields reading it fail on: a plain number
 * is a legal value in SI units, so this is said only when the sketch's input errors are its unit's
 * doing — the same number with the unit of one kind ("30 m/s") clears some of them and breaks
 * nothing else. "has no unit; the fields that read v need a speed: write 30 m/s", as the Cases tab
 * says a change typed without its unit; null otherwise.
 */
export function bareParameterNote(file: SketchFile | null, name: string, errors: ReadonlyArray<FieldError>): string | null {
  const raw = file?.parameters?.[name];
  const text = raw === undefined ? "" : String(raw).trim();
  if (!file || !errors.length || !PLAIN_NUMBER.test(text) || Number(text) === 0) return null;
  // the parameter's own error is another matter (it reads nothing, so it has none)
  if (errors.some((e) => e.path === `parameters.${name}`)) return null;
  const failing = new Set(errors.map((e) => `${e.path} ${e.message}`));
  let best: { kind: string; unit: string; cleared: number } | null = null;
  for (const [kind, unit] of MEANT_AS) {
    const r = parseSketch({ ...file, parameters: { ...file.parameters, [name]: `${text} ${unit}` } });
    const left = r.ok ? [] : r.errors;
    // a field the unit breaks rules it out; a range check it lets run at last does not (the
    // checks of values wait until every field reads)
    if (left.some((e) => !failing.has(`${e.path} ${e.message}`) && UNIT_TROUBLE.test(e.message))) continue;
    const still = new Set(left.map((e) => `${e.path} ${e.message}`));
    const cleared = errors.filter((e) => !still.has(`${e.path} ${e.message}`)).length;
    if (cleared > 0 && (!best || cleared > best.cleared)) best = { kind, unit, cleared };
  }
  return best ? `${NO_UNIT}; the fields that read ${name} need ${best.kind}: write ${text} ${best.unit}` : null;
}

export function nameProblem(name: string, taken: string[], self?: string): string | null {
  if (!name) return "give it a name";
  if (!NAME.test(name)) return "letters, digits and _ only, starting with a letter";
  if (name !== self && taken.includes(name)) return `${name} is already a parameter`;
  return reservedNameReason(name);
}

/**
 * "Q = 1500 gpm" typed whole in the new parameter's name box (as it is written on paper): its name
 * and its expression. Null when there is no "=".
 */
export function splitAssignment(text: string): { name: string; expression: string } | null {
  const i = text.indexOf("=");
  if (i < 0) return null;
  return { name: text.slice(0, i).trim(), expression: text.slice(i + 1).trim() };
}

function ParamRow({ name, expression, taken }: { name: string; expression: string; taken: string[] }) {
  const { editor } = useStores();
  const id = useId();
  const [nameDraft, setNameDraft] = useState<string | null>(null);
  const [exprDraft, setExprDraft] = useState<string | null>(null);
  const value = useAnalysis((s) => s.core?.parameterValues[name]);
  const units = useEditor((s) => s.units);
  const apply = (c: Command<unknown>, coalesce?: string) => editor.getState().apply(c, coalesce ? { coalesce } : undefined);
  const nameErr = nameDraft !== null ? nameProblem(nameDraft, taken, name) : null;
  // a kept sweep of this parameter keeps its values when the unit it is written in changes: the
  // unit when the field was entered, and its sweeps rewritten (same undo step) when it is left
  const unitBefore = useRef<string | null>(null);
  const sweepsOfIt = () => (editor.getState().sketch.sweeps ?? []).some((w) => w.parameter === name);
  const keepSweepValues = () => {
    const was = unitBefore.current;
    unitBefore.current = null;
    if (was === null) return;
    const sketch = editor.getState().sketch;
    const moved = sweepsInNewUnit(sketch, name, was, sweptUnitIn(sketch, name));
    if (!moved) return;
    apply(setStudy({ key: "sweeps", value: moved.sweeps }) as Command<unknown>, `param:${id}`);
    editor.getState().notify(moved.words);
  };
  const shown = value === undefined ? "" : "error" in value ? value.error : readableValue(value.value, value.unit, units);
  // a bare number the fields that read it fail on: said here, where the cause is (deferred: it
  // parses the sketch again with a unit of each kind, only while there are input errors)
  const analysed = useDeferredValue(useAnalysis((s) => s.sketch));
  const errors = useDeferredValue(useAnalysis((s) => s.core?.errors));
  const bare = value !== undefined && !("error" in value) && !value.unit;
  const noUnit = useMemo(() => (bare && errors?.length ? bareParameterNote(analysed, name, errors) : null), [bare, analysed, name, errors]);
  const noteId = `${id}-no-unit`;
  return (
    <tr className="align-top">
      <td className="py-1 pr-1">
        <input
          aria-label={`Name of parameter ${name}`}
          className={INPUT}
          value={nameDraft ?? name}
          aria-invalid={!!nameErr}
          aria-describedby={nameErr ? `${id}-name-error` : undefined}
          onChange={(e) => setNameDraft(e.target.value)}
          onBlur={() => {
            // a name it cannot take stays in the field with its reason (nothing typed is lost); Escape puts the old one back
            if (nameErr) return;
            if (nameDraft !== null && nameDraft !== name) apply(renameParameter({ from: name, to: nameDraft }) as Command<unknown>);
            setNameDraft(null);
          }}
          onKeyDown={(e) => {
            if (e.key === "Enter") (e.target as HTMLInputElement).blur();
            if (e.key === "Escape") setNameDraft(null);
          }}
        />
        {nameErr && (
          <p id={`${id}-name-error`} className="mt-0.5 text-[11px] text-caution">
            ⚠ Name: {nameErr}
          </p>
        )}
      </td>
      <td className="py-1 pr-1">
        <input
          aria-label={`Expression of parameter ${name}`}
          className={INPUT}
          value={exprDraft ?? expression}
          spellCheck={false}
          onFocus={() => {
            setExprDraft(expression);
            unitBefore.current = sweepsOfIt() ? sweptUnitIn(editor.getState().sketch, name) : null;
          }}
          onBlur={() => {
            setExprDraft(null);
            keepSweepValues();
          }}
          onChange={(e) => {
            setExprDraft(e.target.value);
            const v = toNumeric(e.target.value);
            if (v !== undefined) apply(setParameter({ name, expression: v }) as Command<unknown>, `param:${id}`);
          }}
          onKeyDown={(e) => e.key === "Enter" && (e.target as HTMLInputElement).blur()}
          aria-invalid={!!noUnit || undefined}
          aria-describedby={noUnit ? noteId : undefined}
        />
        {noUnit && (
          <p id={noteId} className="mt-0.5 text-[11px] text-caution" data-testid="parameter-no-unit">
            ⚠ {name} = {expression} {noUnit}
          </p>
        )}
      </td>
      <td className={`num py-1 pl-1 pt-1.5 text-[12px] ${value && "error" in value ? "text-caution" : "text-ink-soft"}`} aria-live="polite">
        {value && "error" in value ? `⚠ ${shown}` : shown}
      </td>
      <td className="py-1">
        <button type="button" className={ICON_BUTTON} aria-label={`Delete parameter ${name}`} onClick={() => apply(deleteParameter({ name }) as Command<unknown>)}>
          ×
        </button>
      </td>
    </tr>
  );
}

export function ParametersTable() {
  const { editor } = useStores();
  const params = useEditor((s) => s.sketch.parameters);
  const entries = Object.entries(params ?? {});
  const names = entries.map(([n]) => n);
  const [newName, setNewName] = useState("");
  const [newExpr, setNewExpr] = useState("");
  const units = useEditor((s) => s.units);
  // "Q = 1500 gpm" in the name box, the expression box empty: taken as the name and its expression
  const typed = newExpr.trim() ? null : splitAssignment(newName);
  const name = typed ? typed.name : newName.trim();
  const expression = typed ? typed.expression : newExpr;
  const problem = newName && !(typed && !typed.name && !typed.expression) ? nameProblem(name, names) : null;
  const add = () => {
    const v = toNumeric(expression);
    if (problem || !name || v === undefined) return;
    editor.getState().apply(setParameter({ name, expression: v }) as Command<unknown>);
    setNewName("");
    setNewExpr("");
  };
  return (
    <section aria-labelledby="params-heading" data-testid="parameters">
      <h2 id="params-heading" className={HEADING}>
        Parameters
      </h2>
      <p className="mt-1 text-[11.5px] leading-snug text-ink-faint">Names any field can use: “2*r”, “theta + 5 deg”. A parameter may use any other, in any order (not itself, nor in a loop).</p>
      <table className="mt-1.5 w-full table-fixed text-left">
        <colgroup>
          <col className="w-[28%]" />
          <col className="w-[40%]" />
          <col />
          <col className="w-7" />
        </colgroup>
        <thead>
          <tr className="text-[11px] text-ink-faint">
            <th className="font-medium">Name</th>
            <th className="font-medium">Expression</th>
            <th className="pl-1 font-medium">Value</th>
            <th>
              <span className="sr-only">Delete</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {entries.map(([n, e]) => (
            <ParamRow key={n} name={n} expression={numericText(e)} taken={names} />
          ))}
        </tbody>
      </table>
      <form
        className="mt-1 flex items-start gap-1"
        onSubmit={(e) => {
          e.preventDefault();
          add();
        }}
      >
        <div className="w-[28%]">
          <input aria-label="New parameter name" placeholder="name" className={INPUT} value={newName} onChange={(e) => setNewName(e.target.value)} aria-invalid={!!problem} />
          {problem && <p className="mt-0.5 text-[11px] text-caution">⚠ {problem}</p>}
          {!problem && typed && (
            <p className="mt-0.5 text-[11px] text-ink-faint" data-testid="parameter-typed-whole">
              {typed.expression ? `Enter adds ${name} = ${typed.expression}` : `Type its value after “=”, or in the expression box`}
            </p>
          )}
        </div>
        <input aria-label="New parameter expression" placeholder={units === "US" ? "e.g. 50 psi" : "e.g. 350 kPa"} className={`${INPUT} w-[40%]`} value={newExpr} onChange={(e) => setNewExpr(e.target.value)} spellCheck={false} />
        <button type="submit" className={BUTTON} disabled={!name || !!problem || !expression.trim()}>
          Add
        </button>
      </form>
    </section>
  );
}
