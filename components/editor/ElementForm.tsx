"use client";
// The properties of one element: its name, the body it belongs to, and each field of its kind.
import { useCallback, useDeferredValue, useState } from "react";
import type { Numeric } from "@/solver/schema";
import { useAnalysis, useEditor, useScene, useStores } from "@/canvas/context";
import { findElement, KIND_LABEL, type Attached, type BodyEl } from "@/canvas/model/elements";
import { attachToBody } from "@/canvas/commands/elements";
import { insertCorner, removeCorner } from "@/canvas/commands/shape";
import { moveCentreOfGravity } from "@/canvas/commands/move";
import { setForceForm } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands/define";
import { convert, formatNumber, formatQuantity } from "@/solver/units";
import {
  FORCE_COMPONENTS,
  FORCE_POLAR,
  FORM,
  PORT_FLOW_KEYS,
  PORT_OTHER_WAYS,
  fieldLabel,
  fieldWords,
  portBlankRefusal,
  portLacks,
  type FieldDef,
  type NumberFieldDef,
  type PointFieldDef,
  type PortLack,
} from "./fieldDefs";
import { NumericField } from "./NumericField";
import { TextField } from "./TextField";
import { useCommit, useElementLastGood } from "./useCommit";
import { BUTTON, ICON_BUTTON, INPUT } from "./ui";

type Commit = ReturnType<typeof useCommit>;
/** A field's own refusal (or null), by its key, for the rest of the form. */
type Report = (key: string, problem: string | null) => void;

interface RowExtras {
  /** said at the field while it is blank: what the element lacks without it */
  needed?: string;
  /** why the field may not be left blank now, or null */
  refuseBlank?: (key: string) => string | null;
  report?: Report;
}

function NumberRow({ id, def, value, commit, needed, refuseBlank, report }: { id: string; def: NumberFieldDef; value: Numeric | undefined; commit: Commit } & RowExtras) {
  const key = def.key;
  const lastGood = useElementLastGood(id);
  const onProblem = useCallback((problem: string | null) => report?.(key, problem), [report, key]);
  return (
    <NumericField
      valueKey={`${id}.${def.key}`}
      label={def.label}
      value={value}
      display={def.display}
      optional={def.optional}
      example={def.example}
      hint={def.hint}
      needed={needed}
      testId={`field-${def.key}`}
      onProblem={report ? onProblem : undefined}
      onCommit={(v, c) => (v === undefined && refuseBlank?.(def.key)) || commit([def.key], v, c)}
      lastGood={lastGood([def.key])}
    />
  );
}

function PointRow({ id, def, value, commit }: { id: string; def: PointFieldDef; value: Numeric[] | undefined; commit: Commit }) {
  // a plain number is metres whatever the units shown; in US units the echo under each field is in ft
  const units = useEditor((s) => s.units);
  const lastGood = useElementLastGood(id);
  if (!value) return null;
  return (
    <fieldset>
      <legend className="mb-0.5 text-[12px] font-medium text-ink-soft">
        {def.label} {units === "US" ? "(plain numbers in m; or type ft)" : "(m)"}
      </legend>
      <div className="flex gap-2">
        {[0, 1].map((i) => (
          <NumericField
            key={i}
            compact
            valueKey={`${id}.${def.key}[${i}]`}
            label={`${def.label} ${i ? "y" : "x"}`}
            value={value[i]}
            display="length"
            testId={`field-${def.key}-${i ? "y" : "x"}`}
            onCommit={(v, c) => commit([def.key, i], v, c)}
            lastGood={lastGood([def.key, i])}
          />
        ))}
      </div>
    </fieldset>
  );
}

