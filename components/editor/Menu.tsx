"use client";
// A small dropdown menu (button + list of items), keyboard-friendly: arrows move, Escape closes.
// An item with an `href` is a link (the calc sheet's PDF), so it can open in a new tab too.
import { useEffect, useId, useRef, useState, type ReactNode } from "react";
import { NarrowLabel } from "./NarrowLabel";

export interface MenuItem {
  id: string;
  label: ReactNode;
  detail?: ReactNode;
  shortcut?: string;
  disabled?: boolean;
  /** a link to follow instead of something to run */
  href?: string;
  onSelect?: () => void;
}

const ITEMS = '[role="menuitem"]:not([disabled])';
const ITEM_CLASS =
  "flex w-full items-start justify-between gap-3 px-3 py-1.5 text-left text-[13px] text-ink hover:bg-paper-deep focus:bg-paper-deep focus:outline-none disabled:text-ink-faint/60";

function ItemWords({ it }: { it: MenuItem }) {
  return (
    <>
      <span>
        <span className="block">{it.label}</span>
        {it.detail && <span className="mt-0.5 block text-[11.5px] leading-snug text-ink-faint">{it.detail}</span>}
      </span>
      {it.shortcut && <span className="num shrink-0 pt-0.5 text-[11px] text-ink-faint">{it.shortcut}</span>}
    </>
  );
}

/** `shortLabel` replaces the label on narrow screens (the full label stays the accessible name). */
export function Menu({ label, shortLabel, items, testId, wide }: { label: string; shortLabel?: string; items: MenuItem[]; testId?: string; wide?: boolean }) {
  const [open, setOpen] = useState(false);
  const id = useId();
  const ref = useRef<HTMLDivElement>(null);
  const listRef = useRef<HTMLUListElement>(null);

  useEffect(() => {
    if (!open) return;
    const close = (e: MouseEvent) => {
      if (!ref.current?.contains(e.target as Node)) setOpen(false);
    };
    window.addEventListener("mousedown", close);
    listRef.current?.querySelector<HTMLElement>(ITEMS)?.focus();
    return () => window.removeEventListener("mousedown", close);
  }, [open]);

  const move = (dir: number) => {
    const buttons = [...(listRef.current?.querySelectorAll<HTMLElement>(ITEMS) ?? [])];
    const i = buttons.indexOf(document.activeElement as HTMLElement);
    buttons[(i + dir + buttons.length) % buttons.length]?.focus();
  };

  return (
    <div ref={ref} className="relative">
      <button
        type="button"
        aria-haspopup="menu"
        aria-expanded={open}
        aria-controls={id}
        data-testid={testId}
        aria-label={shortLabel ? label : undefined}
        onClick={() => setOpen((o) => !o)}
        className={`h-8 whitespace-nowrap rounded px-2.5 text-[13px] font-medium pointer-coarse:h-10 ${open ? "bg-paper-deep text-ink" : "text-ink-soft hover:bg-paper-deep hover:text-ink"}`}
      >
        {shortLabel ? <NarrowLabel full={label} short={shortLabel} /> : label}{" "}
        <span aria-hidden="true" className="text-[10px] text-ink-faint">▾</span>
      </button>
      {open && (
        <ul
          id={id}
          ref={listRef}
          role="menu"
          aria-label={label}
          className={`absolute left-0 top-9 z-50 ${wide ? "w-80" : "w-60"} rounded-md border border-rule bg-paper-card py-1 shadow-[0_6px_24px_rgb(var(--shade)/0.14)]`}
          onKeyDown={(e) => {
            if (e.key === "ArrowDown") {
              e.preventDefault();
              move(1);
            } else if (e.key === "ArrowUp") {
              e.preventDefault();
              move(-1);
            } else if (e.key === "Escape") {
              e.preventDefault();
              e.stopPropagation();
              setOpen(false);
              ref.current?.querySelector<HTMLButtonElement>("button")?.focus();
            }
          }}
        >
          {items.map((it) => (
            <li key={it.id} role="none">
              {it.href ? (
                <a role="menuitem" href={it.href} data-testid={`menu-${it.id}`} onClick={() => setOpen(false)} className={ITEM_CLASS}>
                  <ItemWords it={it} />
                </a>
              ) : (
                <button
                  type="button"
                  role="menuitem"
                  disabled={it.disabled}
                  data-testid={`menu-${it.id}`}
                  onClick={() => {
                    setOpen(false);
                    it.onSelect?.();
                  }}
                  className={ITEM_CLASS}
                >
                  <ItemWords it={it} />
                </button>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
