"use client";
// The properties of one element: its name, the body it belongs to, and each field of its kind.
import { useDeferredValue } from "react";
import type { Numeric } from "@/solver/schema";
import { useAnalysis, useEditor, useScene, useStores } from "@/canvas/context";
import { findElement, KIND_LABEL, type Attached, type BodyEl } from "@/canvas/model/elements";
import { attachToBody } from "@/canvas/commands/elements";
import { insertCorner, removeCorner } from "@/canvas/commands/shape";
import { moveCentreOfGravity } from "@/canvas/commands/move";
import { setForceForm } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands/define";
import { convert, formatNumber, formatQuantity } from "@/solver/units";
import { FORCE_COMPONENTS, FORCE_POLAR, FORM, type FieldDef, type NumberFieldDef, type PointFieldDef } from "./fieldDefs";
import { NumericField } from "./NumericField";
import { TextField } from "./TextField";
import { useCommit } from "./useCommit";
import { BUTTON, ICON_BUTTON, INPUT } from "./ui";

type Commit = ReturnType<typeof useCommit>;

function NumberRow({ id, def, value, commit }: { id: string; def: NumberFieldDef; value: Numeric | undefined; commit: Commit }) {
  return (
    <NumericField
      valueKey={`${id}.${def.key}`}
      label={def.label}
      value={value}
      display={def.display}
      optional={def.optional}
      example={def.example}
      hint={def.hint}
      testId={`field-${def.key}`}
      onCommit={(v, c) => commit([def.key], v, c)}
    />
  );
}

function PointRow({ id, def, value, commit }: { id: string; def: PointFieldDef; value: Numeric[] | undefined; commit: Commit }) {
  // a plain number is metres whatever the units shown; in US units the echo under each field is in ft
  const units = useEditor((s) => s.units);
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
  const apply = (c: Command<unknown>) => editor.getState().apply(c);
  return (
    <fieldset>
      <legend className="mb-1 text-[12px] font-medium text-ink-soft">Outline corners (m)</legend>
      <ol className="space-y-1">
        {body.outline.map((p, i) => (
          <li key={i} className="flex items-start gap-1.5">
            <span className="num mt-1.5 w-4 text-right text-[11px] text-ink-faint">{i + 1}</span>
            {[0, 1].map((k) => (
              <NumericField key={k} compact valueKey={`${id}.outline[${i}][${k}]`} label={`Corner ${i + 1} ${k ? "y" : "x"}`} value={p[k]} display="length" onCommit={(v, c) => commit(["outline", i, k], v, c)} />
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

function PortFlow({ id }: { id: string }) {
  const item = useScene((s) => s.byId.get(id)) as { massFlow: number; velocity: number; beta: number; pressure: number; area?: number } | undefined;
  const units = useEditor((s) => s.units);
  if (!item || !Number.isFinite(item.massFlow)) return null;
  return (
    <p className="num rounded bg-paper px-2 py-1 text-[11.5px] text-ink-soft">
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
  if (!located) return null;
  const { kind, el, group } = located;
  const record = el as unknown as Record<string, unknown>;
  const defs: FieldDef[] = FORM[kind];
  const basic = defs.filter((d) => !("advanced" in d && d.advanced));
  const advanced = defs.filter((d) => "advanced" in d && d.advanced);
  const row = (d: FieldDef) =>
    "point" in d ? (
      d.key === "cg" ? <CentreOfGravity key={d.key} id={id} body={el as BodyEl} /> : <PointRow key={d.key} id={id} def={d} value={record[d.key] as Numeric[] | undefined} commit={commit} />
    ) : (
      <NumberRow key={d.key} id={id} def={d} value={record[d.key] as Numeric | undefined} commit={commit} />
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
      {(kind === "inlet" || kind === "outlet") && <PortFlow id={id} />}
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
