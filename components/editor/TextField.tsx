"use client";
// A plain text field (labels, titles, load groups) that stores as you type, one undo step per
// visit. When the file format refuses the text (a load group must start with a letter), the
// reason shows under the field and nothing is stored.
import { useId, useRef, useState } from "react";
import { endVisitHere, INPUT } from "./ui";

let session = 0;

export function TextField({
  label,
  value,
  onCommit,
  placeholder,
  multiline,
  maxLength = 200,
  testId,
}: {
  label: string;
  value: string | undefined;
  /** store the text; returns the reason it was refused (nothing stored), or nothing */
  onCommit: (v: string, coalesce: string) => string | null | void;
  placeholder?: string;
  multiline?: boolean;
  maxLength?: number;
  testId?: string;
}) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const sessionRef = useRef(0);
  const errorId = `${id}-error`;
  const common = {
    id,
    "aria-invalid": error ? true : undefined,
    "aria-describedby": error ? errorId : undefined,
    value: draft ?? value ?? "",
    placeholder,
    maxLength,
    "data-testid": testId,
    onFocus: () => {
      sessionRef.current = ++session;
      setDraft(value ?? "");
    },
    onBlur: () => {
      // the field goes back to what is stored: the refused text is dropped with its reason
      setDraft(null);
      setError(null);
    },
    onChange: (e: { target: { value: string } }) => {
      setDraft(e.target.value);
      setError(onCommit(e.target.value, `text:${id}#${sessionRef.current}`) || null);
    },
  };
  return (
    <div>
      <label htmlFor={id} className="mb-0.5 block text-[12px] font-medium text-ink-soft">
        {label}
      </label>
      {multiline ? (
        <textarea {...common} rows={3} className={`${INPUT} h-auto py-1 leading-snug`} />
      ) : (
        <input {...common} className={INPUT} onKeyDown={(e) => e.key === "Enter" && !error && endVisitHere(e.currentTarget)} />
      )}
      {error && (
        <p id={errorId} className="mt-0.5 text-[11px] leading-snug text-caution" aria-live="polite">
          ⚠ {error}
        </p>
      )}
    </div>
  );
}
