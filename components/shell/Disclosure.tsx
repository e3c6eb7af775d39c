"use client";
import { useEffect, useId, useRef, useState, type ReactNode } from "react";

/**
 * A button that opens a small panel below it (workspace switcher, account menu). Closes on
 * Escape, on a click outside, and when something inside is chosen.
 */
export function Disclosure({
  label,
  button,
  children,
  align = "left",
  width = "w-72",
}: {
  /** The button's name when its own text does not say it; leave it out when the button holds its name. */
  label?: string;
  button: ReactNode;
  children: (close: () => void) => ReactNode;
  align?: "left" | "right";
  width?: string;
}) {
  const [open, setOpen] = useState(false);
  const root = useRef<HTMLDivElement>(null);
  const trigger = useRef<HTMLButtonElement>(null);
  const panelId = useId();

  useEffect(() => {
    if (!open) return;
    const onDown = (e: MouseEvent) => {
      if (root.current && !root.current.contains(e.target as Node)) setOpen(false);
    };
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") {
        setOpen(false);
        trigger.current?.focus();
      }
    };
    document.addEventListener("mousedown", onDown);
    document.addEventListener("keydown", onKey);
    return () => {
      document.removeEventListener("mousedown", onDown);
      document.removeEventListener("keydown", onKey);
    };
  }, [open]);

  return (
    <div ref={root} className="relative min-w-0">
      <button
        ref={trigger}
        type="button"
        aria-label={label}
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((o) => !o)}
        className="flex max-w-full items-center gap-2 rounded-md px-2 py-1.5 text-left hover:bg-paper-deep aria-expanded:bg-paper-deep"
      >
        {button}
        <svg aria-hidden="true" width="10" height="10" viewBox="0 0 10 10" className={`shrink-0 text-ink-faint transition-transform ${open ? "rotate-180" : ""}`}>
          <path d="M1.5 3.5 5 7l3.5-3.5" fill="none" stroke="currentColor" strokeWidth="1.4" />
        </svg>
      </button>
      {open ? (
        <div
          id={panelId}
          className={`absolute top-full z-30 mt-1.5 ${width} max-w-[calc(100vw-2rem)] ${align === "right" ? "right-0" : "left-0"} rounded-lg border border-rule bg-paper-card p-1.5 shadow-[0_14px_36px_-14px_rgb(var(--shade)/0.35)]`}
        >
          {children(() => setOpen(false))}
        </div>
      ) : null}
    </div>
  );
}
