"use client";
// "Add": the element kinds, drawn with their symbols. Click to choose the tool (then click on the
// canvas), or drag one onto the canvas. Enter or Space on a focused item adds the element at
// once (a body in the middle of the view, anything else on the selected or nearest body), so the
// editor needs no pointer. Generated from the registered actions.
import { useState, type KeyboardEvent } from "react";
import { ACTIONS, shortcutLabel, type Action } from "@/canvas/actions";
import { TRAY_MIME, type TrayDrop } from "@/canvas/konva/interaction";
import { useEditor } from "@/canvas/context";
import { NEEDS_BODY } from "@/canvas/placement";
import { SymbolIcon } from "./SymbolIcon";
import { useActionContext, useActionRunner } from "./useActions";
import { HEADING } from "./ui";

const SECTIONS: Array<{ title: string; ids: string[] }> = [
  { title: "Body", ids: ["add.body", "add.polygon"] },
  { title: "Supports", ids: ["add.pin", "add.roller", "add.contact", "add.contact-friction", "add.fixed", "add.tie"] },
  { title: "Loads", ids: ["add.force", "add.couple", "add.distributed"] },
  { title: "Flow", ids: ["add.inlet", "add.outlet", "add.massSource"] },
];

function isActive(a: Action, tool: ReturnType<typeof useToolKey>) {
  if (a.id === "add.body") return tool === "body:rectangle";
  if (a.id === "add.polygon") return tool === "body:polygon";
  return tool === `place:${a.kind}${a.friction ? ":f" : ""}`;
}

function useToolKey() {
  return useEditor((s) => {
    const t = s.tool;
    if (t.kind === "body") return `body:${t.shape}`;
    if (t.kind === "place") return `place:${t.element}${t.friction ? ":f" : ""}`;
    return t.kind;
  });
}

const activates = (e: KeyboardEvent) => (e.key === "Enter" || e.key === " ") && !e.altKey && !e.ctrlKey && !e.metaKey;

/** Below this width the tray is a drawer over the drawing, opened from the toolbar's Add button. */
const OVER_DRAWING = "(max-width: 639px)";

/**
 * After a pick on a phone-width screen the drawer gets out of the way of the drawing, where the
 * next tap places the element (or shows the one just added). It is closed by its own toolbar
 * button, which holds whether it is open; that is read once the pick's updates are on screen, so
 * a drawer a change of tool already closed is not opened again. Wider screens keep the tray
 * beside the drawing, untouched. After a key the focus goes to that button, as Escape leaves it.
 */
function closeOverDrawing(byKey: boolean) {
  if (typeof window.matchMedia !== "function" || !window.matchMedia(OVER_DRAWING).matches) return;
  window.setTimeout(() => {
    const toggle = document.querySelector<HTMLElement>('[data-testid="toggle-tray"]');
    if (!toggle) return;
    if (toggle.getAttribute("aria-expanded") === "true") toggle.click();
    if (byKey) toggle.focus();
  }, 0);
}

export function Tray() {
  const run = useActionRunner();
  const getCtx = useActionContext();
  const needsBody = () => getCtx().stores.editor.getState().notify(NEEDS_BODY);
  // Enter and Space place at once instead of the button's click (which only chooses the tool):
  // cancelling the keydown stops Enter's click, cancelling Space's keyup stops its click
  const onKeyDown = (a: Action, disabled: boolean) => (e: KeyboardEvent) => {
    if (!activates(e)) return;
    e.preventDefault();
    if (e.repeat) return;
    if (disabled) needsBody();
    else {
      a.placeNow?.(getCtx());
      closeOverDrawing(true);
    }
  };
  const tool = useToolKey();
  const hasBody = useEditor((s) => s.sketch.bodies.length > 0);
  // the focused item's words under the tray: a tooltip (the title) never shows for the keyboard
  const [focused, setFocused] = useState<string | null>(null);
  const focusedAction = focused ? ACTIONS.find((x) => x.id === focused) : undefined;
  return (
    <section aria-labelledby="tray-heading" aria-describedby="tray-keys" className="border-b border-rule px-3 pb-3 pt-2">
      <h2 id="tray-heading" className={HEADING}>
        Add
      </h2>
      <p id="tray-keys" className="sr-only">
        Enter or Space adds it now: a body in the middle of the view, anything else on the selected body; the arrow keys then move what was added. A click chooses the tool, then click on the canvas.
      </p>
      {SECTIONS.map((sec) => (
        <div key={sec.title} className="mt-2">
          <p className="mb-1 text-[10.5px] font-medium uppercase tracking-wider text-ink-faint">{sec.title}</p>
          <div className="grid grid-cols-3 gap-1">
            {sec.ids.map((id) => {
              const a = ACTIONS.find((x) => x.id === id)!;
              const disabled = a.kind !== "body" && !hasBody;
              const active = isActive(a, tool);
              const key = a.shortcuts?.[0];
              return (
                <button
                  key={id}
                  type="button"
                  aria-pressed={active}
                  aria-disabled={disabled}
                  data-arrows="nudge"
                  title={`${a.label}${key ? ` (${shortcutLabel(key)})` : ""} — ${disabled ? "draw a body first" : a.hint}`}
                  draggable={!disabled}
                  onDragStart={(e) => {
                    const drop: TrayDrop = { kind: a.kind!, friction: a.friction, polygon: id === "add.polygon" || undefined };
                    e.dataTransfer.setData(TRAY_MIME, JSON.stringify(drop));
                    e.dataTransfer.effectAllowed = "copy";
                  }}
                  onKeyDown={onKeyDown(a, disabled)}
                  onFocus={() => setFocused(id)}
                  onBlur={() => setFocused((f) => (f === id ? null : f))}
                  onKeyUp={(e) => {
                    if (e.key === " ") e.preventDefault();
                  }}
                  onClick={() => {
                    if (disabled) return needsBody();
                    run(a.id);
                    closeOverDrawing(false);
                  }}
                  className={`group flex h-[58px] flex-col items-center justify-center gap-0.5 rounded border text-center text-[10.5px] leading-tight transition-colors ${
                    active ? "border-accent bg-accent-soft text-accent-deep" : "border-transparent text-ink-soft hover:border-rule hover:bg-paper"
                  } ${disabled ? "cursor-not-allowed opacity-40" : "cursor-grab"}`}
                  data-testid={`tray-${id.slice(4)}`}
                >
                  <SymbolIcon kind={a.kind!} friction={a.friction} polygon={id === "add.polygon"} size={28} />
                  <span>{a.label.replace("Body (", "").replace(")", "").replace("Contact with friction", "Contact, μ").replace("Distributed load", "Distributed").replace("Fixed support", "Fixed")}</span>
                </button>
              );
            })}
          </div>
        </div>
      ))}
      {/* the tooltip's words for the item the keyboard is on; the title already gives them to a screen reader */}
      {focusedAction ? (
        <p className="mt-2 text-[11px] leading-snug text-ink-soft" aria-hidden="true" data-testid="tray-focus-hint">
          <span className="font-medium text-ink">{focusedAction.label}</span>
          {focusedAction.shortcuts?.[0] ? ` (${shortcutLabel(focusedAction.shortcuts[0])})` : ""}: {focusedAction.kind !== "body" && !hasBody ? "draw a body first." : `${focusedAction.hint} Enter adds it now.`}
        </p>
      ) : null}
    </section>
  );
}
