"use client";
// "Underlay": a drawing, vendor sheet or photo under the sketch to trace over. Upload it (saved
// sketches: the file lives in the sketch's workspace), set its scale from two marks, move, turn,
// fade, hide and lock it. Every change is a command, so undo works and the version saves it.
import { useId, useRef, useState } from "react";
import { useEditor, useStores } from "@/canvas/context";
import type { Command } from "@/canvas/commands/define";
import { lockUnderlay, moveUnderlay, placeUnderlay, removeUnderlay, rotateUnderlay, setUnderlayOpacity, showUnderlay } from "@/canvas/commands/underlay";
import { fitNewUnderlay, underlayFromUpload } from "@/canvas/geometry/underlay";
import { evaluateToNumber } from "@/solver/expressions";
import { formatNumber } from "@/solver/units";
import { ACCEPT_UPLOADS } from "@/components/uploads/uploadFile";
import { useUnderlayUpload } from "./usePersistence";
import { UnderlayScale, underlayFieldError } from "./UnderlayScale";
import { BUTTON, HEADING, INPUT } from "./ui";

/**
 * A number field that commits on Enter or leaving it; takes expressions with units. Nothing typed is
 * lost: text it cannot read stays in the field when it is left, with its error (which names the
 * field), until it is put right, Escape puts the value back, or the value changes from elsewhere
 * (the drawing dragged, replaced or undone). Entering and leaving without a change commits nothing.
 */
function ValueField({ label, value, unit, kind, onCommit, disabled, testId }: { label: string; value: number; unit: string; kind: "length" | "angle"; onCommit: (v: number) => void; disabled: boolean; testId: string }) {
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  // the value under a refused text left in the field: a change of it from elsewhere ends the text
  const [keptOver, setKeptOver] = useState<number | null>(null);
  if (keptOver !== null && keptOver !== value) {
    setKeptOver(null);
    setDraft(null);
    setError(null);
  }
  // the text the field showed when it was entered: leaving it unchanged moves nothing
  const shownRef = useRef<string | null>(null);
  const errorId = useId();
  /** Reads the draft and commits it; false when it cannot be read (the error is then set). */
  const commit = (): boolean => {
    if (draft === null || draft === shownRef.current) return true;
    try {
      const v = evaluateToNumber(/^\s*-?[\d.]+(e-?\d+)?\s*$/i.test(draft) ? `${draft} ${unit}` : draft, kind);
      onCommit(v);
      setError(null);
      setDraft(null);
      shownRef.current = null;
      return true;
    } catch (err) {
      setError(`${label}: ${underlayFieldError((err as Error).message, kind)}`);
      return false;
    }
  };
  return (
    <>
      <label className="block min-w-0 flex-1 text-[12px] font-medium text-ink-soft">
        {label}
      <span className="mt-0.5 flex items-center gap-1">
        <input
          className={INPUT}
          value={draft ?? formatNumber(value, 5)}
          disabled={disabled}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? errorId : undefined}
          title={error ?? undefined}
          data-testid={testId}
          onFocus={() => {
            setKeptOver(null);
            if (draft !== null) return;
            shownRef.current = formatNumber(value, 5);
            setDraft(shownRef.current);
          }}
          onChange={(e) => setDraft(e.target.value)}
          onBlur={() => {
            if (commit()) {
              setDraft(null);
              setError(null);
              shownRef.current = null;
            } else setKeptOver(value);
          }}
          onKeyDown={(e) => {
            if (e.key === "Enter") commit();
            if (e.key === "Escape") {
              // back to the value, its error gone with the text that caused it
              shownRef.current = formatNumber(value, 5);
              setDraft(shownRef.current);
              setError(null);
            }
          }}
        />
        <span className="text-[11.5px] text-ink-faint">{unit === "deg" ? "°" : unit}</span>
      </span>
      </label>
      {/* under the row of fields, its whole width (it names its field) */}
      {error ? (
        <span id={errorId} role="alert" className="order-last block basis-full text-[11px] font-normal leading-snug text-caution">
          {error}
        </span>
      ) : null}
    </>
  );
}

function Upload({ label, disabled }: { label: string; disabled: boolean }) {
  const { editor } = useStores();
  const upload = useUnderlayUpload();
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const onFile = async (file: File | undefined) => {
    if (!file || !upload) return;
    setBusy(file.name);
    setProblem(null);
    try {
      const up = await upload(file);
      const s = editor.getState();
      const before = s.sketch.underlay;
      const { underlay, kept } = underlayFromUpload(before, up, fitNewUnderlay(up, s.view, s.viewport));
      s.apply(placeUnderlay({ underlay }) as Command<unknown>);
      const name = up.name || file.name;
      if (kept) s.notify(`“${name}” replaces the drawing at the same scale and place (the same size, ${up.width} × ${up.height} px): check that it lines up with what is traced.`);
      else if (before?.calibration)
        s.notify(`“${name}” is under the sketch. It is not the size of the drawing it replaces (${before.width} × ${before.height} px), so its scale is not kept: set it from two marks a known distance apart, then lock it and trace.`);
      else s.notify(`“${name}” is under the sketch. Set its scale from two marks a known distance apart, then lock it and trace.`);
    } catch (err) {
      setProblem((err as Error).message);
    } finally {
      setBusy(null);
      if (input.current) input.current.value = "";
    }
  };
  return (
    <div className="space-y-1.5">
      <button type="button" className={BUTTON} disabled={disabled || busy !== null} onClick={() => input.current?.click()} data-testid="underlay-upload">
        {busy ? `Uploading ${busy}…` : label}
      </button>
      <input ref={input} type="file" accept={ACCEPT_UPLOADS} className="hidden" aria-label="Upload a drawing to trace over" data-testid="underlay-input" onChange={(e) => void onFile(e.target.files?.[0])} />
      {problem ? (
        <p role="alert" className="rounded border border-caution/40 bg-caution-soft/50 px-2 py-1 text-[12px] leading-snug text-ink" data-testid="underlay-problem">
          {problem}
        </p>
      ) : null}
    </div>
  );
}

