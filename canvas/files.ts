// Sketch files in and out: JSON export and import (a bad file changes nothing and says why;
// older format versions are migrated), and drawings as SVG and PNG from the one SVG renderer.
import { migrateSketch } from "@/solver/migrations";
import { sketchSchema, type SketchFile } from "@/solver/schema";
import { zodErrors } from "@/solver/parse";
import type { FieldError } from "@/solver/types";
import { validateReferences } from "@/solver/validate";
import type { Sketch } from "@/solver/types";

export type ImportResult = { ok: true; sketch: SketchFile; migratedFrom: number[] } | { ok: false; errors: FieldError[] };

/** Read a sketch file's text. Expression errors are fine (they show at their fields); structure is not. */
export function importSketchText(text: string): ImportResult {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (err) {
    return { ok: false, errors: [{ path: "", message: `This is not a JSON file (${(err as Error).message}).` }] };
  }
  const checked = checkSketchJson(json);
  if (!checked.ok) return checked;
  const refs = validateReferences(checked.sketch as unknown as Sketch);
  if (refs.length) return { ok: false, errors: refs.slice(0, 12) };
  return checked;
}

/** A JSON value read as a sketch file's structure: migrated from its version, then the schema (references are not checked). */
export function checkSketchJson(json: unknown): ImportResult {
  const migrated = migrateSketch(json);
  if (!migrated.ok) return { ok: false, errors: migrated.errors };
  const parsed = sketchSchema.safeParse(migrated.doc);
  if (!parsed.success) return { ok: false, errors: zodErrors(parsed.error).slice(0, 12) };
  return { ok: true, sketch: parsed.data, migratedFrom: migrated.applied };
}

/** The file's text: the contract's JSON, nothing added. */
export function exportSketchText(sketch: SketchFile): string {
  return JSON.stringify(sketch, null, 2) + "\n";
}

/** "Pump skid, discharge test" → "pump-skid-discharge-test" */
export function fileStem(title: string | undefined): string {
  const s = (title || "sketch")
    .normalize("NFKD")
    .replace(/[^\w\s-]/g, "")
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, "-")
    .replace(/-+/g, "-")
    .slice(0, 60);
  return s || "sketch";
}

/** Offer a blob as a download. */
export function download(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = filename;
  a.rel = "noopener";
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** Rasterise SVG text to a PNG (browser only). */
export async function svgToPng(svg: string, width: number, height: number, pixelRatio = 2): Promise<Blob> {
  const img = new Image();
  const url = URL.createObjectURL(new Blob([svg], { type: "image/svg+xml" }));
  try {
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error("the drawing could not be rasterised"));
      img.src = url;
    });
    const canvas = document.createElement("canvas");
    canvas.width = Math.round(width * pixelRatio);
    canvas.height = Math.round(height * pixelRatio);
    const ctx = canvas.getContext("2d");
    if (!ctx) throw new Error("no 2-D canvas");
    ctx.scale(pixelRatio, pixelRatio);
    ctx.drawImage(img, 0, 0, width, height);
    return await new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error("PNG encoding failed"))), "image/png"));
  } finally {
    URL.revokeObjectURL(url);
  }
}
