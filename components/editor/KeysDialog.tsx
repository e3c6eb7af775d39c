"use client";
// Every key the editor answers to, read from the registered actions so the list cannot fall
// behind them, and the pointer gestures the canvas handles itself (these have no action).
import { ACTIONS, shortcutLabel, type ActionGroup } from "@/canvas/actions";
import { Dialog } from "@/components/versions/Dialog";

const GROUPS: { group: ActionGroup; title: string }[] = [
  { group: "add", title: "Add" },
  { group: "edit", title: "Edit" },
  { group: "view", title: "View" },
  { group: "file", title: "File" },
  { group: "results", title: "Results" },
];

/** What the pointer does on the canvas (canvas/konva/pointer handles these). */
export const GESTURES: { what: string; how: string }[] = [
  { what: "Place a support or a port", how: "Click on the body's outline, or within 12 px of it (it goes onto the outline); a port clicked inside the body goes onto the nearest edge" },
  { what: "Stop placing", how: "Escape, or Done under the drawing" },
  { what: "Move an element", how: "Drag it" },
  { what: "Add to the selection", how: "Shift+click" },
  { what: "Select several", how: "Drag a box on empty canvas" },
  { what: "Turn a port, force, roller, contact or tie", how: "Drag its round handle (5° steps; Alt for 0.1°)" },
  { what: "Reshape a body", how: "Drag a corner handle (Shift frees one corner of a rectangle)" },
  { what: "Place or move without snapping", how: "Hold Alt" },
  { what: "Cancel a drag, a turn or a drawing", how: "Escape" },
  { what: "Close a polygon body", how: "Enter, or click its first corner" },
  { what: "Zoom", how: "Wheel, or pinch with two fingers" },
  { what: "Pan", how: "Hold Space and drag, drag with the middle button, or drag two fingers" },
];

function Key({ spec }: { spec: string }) {
  return <kbd className="num whitespace-nowrap rounded border border-rule bg-paper px-1.5 py-px text-[11.5px] text-ink">{shortcutLabel(spec)}</kbd>;
}

export function KeysDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title="Keys and gestures" wide testId="keys-dialog">
      <div className="grid max-h-[70vh] gap-x-8 gap-y-4 overflow-y-auto pr-1 text-[12.5px] sm:grid-cols-2">
        {GROUPS.map(({ group, title }) => {
          const actions = ACTIONS.filter((a) => a.group === group && a.shortcuts?.length);
          if (!actions.length) return null;
          return (
            <section key={group} aria-label={title}>
              <h3 className="mb-1 text-[11px] font-semibold uppercase tracking-[0.08em] text-ink-faint">{title}</h3>
              <dl className="space-y-1">
                {actions.map((a) => (
                  <div key={a.id} className="flex items-baseline justify-between gap-3" data-testid={`key-${a.id}`}>
                    <dt className="text-ink-soft">{a.label}</dt>
                    <dd className="flex shrink-0 gap-1">
                      {a.shortcuts!.map((k) => (
                        <Key key={k} spec={k} />
                      ))}
                    </dd>
                  </div>
                ))}
              </dl>
            </section>
          );
        })}
        {/* a phone has no keyboard to speak of: its gestures come first there */}
        <section aria-label="Pointer" className="max-sm:order-first sm:col-span-2">
          <h3 className="mb-1 text-[11px] font-semibold uppercase tracking-[0.08em] text-ink-faint">Pointer</h3>
          <dl className="grid gap-x-8 gap-y-1 sm:grid-cols-2">
            {GESTURES.map((g) => (
              <div key={g.what} className="flex items-baseline justify-between gap-3">
                <dt className="text-ink-soft">{g.what}</dt>
                <dd className="text-right text-ink">{g.how}</dd>
              </div>
            ))}
          </dl>
        </section>
      </div>
      <div className="mt-4 flex justify-end">
        <button type="button" onClick={onClose} className="h-8 rounded bg-ink px-3 text-[13px] font-medium text-paper hover:bg-ink-soft">
          Close
        </button>
      </div>
    </Dialog>
  );
}
