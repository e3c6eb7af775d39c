// The canvas draws text in the page's own font (Inter, shipped with the app).
let family = "Inter, system-ui, sans-serif";

export function canvasFont(): string {
  return family;
}

/** Read the font family the page uses (next/font gives it a generated name). */
export function resolveCanvasFont(): string {
  if (typeof document !== "undefined" && document.body) {
    const f = getComputedStyle(document.body).fontFamily;
    if (f) family = f;
  }
  return family;
}