function CentreOfGravity({ id, body }: { id: string; body: BodyEl }) {
  const { editor } = useStores();
  const commit = useCommit(id);
  const centroid = useScene((s) => (s.byId.get(id) as { cg?: [number, number] } | undefined)?.cg);
  const units = useEditor((s) => s.units);
  const len = (m: number) => convert(m, "length", units);
  if (body.cg) {
    return (
      <div>
        <PointRow id={id} def={{ key: "cg", label: "Centre of gravity", point: true }} value={body.cg} commit={commit} />
        <button type="button" className="text-[11.5px] text-accent hover:underline" onClick={() => editor.getState().apply(moveCentreOfGravity({ id, to: null }) as Command<unknown>)}>
          Use the outline&apos;s centroid
        </button>
      </div>
    );
  }
  return (
    <div>
      <p className="text-[12px] font-medium text-ink-soft">Centre of gravity</p>
      <p className="num text-[11.5px] text-ink-faint">
        At the outline&apos;s centroid{centroid ? ` (${len(centroid[0]).value.toFixed(3)}, ${len(centroid[1]).value.toFixed(3)}) ${len(1).unit}` : ""}.{" "}
        <button
          type="button"
          className="text-accent hover:underline"
          onClick={() => centroid && editor.getState().apply(moveCentreOfGravity({ id, to: [Number(centroid[0].toFixed(3)), Number(centroid[1].toFixed(3))] }) as Command<unknown>)}
        >
          Give it
        </button>
      </p>
    </div>
  );
}

function Corners({ id, body }: { id: string; body: BodyEl }) {
  const { editor } = useStores();
  const commit = useCommit(id);
  const lastGood = useElementLastGood(id);
  const apply = (c: Command<unknown>) => editor.getState().apply(c);
  return (
    <fieldset>
      <legend className="mb-1 text-[12px] font-medium text-ink-soft">Outline corners (m)</legend>
      <ol className="space-y-1">
        {body.outline.map((p, i) => (
          <li key={i} className="flex items-start gap-1.5">
            <span className="num mt-1.5 w-4 text-right text-[11px] text-ink-faint">{i + 1}</span>
            {[0, 1].map((k) => (
              <NumericField key={k} compact valueKey={`${id}.outline[${i}][${k}]`} label={`Corner ${i + 1} ${k ? "y" : "x"}`} value={p[k]} display="length" onCommit={(v, c) => commit(["outline", i, k], v, c)} lastGood={lastGood(["outline", i, k])} />
            ))}
            <button type="button" className={`${ICON_BUTTON} mt-0`} aria-label={`Remove corner ${i + 1}`} disabled={body.outline.length <= 3} onClick={() => apply(removeCorner({ id, corner: i }) as Command<unknown>)}>
              ×
            </button>
          </li>
        ))}
      </ol>
      <button type="button" className={`${BUTTON} mt-1`} onClick={() => apply(insertCorner({ id, after: body.outline.length - 1 }) as Command<unknown>)}>
        Add a corner
      </button>
    </fieldset>
  );
}

function ForceFields({ id, el, commit }: { id: string; el: Record<string, unknown>; commit: Commit }) {
  const { editor } = useStores();
  const item = useScene((s) => s.byId.get(id)) as { magnitude: number; angle: number } | undefined;
  const polar = el.fx === undefined && el.fy === undefined;
  const setForm = (form: "polar" | "components") => item && editor.getState().apply(setForceForm({ id, form, magnitude: item.magnitude, angle: item.angle }) as Command<unknown>);
  return (
    <>
      <div role="radiogroup" aria-label="Force given as" className="flex gap-3 text-[12px] text-ink-soft">
        {(["polar", "components"] as const).map((f) => (
          <label key={f} className="flex items-center gap-1">
            <input type="radio" name={`form-${id}`} checked={polar === (f === "polar")} onChange={() => setForm(f)} className="accent-accent" />
            {f === "polar" ? "Magnitude and direction" : "Components Fx, Fy"}
          </label>
        ))}
      </div>
      {(polar ? FORCE_POLAR : FORCE_COMPONENTS).map((d) => (
        <NumberRow key={d.key} id={id} def={d} value={el[d.key] as Numeric | undefined} commit={commit} />
      ))}
    </>
  );
}