export function UnderlayPanel() {
  const { editor } = useStores();
  const upload = useUnderlayUpload();
  const u = useEditor((s) => s.sketch.underlay);
  const readOnly = useEditor((s) => s.readOnly);
  const apply = (c: unknown, coalesce?: string) => editor.getState().apply(c as Command<unknown>, coalesce ? { coalesce } : undefined);
  const canUpload = Boolean(upload) && !readOnly;

  return (
    <section aria-labelledby="underlay-heading" className="space-y-2 border-b border-rule px-3 pb-3 pt-2" data-testid="underlay-panel">
      <h2 id="underlay-heading" className={HEADING}>
        Underlay
      </h2>
      {!u ? (
        <>
          <p className="text-[12px] leading-snug text-ink-faint">Trace over a general-arrangement drawing, a vendor sheet or a photo: PNG, JPEG, WebP or PDF (its first page), up to 10 MB.</p>
          {upload ? (
            <Upload label="Upload a drawing to trace over…" disabled={!canUpload} />
          ) : (
            <p className="text-[12px] leading-snug text-ink-soft" data-testid="underlay-needs-saved">
              Underlays need a saved sketch: the file is kept in the sketch&apos;s workspace for its members only. Save this sketch to a workspace first, then upload the drawing there.
            </p>
          )}
        </>
      ) : (
        <div className="space-y-2" data-testid="underlay-controls" data-origin={u.origin.join(" ")} data-rotation={u.rotation ?? 0} data-size={`${u.width} ${u.height}`}>
          <p className="num text-[12px] text-ink-soft">
            {u.width} × {u.height} px
            {u.hidden ? " · hidden" : ""}
            {u.locked ? " · locked" : ""}
          </p>
          <UnderlayScale u={u} disabled={readOnly} />
          <div className="flex gap-3">
            <label className="flex items-center gap-1.5 text-[12px] text-ink-soft">
              <input type="checkbox" className="accent-accent" checked={!u.hidden} disabled={readOnly} onChange={(e) => apply(showUnderlay({ shown: e.target.checked }))} data-testid="underlay-shown" />
              Show
            </label>
            <label className="flex items-center gap-1.5 text-[12px] text-ink-soft" title="Locked: the drawing ignores the pointer, so tracing never moves it">
              <input type="checkbox" className="accent-accent" checked={Boolean(u.locked)} disabled={readOnly} onChange={(e) => apply(lockUnderlay({ locked: e.target.checked }))} data-testid="underlay-locked" />
              Lock
            </label>
          </div>
          <label className="block text-[12px] font-medium text-ink-soft">
            Opacity <span className="num font-normal text-ink-faint">{Math.round((u.opacity ?? 0.6) * 100)} %</span>
            <input
              type="range"
              min={0.05}
              max={1}
              step={0.05}
              value={u.opacity ?? 0.6}
              disabled={readOnly}
              className="mt-0.5 block w-full accent-accent"
              onChange={(e) => apply(setUnderlayOpacity({ opacity: Number(e.target.value) }), "underlay-opacity")}
              data-testid="underlay-opacity"
            />
          </label>
          <div className="flex flex-wrap gap-x-2 gap-y-0.5">
            <ValueField label="Top-left x" value={u.origin[0]} unit="m" kind="length" disabled={readOnly || Boolean(u.locked)} onCommit={(v) => apply(moveUnderlay({ to: [v, u.origin[1]] }))} testId="underlay-x" />
            <ValueField label="Top-left y" value={u.origin[1]} unit="m" kind="length" disabled={readOnly || Boolean(u.locked)} onCommit={(v) => apply(moveUnderlay({ to: [u.origin[0], v] }))} testId="underlay-y" />
            <ValueField label="Turn" value={u.rotation ?? 0} unit="deg" kind="angle" disabled={readOnly || Boolean(u.locked)} onCommit={(v) => apply(rotateUnderlay({ rotation: v }))} testId="underlay-rotation" />
          </div>
          <p className="text-[11.5px] leading-snug text-ink-faint">{u.locked ? "Locked: unlock to drag, move or turn it." : "Drag the drawing on the canvas to move it (where no element is)."}</p>
          <div className="flex flex-wrap gap-1.5">
            {/* replacing or removing keeps the uploaded file (undo may bring it back); lib/uploads/sweep.ts clears unsaved ones later */}
            {canUpload ? <Upload label="Replace…" disabled={false} /> : null}
            <button type="button" className={BUTTON} disabled={readOnly} onClick={() => apply(removeUnderlay({}))} data-testid="underlay-remove">
              Remove
            </button>
          </div>
        </div>
      )}
    </section>
  );
}
