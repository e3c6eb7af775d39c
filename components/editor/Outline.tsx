"use client";
// "Elements": every element, grouped under its body, for selecting and editing without a mouse.
// Up/Down move between rows, Enter or Space selects (Shift or Ctrl adds), Delete deletes. A row
// that goes while it has the focus (deleted, or undone) hands the focus to the row now in its place.
import { useLayoutEffect, useMemo, useRef, type KeyboardEvent } from "react";
import { useShallow } from "zustand/react/shallow";
import { useEditor, useStores } from "@/canvas/context";
import { GROUPS, KIND_LABEL, kindOf, type AnyElement, type Attached, type Located } from "@/canvas/model/elements";
import type { SketchFile } from "@/solver/schema";
import { SymbolIcon } from "./SymbolIcon";
import { useActionRunner } from "./useActions";
import { HEADING } from "./ui";

interface Row {
  l: Located;
  depth: number;
}

const keyCache = new WeakMap<object, string>();

/** One string per element with what the list shows; cached per element object (a drag replaces one). */
function outlineKeys(sketch: SketchFile): string[] {
  const out: string[] = [];
  for (const g of GROUPS) {
    for (const el of sketch[g] as AnyElement[]) {
      let k = keyCache.get(el);
      if (k === undefined) {
        const kind = kindOf(g, el);
        k = `${el.id}\u0000${kind}\u0000${el.label ?? ""}\u0000${(el as Attached).body ?? ""}\u0000${kind === "contact" && (el as { mu?: unknown }).mu !== undefined ? 1 : 0}`;
        keyCache.set(el, k);
      }
      out.push(k);
    }
  }
  return out;
}

/** A light stand-in for an element, rebuilt from the list's key. */
function rowOf(key: string): Located {
  const [id, kind, label, body, mu] = key.split("\u0000");
  const el = { id, label: label || undefined, body: body || undefined, ...(mu === "1" ? { mu: 1 } : {}) } as unknown as Located["el"];
  return { group: kind === "body" ? "bodies" : "supports", index: 0, kind: kind as Located["kind"], el };
}

function rowsOf(list: Located[]): Row[] {
  const rows: Row[] = [];
  const bodies = list.filter((l) => l.group === "bodies");
  const ids = new Set(bodies.map((b) => b.el.id));
  for (const b of bodies) {
    rows.push({ l: b, depth: 0 });
    for (const c of list) if (c.group !== "bodies" && (c.el as Attached).body === b.el.id) rows.push({ l: c, depth: 1 });
  }
  for (const c of list) if (c.group !== "bodies" && !ids.has((c.el as Attached).body)) rows.push({ l: c, depth: 0 });
  return rows;
}

const ROWS = '[data-outline] button[data-row]';

/** The place in the list of the (first) selected row, or -1: where a deletion leaves the focus. */
export function selectedRowIndex(): number {
  return [...document.querySelectorAll<HTMLElement>(ROWS)].findIndex((b) => b.getAttribute("aria-pressed") === "true");
}

/**
 * Focus on the row at `index` (the last one when the list got shorter), or, with no rows left, on
 * the drawing: after a deletion the keyboard carries on from where the deleted element was listed.
 */
export function focusRowNear(index: number) {
  const rows = document.querySelectorAll<HTMLElement>(ROWS);
  const target = rows.length ? rows[Math.max(0, Math.min(index, rows.length - 1))] : document.querySelector<HTMLElement>('[data-testid="sketch-canvas"]');
  target?.focus();
}