/** "area", "area and density ρ", "mass flow ṁ, area and density ρ" */
const listed = (words: string[]) => (words.length < 2 ? words.join("") : `${words.slice(0, -1).join(", ")} and ${words[words.length - 1]}`);

/** What a port's field says while it is blank and the port cannot do without it. */
function portNeeded(kind: "inlet" | "outlet", lack: PortLack): string {
  const label = fieldLabel(kind, lack);
  if (lack === "area") return `${label} is needed: the gauge pressure acts on it.`;
  return `${label} is needed (or ${PORT_OTHER_WAYS[lack]}).`;
}

/**
 * The port's ṁ, V, momentum flux and pressure force as the solver takes them, or, while one of its
 * flow fields is in error (at the field or in the analysis) or it lacks what it needs, what they
 * wait for, with no numbers: numbers from a refused value would be wrong.
 */
function PortFlow({ id, kind, port, problems }: { id: string; kind: "inlet" | "outlet"; port: Record<string, unknown>; problems: Readonly<Record<string, string>> }) {
  const item = useScene((s) => s.byId.get(id)) as { massFlow: number; velocity: number; beta: number; pressure: number; area?: number } | undefined;
  const units = useEditor((s) => s.units);
  const fieldErrors = useAnalysis((s) => s.fieldValues.errors);
  // a blank field the solver asks for is missing, not invalid: the port's lack says it below
  const inError = PORT_FLOW_KEYS.filter((k) => problems[k] !== undefined || (port[k] !== undefined && fieldErrors.has(`${id}.${k}`)));
  const lack = portLacks(port);
  let waits: string | null = null;
  if (inError.length) waits = `Resolved values wait for a valid ${listed(inError.map((k) => fieldWords(kind, k)))}.`;
  else if (lack === "area") waits = "Resolved values wait for the area the gauge pressure acts on.";
  else if (lack) waits = `Resolved values wait for a ${lack === "massFlow" ? "mass flow: give ṁ" : "velocity: give V"}, or ${PORT_OTHER_WAYS[lack]}.`;
  else if (!item || ![item.massFlow, item.velocity, item.beta].every(Number.isFinite)) waits = "Resolved values wait for the port's flow fields to be worked out.";
  if (waits || !item) {
    return (
      <p className="rounded bg-paper px-2 py-1 text-[11.5px] text-ink-soft" data-testid="port-resolved">
        {waits}
      </p>
    );
  }
  return (
    <p className="num rounded bg-paper px-2 py-1 text-[11.5px] text-ink-soft" data-testid="port-resolved">
      Resolved: ṁ = {formatQuantity(item.massFlow, "massFlow", units)}, V = {formatQuantity(item.velocity, "velocity", units)}, momentum flux{" "}
      {item.beta === 1 ? "ṁV" : `βṁV (β = ${formatNumber(item.beta)})`} = {formatQuantity(item.beta * item.massFlow * item.velocity, "force", units)}
      {/* the gauge pressure's force, pushing inward at every port (the file format's rule) */}
      {item.pressure !== 0 && item.area !== undefined && Number.isFinite(item.pressure * item.area) ? <>, pressure force pA = {formatQuantity(Math.abs(item.pressure) * item.area, "force", units)} {item.pressure > 0 ? "inward" : "outward (suction)"}</> : null}
    </p>
  );
}

