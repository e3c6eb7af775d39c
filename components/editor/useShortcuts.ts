"use client";
// The keyboard: registered actions by their shortcuts, plus the keys a drag or a drawing
// needs (Escape cancels, Enter closes a polygon, Space held pans).
import { useEffect } from "react";
import { actionForKey, copySelection, pasteText, pickSelectedPoint, type ActionContext } from "@/canvas/actions";
import type { InteractionStore } from "@/canvas/konva/interaction";

function typingIn(target: EventTarget | null): boolean {
  const el = target as HTMLElement | null;
  if (!el || !el.tagName) return false;
  const tag = el.tagName;
  return tag === "INPUT" || tag === "TEXTAREA" || tag === "SELECT" || el.isContentEditable;
}

export function useShortcuts(getCtx: () => ActionContext, interaction: InteractionStore) {
  useEffect(() => {
    const down = (e: KeyboardEvent) => {
      if (e.defaultPrevented) return;
      // in a field the keys are the field's, but for the file's own (Ctrl/⌘+S, +E, +O), which mean
      // nothing there and would open the browser's "Save page" or "Open file" instead; a field
      // stores what is typed as it is typed, so the sketch they act on is the one on screen
      if (typingIn(e.target) && actionForKey(e)?.group !== "file") return;
      const ctx = getCtx();
      const s = ctx.stores.editor.getState();
      if (e.key === "Escape") {
        if (ctx.controller?.cancel()) {
          e.preventDefault();
          return;
        }
        if (s.selection.length) {
          s.select([]);
          e.preventDefault();
        }
        s.notify(null);
        return;
      }
      // the point for moments from the keyboard: the selected element's (on a button too, whose
      // own Enter would only select the row again)
      if (e.key === "Enter" && !e.repeat && pickSelectedPoint(ctx)) {
        e.preventDefault();
        return;
      }
      if (s.tool.kind === "body" && s.tool.shape === "polygon") {
        if (e.key === "Enter") {
          e.preventDefault();
          ctx.controller?.finishPolygon();
          return;
        }
        if (e.key === "Backspace" || e.key === "Delete") {
          e.preventDefault();
          s.setTool({ ...s.tool, points: s.tool.points.slice(0, -1) });
          return;
        }
      }
      if (e.key === " " && !e.repeat) {
        const active = document.activeElement as HTMLElement | null;
        const onCanvas = !active || active === document.body || active.dataset.testid === "sketch-canvas";
        if (onCanvas) {
          e.preventDefault();
          interaction.setState({ spaceHeld: true });
          return;
        }
      }
      // a focused button or link keeps Enter and Space; arrows belong to lists that handle them,
      // except on the tray's buttons, whose Enter has just added the selected element and said
      // "Arrow keys move it": there they nudge it (the tray is no list the arrows walk)
      const target = e.target as HTMLElement | null;
      const onControl = target?.closest?.("button, a, [role=menu]");
      const arrowsNudge = e.key.startsWith("Arrow") && !!target?.closest?.("[data-arrows=nudge]");
      if (onControl && !arrowsNudge && (e.key === "Enter" || e.key === " " || e.key.startsWith("Arrow"))) return;
      const action = actionForKey(e);
      // copy, cut and paste reach the sketch through the browser's clipboard events (below)
      if (!action || action.clipboard) return;
      if (action.enabled && !action.enabled(ctx)) {
        if (action.group === "edit") e.preventDefault();
        // say why nothing happened (P with no body yet), rather than ignore the key
        if (action.disabledNotice) s.notify(action.disabledNotice);
        return;
      }
      e.preventDefault();
      action.run(ctx);
    };
    const up = (e: KeyboardEvent) => {
      if (e.key === " ") interaction.setState({ spaceHeld: false });
    };
    const blur = () => interaction.setState({ spaceHeld: false });
    // text selected on the page (a results table, say) copies as text, as anywhere else
    const textSelected = () => !!window.getSelection?.()?.toString();
    const copy = (e: ClipboardEvent) => {
      if (e.defaultPrevented || typingIn(e.target) || textSelected()) return;
      const text = copySelection(getCtx(), e.type === "cut");
      if (text === null || !e.clipboardData) return;
      e.clipboardData.setData("text/plain", text);
      e.preventDefault();
    };
    const paste = (e: ClipboardEvent) => {
      if (e.defaultPrevented || typingIn(e.target)) return;
      if (pasteText(getCtx(), e.clipboardData?.getData("text/plain") ?? "")) e.preventDefault();
    };
    const listeners: Array<[string, (e: never) => void]> = [["copy", copy], ["cut", copy], ["paste", paste], ["keydown", down], ["keyup", up], ["blur", blur]];
    for (const [type, fn] of listeners) window.addEventListener(type, fn as EventListener);
    return () => {
      for (const [type, fn] of listeners) window.removeEventListener(type, fn as EventListener);
    };
  }, [getCtx, interaction]);
}
