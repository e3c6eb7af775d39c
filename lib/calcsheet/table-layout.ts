// Column widths for a calc-sheet table. A checker must be able to read every word whole, so no
// column is narrower than its longest word (text wraps only at spaces) and numbers never wrap.
// In order of preference: the whole table with room to read (each text in about three lines),
// the font shrinking a step at a time down to a floor; then stacked parts that repeat the key
// columns (the case, the support); then, if no split helps, the whole table at the largest size at
// which every word fits. Pure: the caller passes a measure function (pdfkit's widthOfString in the
// sheet, so the widths are the ones pdfkit wraps by).
import { cellNumberText, type Table } from "@/solver/report";

/** Width in points of `text` in the regular or the semibold face at `size` points. */
export type Measure = (text: string, bold: boolean, size: number) => number;

export interface TableLayoutOptions {
  /** the width available (pt) */
  width: number;
  measure: Measure;
  /** font size to start from (pt) */
  size?: number;
  /** smallest font size before the table is split (pt) */
  minSize?: number;
  /** how much the font shrinks per step (pt) */
  step?: number;
  /** padding inside a cell, left plus right (pt) */
  padding?: number;
}

export const TABLE_DEFAULTS = { size: 7.5, minSize: 6.5, step: 0.5, padding: 6 } as const;

/** A wide text column is not given more than this share of the width by its natural size. */
const TEXT_CAP = 0.45;
/** A text column has room to read when its longest text takes about this many lines… */
const COMFORTABLE_LINES = 3;
/** …allowing this much for where the lines fall between words. */
const WORDS_SLACK = 1.2;
/** …but a text column's room to read is never more than this share of the width. */
const COMFORT_CAP = 0.22;
/** A text column whose longest text takes at most this share of the width keeps it on one line. */
const SHORT_TEXT = 0.12;
/** A heading over numbers is given about this share of its one-line width (two lines). */
const NUMBER_HEADING = 0.55;
/** Rounding slack (pt): pdfkit rounds widths, and a word that fits by 0.01 pt must still fit. */
const SLACK = 0.5;
/** Leading text columns repeated in every part of a split table, at most this many… */
const MAX_KEYS = 2;
/** …and together at most this share of the width. */
const KEY_SHARE = 0.4;

export interface ColumnText {
  label: string;
  /** the unit, drawn on a second heading line, in brackets */
  unit?: string;
  align: "left" | "right";
}

export interface TablePart {
  /** indices into the table's columns, in order */
  columns: number[];
  /** widths (pt) of those columns; they add up to at most the width available */
  widths: number[];
}

export interface TableLayout {
  /** the font size chosen (pt) */
  size: number;
  headers: ColumnText[];
  /** the cells as printed (numbers formatted, marks before the number) */
  cells: string[][];
  /** one part, or several stacked parts when the table is too wide for the page */
  parts: TablePart[];
  /** per column: the width (pt) its longest word or number needs at the chosen size */
  minWidths: number[];
  /** columns whose one word is wider than a part can give it (pdfkit then has to break it) */
  overflow: number[];
}

/** The places a line may break: at spaces only (a no-break space keeps a mark with its number). */
export function words(text: string): string[] {
  return text.split(/[ \n\t]+/).filter(Boolean);
}

function cellText(t: Table, c: Table["rows"][number][number]): string {
  if (c === null || c === undefined) return "—";
  // the table's own rule for its numbers (the hand check's 4 significant figures), else the usual one
  if (typeof c === "number") return cellNumberText(t, c);
  return c;
}

/** The printed text of each cell: a marked cell (the governing case) carries its shape before the
 *  number, joined by a no-break space, so the mark is not colour alone and never wraps away; a mark
 *  that gives the cell's words (a hand check's rounding noise) is printed in place of the number. */
export function tableCells(t: Table): string[][] {
  return t.rows.map((r, ri) =>
    r.map((c, ci) => {
      const mark = t.marks?.[ri]?.[t.columns[ci].key];
      if (mark?.shown !== undefined) return mark.shown;
      return mark?.symbol ? `${mark.symbol}\u00a0${cellText(t, c)}` : cellText(t, c);
    }),
  );
}