export function Outline() {
  const { editor } = useStores();
  // a narrow selector: a drag changes positions, not the rows of this list
  const keys = useEditor(useShallow((s) => outlineKeys(s.sketch)));
  const list = useMemo(() => keys.map(rowOf), [keys]);
  const selection = useEditor((s) => s.selection);
  const run = useActionRunner();
  const listRef = useRef<HTMLUListElement>(null);
  const rows = rowsOf(list);
  const focusIndex = Math.max(0, rows.findIndex((r) => selection.includes(r.l.el.id)));
  // the row with the focus, while the list has it: when that row goes (Delete, Ctrl+Z) the
  // document would be left holding the focus, and the next Tab would start from the top
  const focusedRow = useRef<number | null>(null);
  useLayoutEffect(() => {
    if (focusedRow.current === null) return;
    const active = document.activeElement;
    if (active && active !== document.body) return;
    focusRowNear(focusedRow.current);
  }, [keys]);

  const onKey = (e: KeyboardEvent<HTMLButtonElement>, i: number) => {
    const buttons = listRef.current?.querySelectorAll<HTMLButtonElement>("button[data-row]");
    if (!buttons) return;
    let next = -1;
    if (e.key === "ArrowDown") next = Math.min(rows.length - 1, i + 1);
    else if (e.key === "ArrowUp") next = Math.max(0, i - 1);
    else if (e.key === "Home") next = 0;
    else if (e.key === "End") next = rows.length - 1;
    else if (e.key === "Delete" || e.key === "Backspace") {
      e.preventDefault();
      run("edit.delete");
      return;
    }
    if (next >= 0) {
      e.preventDefault();
      buttons[next]?.focus();
    }
  };

  return (
    <section aria-labelledby="outline-heading" className="flex min-h-0 flex-1 flex-col px-3 pb-2 pt-2">
      <h2 id="outline-heading" className={HEADING}>
        Elements <span className="num font-normal normal-case tracking-normal">({rows.length})</span>
      </h2>
      {rows.length === 0 ? (
        <p className="mt-2 text-[12px] leading-snug text-ink-faint">Nothing drawn yet. Start with a body from “Add”, or open an example.</p>
      ) : (
        <ul
          ref={listRef}
          className="relative mt-1 min-h-0 flex-1 overflow-auto pr-1"
          aria-label="Elements of the sketch"
          data-outline
          onBlur={(e) => {
            // gone elsewhere, or to nothing from a row still there (a click on the page); not a row
            // removed under the focus
            const to = e.relatedTarget as Node | null;
            if (to ? !e.currentTarget.contains(to) : e.target.isConnected) focusedRow.current = null;
          }}
        >
          {rows.map((r, i) => {
            const { l } = r;
            const selected = selection.includes(l.el.id);
            return (
              <li key={l.el.id}>
                <button
                  type="button"
                  data-row
                  tabIndex={i === focusIndex ? 0 : -1}
                  aria-pressed={selected}
                  aria-label={`${KIND_LABEL[l.kind]} ${l.el.id}${l.el.label ? `, ${l.el.label}` : ""}`}
                  onKeyDown={(e) => onKey(e, i)}
                  onFocus={() => (focusedRow.current = i)}
                  onClick={(e) => editor.getState().select([l.el.id], e.shiftKey || e.ctrlKey || e.metaKey ? "toggle" : "replace")}
                  className={`flex w-full items-center gap-1.5 rounded px-1.5 py-[3px] text-left text-[12.5px] pointer-coarse:min-h-10 ${r.depth ? "pl-5" : ""} ${
                    selected ? "bg-accent-soft text-accent-deep" : "text-ink-soft hover:bg-paper-deep"
                  }`}
                >
                  <SymbolIcon kind={l.kind} friction={l.kind === "contact" && (l.el as { mu?: unknown }).mu !== undefined} size={16} />
                  {/* The visible words, in source order, are part of the name ("Pin s1, left pin"; "Body b1"
                      when unlabelled, the kind shown after the id): speech input can say what it sees. Trailing
                      spaces keep the words apart in the name and vanish at the end of a flex item. */}
                  {l.el.label ? null : <span className="order-last truncate">{`${KIND_LABEL[l.kind]} `}</span>}
                  <span className="num shrink-0 text-ink-faint">{`${l.el.id} `}</span>
                  {l.el.label ? <span className="truncate">{l.el.label}</span> : null}
                </button>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
