"use client";
// Storing a field from a form: the element with the new value must pass the file format's zod
// schema for its kind; if not, the form shows the schema's words at the field and nothing changes.
// `useLastGood` finds a field's last good value in the undo history (Escape and a refused blank
// go back to it).
import { useCallback } from "react";
import type { z } from "zod";
import { bodySchema, formatPath, loadSchema, massSourceSchema, portSchema, supportSchema } from "@/solver/schema";
import { useStores } from "@/canvas/context";
import { findElement, type Group } from "@/canvas/model/elements";
import { elementField, lastGoodValue, setField, type FieldValue } from "@/canvas/commands/fields";
import type { Numeric } from "@/solver/schema";
import type { Command } from "@/canvas/commands/define";

const SCHEMAS: Record<Group, z.ZodType> = {
  bodies: bodySchema,
  supports: supportSchema,
  loads: loadSchema,
  ports: portSchema,
  massSources: massSourceSchema,
};

type Path = ReadonlyArray<string | number>;

function withValue(el: unknown, path: Path, value: FieldValue): unknown {
  const copy = structuredClone(el) as Record<string | number, unknown>;
  let t = copy;
  for (const k of path.slice(0, -1)) t = t[k] as Record<string | number, unknown>;
  const last = path[path.length - 1];
  if (value === undefined || value === "") delete t[last];
  else t[last] = value;
  return copy;
}

/** commit(path, value, coalesce) → error text or null */
export function useCommit(id: string) {
  const { editor } = useStores();
  return useCallback(
    (path: Path, value: FieldValue, coalesce?: string): string | null => {
      const s = editor.getState();
      const l = findElement(s.sketch, id);
      if (!l) return null;
      const parsed = SCHEMAS[l.group].safeParse(withValue(l.el, path, value));
      if (!parsed.success) {
        const want = formatPath(path as PropertyKey[]);
        const issue = parsed.error.issues.find((i) => formatPath(i.path) === want) ?? parsed.error.issues[0];
        return issue.message;
      }
      s.apply(setField({ id, field: path, value }) as Command<unknown>, coalesce ? { coalesce } : undefined);
      return null;
    },
    [editor, id],
  );
}

/** lastGood(visit) → the field's last good value from before the edit `visit` (a coalesce key), or null. */
export type LastGood = (visit: string) => { value: Numeric | undefined } | null;

/** The last good value of an element's field, by its path in the element. */
export function useElementLastGood(id: string) {
  const { editor } = useStores();
  return useCallback(
    (path: Path): LastGood =>
      (visit) =>
        lastGoodValue(editor.getState(), elementField(id, path), visit),
    [editor, id],
  );
}
