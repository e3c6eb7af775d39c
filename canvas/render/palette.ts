// The drafting palette (tailwind.config.ts, app/globals.css) for drawings made outside CSS: canvas and SVG.
// A drawing is a light sheet in every theme (the canvas's wrapper, the review drawings and the home page's
// diagram carry `.paper-sheet`, which keeps the light tokens around them), so these stay the light values.
// The tray's icons are drawn on the page itself: `.drawn-in-ink` (globals.css) maps these colours onto
// the theme's tokens there, and tests/unit/theme.test.ts checks it covers every colour a symbol uses.
export const INK = "#1d2329";
export const INK_SOFT = "#3d4650";
export const INK_FAINT = "#5f6974";
export const PAPER = "#f6f3ec";
export const PAPER_CARD = "#fbfaf6";
export const BODY_FILL = "#e6dfd0";
export const RULE = "#cfc8b8";
export const GRID_MINOR = "rgba(29,35,41,0.045)";
export const GRID_MAJOR = "rgba(29,35,41,0.09)";
export const ACCENT = "#b4462b";
export const ACCENT_SOFT = "#f3ddd3";
export const REACTION = "#1f5f7a";
export const CAUTION = "#8a6212";
export const FONT_STACK = "Inter, system-ui, sans-serif";
