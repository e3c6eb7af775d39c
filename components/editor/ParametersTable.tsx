"use client";
// Parameters: named values every expression may use ("theta", "rho", "Q"). Name, expression, value.
import { useId, useState } from "react";
import { evaluateToNumber, reservedNameReason, type FieldKind } from "@/solver/expressions";
import { useAnalysis, useEditor, useStores } from "@/canvas/context";
import { deleteParameter, renameParameter, setParameter } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands/define";
import { numericText, toNumeric } from "@/canvas/model/numeric";
import { formatNumber, formatQuantity, prettyUnit, type Quantity, type UnitSystem } from "@/solver/units";
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

export function nameProblem(name: string, taken: string[], self?: string): string | null {
  if (!name) return "give it a name";
  if (!NAME.test(name)) return "letters, digits and _ only, starting with a letter";
  if (name !== self && taken.includes(name)) return `${name} is already a parameter`;
  return reservedNameReason(name);
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
  const shown = value === undefined ? "" : "error" in value ? value.error : readableValue(value.value, value.unit, units);
  return (
    <tr className="align-top">
      <td className="py-1 pr-1">
        <input
          aria-label={`Name of parameter ${name}`}
          className={INPUT}
          value={nameDraft ?? name}
          aria-invalid={!!nameErr}
          onChange={(e) => setNameDraft(e.target.value)}
          onBlur={() => {
            if (nameDraft !== null && !nameErr && nameDraft !== name) apply(renameParameter({ from: name, to: nameDraft }) as Command<unknown>);
            setNameDraft(null);
          }}
          onKeyDown={(e) => e.key === "Enter" && (e.target as HTMLInputElement).blur()}
        />
        {nameErr && <p className="mt-0.5 text-[11px] text-caution">⚠ {nameErr}</p>}
      </td>
      <td className="py-1 pr-1">
        <input
          aria-label={`Expression of parameter ${name}`}
          className={INPUT}
          value={exprDraft ?? expression}
          spellCheck={false}
          onFocus={() => setExprDraft(expression)}
          onBlur={() => setExprDraft(null)}
          onChange={(e) => {
            setExprDraft(e.target.value);
            const v = toNumeric(e.target.value);
            if (v !== undefined) apply(setParameter({ name, expression: v }) as Command<unknown>, `param:${id}`);
          }}
          onKeyDown={(e) => e.key === "Enter" && (e.target as HTMLInputElement).blur()}
        />
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
  const problem = newName ? nameProblem(newName, names) : null;
  const add = () => {
    const v = toNumeric(newExpr);
    if (problem || !newName || v === undefined) return;
    editor.getState().apply(setParameter({ name: newName, expression: v }) as Command<unknown>);
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
        </div>
        <input aria-label="New parameter expression" placeholder={units === "US" ? "e.g. 50 psi" : "e.g. 350 kPa"} className={`${INPUT} w-[40%]`} value={newExpr} onChange={(e) => setNewExpr(e.target.value)} spellCheck={false} />
        <button type="submit" className={BUTTON} disabled={!newName || !!problem || !newExpr.trim()}>
          Add
        </button>
      </form>
    </section>
  );
}