export function ElementForm({ id }: { id: string }) {
  // deferred: while a drag moves this element, its frames come before the form's x and y
  const located = useDeferredValue(useEditor((s) => findElement(s.sketch, id)));
  const bodies = useEditor((s) => s.sketch.bodies);
  const elementError = useAnalysis((s) => s.fieldValues.errors.get(id));
  const { editor } = useStores();
  const commit = useCommit(id);
  // the fields' own refusals (a blank or a value they would not store), for the port's resolved line
  const [problems, setProblems] = useState<Readonly<Record<string, string>>>({});
  const report = useCallback<Report>(
    (key, problem) =>
      setProblems((prev) => {
        if ((prev[key] ?? null) === problem) return prev;
        const next = { ...prev };
        if (problem) next[key] = problem;
        else delete next[key];
        return next;
      }),
    [],
  );
  // a port's field may not be left blank when the port would then lack what it has (read from the
  // sketch as it is now, not the form's deferred copy)
  const refuseBlank = useCallback(
    (key: string) => {
      const now = findElement(editor.getState().sketch, id);
      return now && (now.kind === "inlet" || now.kind === "outlet") ? portBlankRefusal(now.kind, now.el as unknown as Record<string, unknown>, key) : null;
    },
    [editor, id],
  );
  if (!located) return null;
  const { kind, el, group } = located;
  const record = el as unknown as Record<string, unknown>;
  const port = kind === "inlet" || kind === "outlet" ? kind : null;
  const lack = port ? portLacks(record) : null;
  const portExtras = (key: string): RowExtras => (port ? { report, refuseBlank, needed: lack === key ? portNeeded(port, lack) : undefined } : {});
  const defs: FieldDef[] = FORM[kind];
  const basic = defs.filter((d) => !("advanced" in d && d.advanced));
  const advanced = defs.filter((d) => "advanced" in d && d.advanced);
  const row = (d: FieldDef) =>
    "point" in d ? (
      d.key === "cg" ? <CentreOfGravity key={d.key} id={id} body={el as BodyEl} /> : <PointRow key={d.key} id={id} def={d} value={record[d.key] as Numeric[] | undefined} commit={commit} />
    ) : (
      <NumberRow key={d.key} id={id} def={d} value={record[d.key] as Numeric | undefined} commit={commit} {...portExtras(d.key)} />
    );

  return (
    <div className="space-y-2.5" data-testid="element-form">
      <p className="text-[13px] font-semibold text-ink">
        {KIND_LABEL[kind]} <span className="num font-normal text-ink-faint">{el.id}</span>
      </p>
      {elementError && (
        <p className="rounded border border-caution/40 bg-caution-soft px-2 py-1 text-[12px] text-caution" aria-live="polite">
          ⚠ {elementError}
        </p>
      )}
      <TextField label="Label" value={el.label} placeholder="shown on the drawing" testId="field-label" onCommit={(v, c) => commit(["label"], v || undefined, c)} />
      {group !== "bodies" && (
        <div>
          <label htmlFor={`attach-${id}`} className="mb-0.5 block text-[12px] font-medium text-ink-soft">
            Belongs to
          </label>
          <select id={`attach-${id}`} className={INPUT} value={(el as Attached).body} onChange={(e) => editor.getState().apply(attachToBody({ ids: [id], body: e.target.value }) as Command<unknown>)}>
            {bodies.map((b) => (
              <option key={b.id} value={b.id}>
                {b.label ? `${b.label} (${b.id})` : b.id}
              </option>
            ))}
          </select>
        </div>
      )}
      {basic.map(row)}
      {kind === "force" && <ForceFields id={id} el={record} commit={commit} />}
      {port && <PortFlow id={id} kind={port} port={record} problems={problems} />}
      {kind === "body" && <Corners id={id} body={el as BodyEl} />}
      {group !== "supports" && (
        <TextField
          label={kind === "body" ? "Load group of its weight" : "Load group"}
          value={(el as { group?: string }).group}
          placeholder={kind === "body" ? "dead" : group === "loads" ? "loads" : "flow"}
          testId="field-group"
          onCommit={(v, c) => commit(["group"], v.trim() || undefined, c)}
        />
      )}
      {advanced.length > 0 && (
        <details className="rounded border border-rule-soft px-2 py-1">
          <summary className="cursor-pointer text-[12px] text-ink-soft">Stiffness (indeterminate supports)</summary>
          <div className="mt-2 space-y-2">{advanced.map(row)}</div>
        </details>
      )}
    </div>
  );
}