/** The report marks its text columns left; the others hold numbers (or "—" where there is none):
 *  right-aligned, and a number is never wrapped. */
function isNumeric(t: Table, ci: number): boolean {
  return (t.columns[ci].align ?? "right") === "right";
}

export function layoutTable(t: Table, options: TableLayoutOptions): TableLayout {
  const { width, measure } = options;
  const size0 = options.size ?? TABLE_DEFAULTS.size;
  const minSize = Math.min(options.minSize ?? TABLE_DEFAULTS.minSize, size0);
  const step = options.step ?? TABLE_DEFAULTS.step;
  const pad = (options.padding ?? TABLE_DEFAULTS.padding) + SLACK;
  if (!(width > 0)) throw new Error(`table ${t.id}: the width must be more than zero (got ${width})`);
  if (!(step > 0)) throw new Error(`table ${t.id}: the font step must be more than zero (got ${step})`);

  const cells = tableCells(t);
  const numeric = t.columns.map((_, ci) => isNumeric(t, ci));
  // a symbol stays with its word ("Normal n", "Tangential t"): a lone "n" on a line reads as noise
  const headers: ColumnText[] = t.columns.map((c, ci) => ({
    label: c.label.replace(/ (?=\S{1,2}$)/, "\u00a0"),
    unit: c.unit ? `(${c.unit})` : undefined,
    align: numeric[ci] ? "right" : "left",
  }));

  // pdfkit measures a word with the space after it, so a column must hold "word " on one line
  const wordWidth = (w: string, bold: boolean, size: number) => measure(`${w} `, bold, size);
  const measureColumns = (size: number): ColumnWidths[] =>
    t.columns.map((_, ci) => {
      const h = headers[ci];
      const headWords = [...words(h.label), ...(h.unit ? [h.unit] : [])];
      let min = Math.max(0, ...headWords.map((w) => wordWidth(w, true, size)));
      let head = Math.max(measure(h.label, true, size), h.unit ? measure(h.unit, false, size) : 0);
      let body = 0;
      for (const r of cells) {
        const text = r[ci] ?? "";
        min = Math.max(min, numeric[ci] ? wordWidth(text, false, size) : Math.max(0, ...words(text).map((w) => wordWidth(w, false, size))));
        body = Math.max(body, measure(text, false, size));
      }
      min += pad;
      head += pad;
      // a long heading over numbers wraps at its spaces rather than widening the column
      if (numeric[ci]) {
        const natural = Math.max(min, body + pad, head * NUMBER_HEADING);
        return { min, comfortable: min, natural, roomy: Math.max(natural, head) };
      }
      const natural = Math.max(min, Math.min(Math.max(head, body + pad), width * TEXT_CAP));
      // room for the longest text in about three lines (a word more than a third, for where lines fall)
      // (but no more than a share of the page: a very long name wraps to more lines rather than
      // pushing the columns beside it into a second stacked part, away from their row)
      // a short text (a body's name of two words, "pass", "overturning") is not wrapped at all: a
      // name broken over two lines makes its row two lines tall for the sake of a few points
      if (body + pad <= width * SHORT_TEXT) return { min, comfortable: natural, natural, roomy: natural };
      const comfortable = Math.min(natural, Math.max(min, head, Math.min((body * WORDS_SLACK) / COMFORTABLE_LINES + pad, width * COMFORT_CAP)));
      return { min, comfortable, natural, roomy: natural };
    });
  const sizes: number[] = [];
  for (let size = size0; size >= minSize - 1e-9; size -= step) sizes.push(Number(size.toFixed(3)));
  const allColumns = t.columns.map((_, ci) => ci);
  const whole = (size: number, m: ColumnWidths[], floor: "min" | "comfortable"): TableLayout => ({
    size,
    headers,
    cells,
    parts: [{ columns: allColumns, widths: share(allColumns, m, floor, width, headers) }],
    minWidths: m.map((c) => c.min),
    overflow: [],
  });

  // 1. the whole table with room to read, the font shrinking a step at a time
  for (const size of sizes) {
    const m = measureColumns(size);
    if (sum(m.map((c) => c.comfortable)) <= width) return whole(size, m, "comfortable");
  }

  // 2. stacked parts at the base size, each repeating the key columns (the case, the support)
  const m = measureColumns(size0);
  const keys: number[] = [];
  for (let ci = 0; ci < Math.min(MAX_KEYS, t.columns.length - 1); ci++) {
    if (numeric[ci] || sum([...keys, ci].map((k) => m[k].comfortable)) > width * KEY_SHARE) break;
    keys.push(ci);
  }
  const keyWidth = sum(keys.map((k) => m[k].comfortable));
  const groups: number[][] = [];
  let current: number[] = [];
  for (let ci = keys.length; ci < t.columns.length; ci++) {
    if (current.length && keyWidth + sum([...current, ci].map((k) => m[k].comfortable)) > width) {
      groups.push(current);
      current = [];
    }
    current.push(ci);
  }
  if (current.length) groups.push(current);

  if (groups.length === 1) {
    // 3. no split helps: the whole table at the largest size at which every word fits
    for (const size of sizes) {
      const ms = measureColumns(size);
      if (sum(ms.map((c) => c.min)) <= width) return whole(size, ms, "min");
    }
  }

  const overflow: number[] = [];
  const parts = groups.map((g) => {
    const columns = [...keys, ...g];
    if (sum(columns.map((k) => m[k].comfortable)) <= width) return { columns, widths: share(columns, m, "comfortable", width, headers) };
    if (sum(columns.map((k) => m[k].min)) <= width) return { columns, widths: share(columns, m, "min", width, headers) };
    // a word wider than the page can give it: every column shrinks alike, and pdfkit breaks that word
    const scale = width / sum(columns.map((k) => m[k].min));
    overflow.push(...columns.filter((k) => !numeric[k]));
    return { columns, widths: columns.map((k) => m[k].min * scale) };
  });
  return { size: size0, headers, cells, parts, minWidths: m.map((c) => c.min), overflow };
}

