"use client";
// A modal dialog on the native <dialog> element: focus stays inside, Escape closes, the page
// behind is inert. Used by the save, conflict, fork and sign-off dialogs, and to show a drawing
// at its own size.
import { useEffect, useId, useRef, type ReactNode } from "react";

export function Dialog({
  open,
  title,
  onClose,
  children,
  wide = false,
  full = false,
  testId,
}: {
  open: boolean;
  title: string;
  onClose: () => void;
  children: ReactNode;
  wide?: boolean;
  /** as large as the window allows (a drawing shown at its own size) */
  full?: boolean;
  testId?: string;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const opener = useRef<HTMLElement | null>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) {
      // the control that opened it gets the focus back on closing, so the keyboard carries on there
      opener.current = document.activeElement instanceof HTMLElement && document.activeElement !== document.body ? document.activeElement : null;
      d.showModal();
    }
    if (!open && d.open) {
      d.close();
      const back = opener.current;
      opener.current = null;
      if (back?.isConnected) back.focus();
    }
  }, [open]);
  // a dialog its page takes away while open (rendered only while needed) gives the focus back too
  useEffect(
    () => () => {
      const back = opener.current;
      opener.current = null;
      if (back?.isConnected) back.focus();
    },
    [],
  );
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      data-testid={testId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className={`m-auto ${full ? "h-[calc(100dvh-1rem)] max-h-none w-[calc(100%-1rem)] max-w-none" : `w-[calc(100%-2rem)] ${wide ? "max-w-2xl" : "max-w-md"}`} rounded-lg border border-rule bg-paper-card p-0 text-ink shadow-[0_12px_40px_rgb(var(--shade)/0.22)] backdrop:bg-shade/30`}
    >
      {open ? (
        <div className={full ? "flex h-full flex-col p-4" : "p-5"}>
          <h2 id={titleId} className={`text-base font-semibold ${full ? "line-clamp-2" : ""}`}>
            {title}
          </h2>
          <div className={full ? "mt-3 flex min-h-0 flex-1 flex-col" : "mt-3"}>{children}</div>
        </div>
      ) : null}
    </dialog>
  );
}
