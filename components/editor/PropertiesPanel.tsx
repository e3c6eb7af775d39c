"use client";
// "Properties": the form of the selected element, the sketch's own fields when nothing is
// selected, or what to do with several selected elements.
import { actionById, actionTitle } from "@/canvas/actions";
import { useEditor } from "@/canvas/context";
import { findElement, KIND_LABEL } from "@/canvas/model/elements";
import { ElementForm } from "./ElementForm";
import { focusRowNear, selectedRowIndex } from "./Outline";
import { ParametersTable } from "./ParametersTable";
import { SketchForm } from "./SketchForm";
import { UnderlayPanel } from "./UnderlayPanel";
import { useActionRunner } from "./useActions";
import { BUTTON, HEADING } from "./ui";

/**
 * Copy, Paste, Duplicate, Mirror and Delete for the selection, by their registered actions (the
 * same as Ctrl+C, Ctrl+V, Ctrl+D, Shift+H, Shift+V and Delete); a read-only sketch can still be
 * copied from.
 */
function SelectionActions({ readOnlyCopy = false }: { readOnlyCopy?: boolean }) {
  const run = useActionRunner();
  const readOnly = useEditor((s) => s.readOnly);
  // inside the forms' fieldset (disabled when read only), or below it with Copy alone
  if (readOnly !== readOnlyCopy) return null;
  const ids = readOnly ? ["edit.copy"] : ["edit.copy", "edit.paste", "edit.duplicate", "edit.mirrorLeftRight", "edit.mirrorUpDown", "edit.delete"];
  return (
    <div className="flex flex-wrap gap-1.5" data-testid="selection-actions">
      {ids.map((id) => (
        <button
          key={id}
          type="button"
          className={BUTTON}
          title={actionTitle(id)}
          onClick={() => {
            if (id !== "edit.delete") return run(id);
            // the form and this button go with what they showed: the focus goes to the element
            // listed where the deleted one was (the drawing when none is left), not to the page
            const at = selectedRowIndex();
            run(id);
            window.setTimeout(() => focusRowNear(Math.max(0, at)), 0);
          }}
        >
          {actionById(id).label}
        </button>
      ))}
    </div>
  );
}

/**
 * With nothing selected: the mirror commands act on the whole sketch (the same actions as
 * Shift+H and Shift+V), said here so that the keys' reach is no surprise.
 */
function MirrorWholeSketch() {
  const run = useActionRunner();
  const hasBody = useEditor((s) => s.sketch.bodies.length > 0);
  if (!hasBody) return null;
  return (
    <div role="group" aria-labelledby="mirror-all-heading" className="mt-3 flex flex-wrap items-center gap-1.5" data-testid="mirror-whole-sketch">
      <span id="mirror-all-heading" className="text-[12px] text-ink-soft">
        Mirror the whole sketch
      </span>
      {(
        [
          ["edit.mirrorLeftRight", "Left–right"],
          ["edit.mirrorUpDown", "Up–down"],
        ] as const
      ).map(([id, words]) => (
        <button key={id} type="button" className={BUTTON} title={actionTitle(id, `Mirror the whole sketch ${words.toLowerCase()}`)} aria-label={`Mirror the whole sketch ${words.toLowerCase()}`} onClick={() => run(id)}>
          {words}
        </button>
      ))}
    </div>
  );
}

function Several() {
  const selection = useEditor((s) => s.selection);
  const sketch = useEditor((s) => s.sketch);
  return (
    <div className="space-y-2">
      <p className="text-[13px] font-semibold text-ink">{selection.length} elements selected</p>
      <ul className="num max-h-40 overflow-auto text-[12px] text-ink-soft">
        {selection.map((id) => {
          const l = findElement(sketch, id);
          return <li key={id}>{l ? `${KIND_LABEL[l.kind]} ${id}${l.el.label ? ` — ${l.el.label}` : ""}` : id}</li>;
        })}
      </ul>
      <p className="text-[11.5px] text-ink-faint">Drag any of them to move them together; arrow keys nudge.</p>
      <SelectionActions />
    </div>
  );
}

export function PropertiesPanel() {
  const selection = useEditor((s) => s.selection);
  const readOnly = useEditor((s) => s.readOnly);
  return (
    <div className="flex h-full flex-col">
      <section aria-labelledby="props-heading" className="border-b border-rule px-3 pb-3 pt-2">
        <h2 id="props-heading" className={`${HEADING} mb-2`}>
          Properties
        </h2>
        {readOnly ? (
          <p className="mb-2 rounded border border-rule bg-paper-deep/60 px-2 py-1 text-[12px] text-ink-soft" data-testid="read-only-fields">
            Read only — your role may not edit this sketch.
          </p>
        ) : null}
        {/* a disabled fieldset disables every field and button of the forms inside it */}
        <fieldset disabled={readOnly} className="min-w-0">
          {selection.length === 0 ? (
            <>
              <SketchForm />
              <MirrorWholeSketch />
            </>
          ) : selection.length === 1 ? (
            <div className="space-y-3">
              <ElementForm key={selection[0]} id={selection[0]} />
              <SelectionActions />
            </div>
          ) : (
            <Several />
          )}
        </fieldset>
        {selection.length > 0 && <SelectionActions readOnlyCopy />}
      </section>
      <UnderlayPanel />
      <fieldset disabled={readOnly} className="min-w-0 px-3 pb-4 pt-2">
        <ParametersTable />
      </fieldset>
    </div>
  );
}
