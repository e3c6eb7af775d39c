"use client";
// A plain text field (labels, titles) that stores as you type, one undo step per visit.
import { useId, useRef, useState } from "react";
import { INPUT } from "./ui";

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
  onCommit: (v: string, coalesce: string) => void;
  placeholder?: string;
  multiline?: boolean;
  maxLength?: number;
  testId?: string;
}) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const sessionRef = useRef(0);
  const common = {
    id,
    value: draft ?? value ?? "",
    placeholder,
    maxLength,
    "data-testid": testId,
    onFocus: () => {
      sessionRef.current = ++session;
      setDraft(value ?? "");
    },
    onBlur: () => setDraft(null),
    onChange: (e: { target: { value: string } }) => {
      setDraft(e.target.value);
      onCommit(e.target.value, `text:${id}#${sessionRef.current}`);
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
        <input {...common} className={INPUT} onKeyDown={(e) => e.key === "Enter" && (e.target as HTMLInputElement).blur()} />
      )}
    </div>
  );
}
