// The drafting palette (tailwind.config.ts) for drawings made outside CSS: canvas and SVG.
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
