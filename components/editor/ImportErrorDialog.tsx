"use client";
// A file that could not be opened: what was wrong, where, and that nothing changed.
import { useEffect, useRef } from "react";
import type { ImportProblem } from "./useFileOps";
import { BUTTON } from "./ui";

export function ImportErrorDialog({ problem, onClose }: { problem: ImportProblem; onClose: () => void }) {
  const ref = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    ref.current?.focus();
    const key = (e: KeyboardEvent) => {
      if (e.key === "Escape") {
        e.preventDefault();
        onClose();
      }
    };
    window.addEventListener("keydown", key, true);
    return () => window.removeEventListener("keydown", key, true);
  }, [onClose]);
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-shade/25 px-4">
      <div role="alertdialog" aria-modal="true" aria-labelledby="import-error-title" aria-describedby="import-error-body" className="w-full max-w-lg rounded-lg border border-rule bg-paper-card p-5 shadow-xl" data-testid="import-error">
        <h2 id="import-error-title" className="text-[15px] font-semibold text-ink">
          “{problem.file}” could not be opened
        </h2>
        <div id="import-error-body">
          <p className="mt-1 text-[13px] text-ink-soft">Nothing in your sketch has changed. The file has these problems:</p>
          <ul className="mt-3 max-h-60 space-y-1 overflow-auto rounded border border-caution/30 bg-caution-soft/50 p-3 text-[12.5px] text-ink">
            {problem.errors.map((e, i) => (
              <li key={i}>
                {/* a real space after the path: the words read (and copy) as "supports[1].angle is required" */}
                {e.path ? (
                  <>
                    <code className="num rounded bg-paper px-1 text-[11.5px] text-caution">{e.path}</code>{" "}
                  </>
                ) : null}
                {e.message}
              </li>
            ))}
          </ul>
        </div>
        <div className="mt-4 flex justify-end">
          <button ref={ref} type="button" className={BUTTON} onClick={onClose}>
            Close
          </button>
        </div>
      </div>
    </div>
  );
}
