"use client";
// Properties of the sketch itself (nothing selected): title, notes, gravity and motion.
import type { Numeric } from "@/solver/schema";
import { useEditor, useStores } from "@/canvas/context";
import { lastGoodValue, setMotion, setSketchField, sketchField } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands/define";
import { NumericField } from "./NumericField";
import { TextField } from "./TextField";

/** The sketch's own numbers: how strong gravity is, and which way it acts. */
const GRAVITY_FIELDS = [
  {
    field: "gravity",
    label: "Gravity",
    display: "acceleration",
    example: { SI: "9.80665 m/s^2", US: "32.174 ft/s^2" },
    hint: "Blank: standard gravity 9.807 m/s², acting in −y. 0 turns weights off (a plan view).",
    testId: "field-gravity",
  },
  {
    field: "gravityAngle",
    label: "Gravity direction",
    display: "angle",
    example: "-90 deg - slope",
    hint: "Blank: −90°, down the page. Turn it to check a body on a slope or a tilt table: −90° − 5° leans the weight 5° toward −x; a parameter here lets a sweep or the limit finder find the angle at which it tips or slides.",
    testId: "field-gravity-angle",
  },
] as const;

export function SketchForm() {
  const { editor } = useStores();
  const title = useEditor((s) => s.sketch.title);
  const description = useEditor((s) => s.sketch.description);
  const gravity = useEditor((s) => s.sketch.gravity);
  const gravityAngle = useEditor((s) => s.sketch.gravityAngle);
  const motion = useEditor((s) => s.sketch.motion);
  const readOnly = useEditor((s) => s.readOnly);
  const apply = (c: Command<unknown>, coalesce?: string) => editor.getState().apply(c, coalesce ? { coalesce } : undefined);
  /** Escape's value for a field of the sketch: its last good one from before the edit */
  const lastGood = (field: Parameters<typeof sketchField>[0]) => (visit: string) => lastGoodValue(editor.getState(), sketchField(field), visit);
  const setMotionField = (k: "ax" | "ay" | "freeX", v: Numeric | boolean | undefined, c?: string) => {
    apply(setMotion({ motion: { ...(motion ?? {}), [k]: v } }) as Command<unknown>, c);
    return null;
  };
  return (
    <div className="space-y-2.5" data-testid="sketch-form">
      <p className="text-[13px] font-semibold text-ink">Sketch</p>
      <p className="text-[12px] leading-snug text-ink-faint">Nothing selected. Pick an element on the drawing or in the list to {readOnly ? "see its values" : "edit it"}.</p>
      <TextField label="Title" value={title} maxLength={300} onCommit={(v, c) => void apply(setSketchField({ field: "title", value: v || undefined }) as Command<unknown>, c)} />
      <TextField label="Notes" value={description} multiline maxLength={5000} onCommit={(v, c) => void apply(setSketchField({ field: "description", value: v || undefined }) as Command<unknown>, c)} />
      {GRAVITY_FIELDS.map((f) => (
        <NumericField
          key={f.field}
          valueKey={f.field}
          label={f.label}
          value={f.field === "gravity" ? gravity : gravityAngle}
          display={f.display}
          optional
          example={f.example}
          hint={f.hint}
          testId={f.testId}
          lastGood={lastGood(f.field)}
          onCommit={(v, c) => {
            apply(setSketchField({ field: f.field, value: v }) as Command<unknown>, c);
            return null;
          }}
        />
      ))}
      <fieldset className="rounded border border-rule-soft px-2 pb-2 pt-1">
        <legend className="px-1 text-[12px] font-medium text-ink-soft">Motion of the body</legend>
        <p className="mb-1.5 text-[11.5px] leading-snug text-ink-faint">A prescribed acceleration (the inertial force −m·a acts at the centre of gravity), or free to move in x.</p>
        <div className="flex gap-2">
          <div className="flex-1">
            <NumericField valueKey="motion.ax" label="ax" value={motion?.ax} display="acceleration" optional example={{ SI: "0.5 m/s^2", US: "1.6 ft/s^2" }} lastGood={lastGood("motion.ax")} onCommit={(v, c) => setMotionField("ax", v, c)} />
          </div>
          <div className="flex-1">
            <NumericField valueKey="motion.ay" label="ay" value={motion?.ay} display="acceleration" optional example="0" lastGood={lastGood("motion.ay")} onCommit={(v, c) => setMotionField("ay", v, c)} />
          </div>
        </div>
        <label className="mt-1 flex items-center gap-2 text-[12px] text-ink-soft">
          <input type="checkbox" className="accent-accent" checked={motion?.freeX === true} onChange={(e) => setMotionField("freeX", e.target.checked || undefined)} />
          Free to move in x (find ax)
        </label>
      </fieldset>
    </div>
  );
}