interface ColumnWidths {
  /** the longest word (or the whole number) and the padding */
  min: number;
  /** room to read: a text column's longest text in about three lines */
  comfortable: number;
  /** the longest text on one line (a text column capped to a share of the page; a heading over
   *  numbers in two lines) */
  natural: number;
  /** as natural, with a heading over numbers on one line: given when the page has the room */
  roomy: number;
}

/** Widths that add up to `width`: every column its floor (its minimum or its comfortable width)
 *  and the rest shared out towards each column's natural width; with room to spare, headings over
 *  numbers go on one line, and what is left goes to the text columns. */
function share(columns: number[], m: ColumnWidths[], floor: "min" | "comfortable", width: number, headers: ColumnText[]): number[] {
  const min = columns.map((c) => m[c][floor]);
  const nat = columns.map((c) => m[c].natural);
  const roomy = columns.map((c) => m[c].roomy);
  const sumMin = sum(min);
  const sumNat = sum(nat);
  const sumRoomy = sum(roomy);
  if (sumRoomy <= width) {
    const text = columns.map((c, i) => (headers[c].align === "left" ? i : -1)).filter((i) => i >= 0);
    const takers = text.length ? text : columns.map((_, i) => i);
    const extra = (width - sumRoomy) / takers.length;
    return roomy.map((w, i) => (takers.includes(i) ? w + extra : w));
  }
  if (sumNat <= width) {
    const f = (width - sumNat) / (sumRoomy - sumNat);
    return nat.map((w, i) => w + (roomy[i] - w) * f);
  }
  const f = (width - sumMin) / (sumNat - sumMin);
  return min.map((w, i) => w + (nat[i] - w) * f);
}

const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
