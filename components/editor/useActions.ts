"use client";
// Running registered actions from components: the tray, menus, buttons and the keyboard.
import { createContext, useCallback, useContext } from "react";
import { ACTIONS, type ActionContext } from "@/canvas/actions";

export const ActionContextCtx = createContext<(() => ActionContext) | null>(null);

export function useActionContext(): () => ActionContext {
  const get = useContext(ActionContextCtx);
  if (!get) throw new Error("actions need the editor's ActionContextCtx");
  return get;
}

/** run("edit.undo") — runs the action when it is enabled; returns whether it ran. */
export function useActionRunner(): (id: string) => boolean {
  const get = useActionContext();
  return useCallback(
    (id: string) => {
      const a = ACTIONS.find((x) => x.id === id);
      if (!a) return false;
      const ctx = get();
      if (a.enabled && !a.enabled(ctx)) return false;
      a.run(ctx);
      return true;
    },
    [get],
  );
}
