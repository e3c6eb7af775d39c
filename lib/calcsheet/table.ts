// Drawing a result table on the calc sheet with pdfkit, in the widths table-layout.ts chooses:
// headings with their unit on a second line, numbers right-aligned, a row never split across
// pages, and the heading repeated at the top of every page the table runs onto. A table may be
// grouped by its first column (the case, the support): the value is printed once, across the
// width, over its rows, so a long name wraps in one line of the page rather than in a narrow
// column that makes every row three lines tall.
import type { Table } from "@/solver/report";

// Numbers in a column: figures of one width, so decimals line up, and no kerning, which tucks a
// point under a 7 ("7.602" read as "7602"). Off and on by OpenType feature (fontkit's overrides).
const NUMBER_FEATURES = { kern: false, tnum: true } as unknown as PDFKit.Mixins.OpenTypeFeatures[];
// Words (a group's heading, a text cell) without kerning too, as the sheet's prose: kerned, "−50°,
// as drawn" reads back (copied, or by a text reader) as "−50° , as drawn", and "(5.249, 7.218)" as
// "7 .218". (The measure takes the wider of the kerned and unkerned widths, so they still fit.)
const TEXT_FEATURES = { kern: false } as unknown as PDFKit.Mixins.OpenTypeFeatures[];
import { layoutTable, type Measure, type TablePart, type TableLayout } from "./table-layout";

export const FONT = { regular: "Inter", bold: "Inter-SemiBold" } as const;

const INK = "#1d2329";
const FAINT = "#5f6974";
const RULE = "#cfc8b8";
const HEAD_BG = "#ece7dc";
const GROUP_BG = "#f5f2ea";
/** padding inside a cell: left and right (the layout's padding is their sum), top */
const PAD_X = 3;
const PAD_TOP = 2.5;
const PAD_Y = 5;

/** pdfkit's own measure of a string: the widths it wraps text by. */
export function pdfMeasure(doc: PDFKit.PDFDocument): Measure {
  // numbers are drawn with tabular figures, wider than the proportional ones: a column measured
  // without them wraps "−6.168" into "−6.16" over "8". Measured both ways, the wider wins.
  return (text, bold, size) => {
    doc.font(bold ? FONT.bold : FONT.regular).fontSize(size);
    return Math.max(doc.widthOfString(text), doc.widthOfString(text, { features: NUMBER_FEATURES }));
  };
}

export interface DrawTableOptions {
  /** key of a text column to print as a heading over each run of rows sharing its value */
  groupBy?: string;
}

/** The table without its group column, and the group heading of each row ("Case: Duty point"). */
export function groupRows(t: Table, key: string): { table: Table; groups: string[] } | null {
  const gi = t.columns.findIndex((c) => c.key === key);
  if (gi < 0 || t.columns.length < 2) return null;
  const col = t.columns[gi];
  return {
    table: { ...t, columns: t.columns.filter((_, i) => i !== gi), rows: t.rows.map((r) => r.filter((_, i) => i !== gi)) },
    groups: t.rows.map((r) => `${col.label}: ${r[gi] ?? "—"}`),
  };
}

export function drawTable(doc: PDFKit.PDFDocument, t0: Table, left: number, width: number, options: DrawTableOptions = {}): TableLayout | null {
  if (t0.rows.length === 0) {
    doc.font(FONT.regular).fontSize(8.5).fillColor(FAINT).text("(none)", left, doc.y, { width });
    return null;
  }
  const grouped = options.groupBy ? groupRows(t0, options.groupBy) : null;
  const t = grouped?.table ?? t0;
  const layout = layoutTable(t, { width, measure: pdfMeasure(doc) });
  doc.y += 2;
  const n = layout.parts.length;
  layout.parts.forEach((part, pi) => {
    if (n > 1) {
      const keys = part.columns.filter((c) => layout.parts.every((p) => p.columns.includes(c))).map((c) => layout.headers[c].label);
      const caption =
        pi === 0
          ? `Part 1 of ${n}: the table is too wide for the page${keys.length ? `; each part repeats ${keys.join(" and ")}` : ""}.`
          : `Part ${pi + 1} of ${n}: the same rows, more columns.`;
      ensureRoom(doc, 60);
      doc.font(FONT.regular).fontSize(7.5).fillColor(FAINT).text(caption, left, doc.y + (pi === 0 ? 0 : 4), { width });
      doc.y += 2;
    }
    drawPart(doc, layout, part, left, grouped?.groups);
  });
  for (const note of t.notes ?? []) {
    // a note is not split across pages
    doc.font(FONT.regular).fontSize(7.5);
    ensureRoom(doc, doc.heightOfString(note, { width }) + 3);
    doc.fillColor(FAINT).text(note, left, doc.y + 3, { width });
  }
  doc.x = left;
  doc.moveDown(0.4);
  return layout;
}

function ensureRoom(doc: PDFKit.PDFDocument, needed: number) {
  if (doc.y + needed > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

/** The heights (pt) a part of a table is drawn with: its header, a row, a group's heading. */
function partMeasures(doc: PDFKit.PDFDocument, layout: TableLayout, part: TablePart) {
  const { size, headers } = layout;
  const total = part.widths.reduce((a, b) => a + b, 0);
  const inner = (i: number) => part.widths[i] - 2 * PAD_X;
  const textHeight = (text: string, font: string, i: number, numeric = false) =>
    text ? doc.font(font).fontSize(size).heightOfString(text, { width: inner(i), features: numeric ? NUMBER_FEATURES : TEXT_FEATURES }) : 0;
  const headerHeight =
    Math.max(...part.columns.map((c, i) => textHeight(headers[c].label, FONT.bold, i) + (headers[c].unit ? textHeight(headers[c].unit!, FONT.regular, i) : 0))) + PAD_Y;
  const rowHeight = (r: string[]) => Math.max(...part.columns.map((c, i) => textHeight(r[c] ?? "", FONT.regular, i, headers[c].align === "right"))) + PAD_Y;
  const groupHeight = (g: string) => doc.font(FONT.bold).fontSize(size).heightOfString(g, { width: total - 2 * PAD_X, features: TEXT_FEATURES }) + PAD_Y;
  return { total, inner, headerHeight, rowHeight, groupHeight };
}

/**
 * The room (pt) a table needs on the page it starts on: its header, its first group's heading and
 * its first row (what `drawTable` keeps together), or a wide table's caption. A heading over the
 * table asks for this much beside its own, so it is never left alone at the foot of a page.
 */
export function tableLeadHeight(doc: PDFKit.PDFDocument, t0: Table, width: number, options: DrawTableOptions = {}): number {
  if (t0.rows.length === 0) return 14;
  const grouped = options.groupBy ? groupRows(t0, options.groupBy) : null;
  const layout = layoutTable(grouped?.table ?? t0, { width, measure: pdfMeasure(doc) });
  if (layout.parts.length > 1) return 62;
  const { headerHeight, rowHeight, groupHeight } = partMeasures(doc, layout, layout.parts[0]);
  return 2 + headerHeight + (grouped ? groupHeight(grouped.groups[0]) : 0) + rowHeight(layout.cells[0]);
}

function drawPart(doc: PDFKit.PDFDocument, layout: TableLayout, part: TablePart, left: number, groups?: string[]) {
  const { size, headers, cells } = layout;
  const { total, inner, headerHeight, rowHeight, groupHeight } = partMeasures(doc, layout, part);

  const drawHeader = () => {
    const y = doc.y;
    doc.rect(left, y, total, headerHeight).fillColor(HEAD_BG).fill();
    let x = left;
    part.columns.forEach((c, i) => {
      const h = headers[c];
      doc.font(FONT.bold).fontSize(size).fillColor(INK).text(h.label, x + PAD_X, y + PAD_TOP, { width: inner(i), align: h.align, features: TEXT_FEATURES });
      if (h.unit) doc.font(FONT.regular).fontSize(size).fillColor(INK).text(h.unit, x + PAD_X, doc.y, { width: inner(i), align: h.align, features: TEXT_FEATURES });
      x += part.widths[i];
    });
    rule(doc, left, y + headerHeight, total);
    doc.y = y + headerHeight;
  };

  const drawGroup = (g: string) => {
    const y = doc.y;
    const h = groupHeight(g);
    doc.rect(left, y, total, h).fillColor(GROUP_BG).fill();
    doc.font(FONT.bold).fontSize(size).fillColor(INK).text(g, left + PAD_X, y + PAD_TOP, { width: total - 2 * PAD_X, features: TEXT_FEATURES });
    rule(doc, left, y + h, total);
    doc.y = y + h;
  };

  // the heading never stands alone at the foot of a page, nor a group's heading
  ensureRoom(doc, headerHeight + (groups ? groupHeight(groups[0]) : 0) + rowHeight(cells[0]));
  drawHeader();
  cells.forEach((r, ri) => {
    const h = rowHeight(r);
    const g = groups?.[ri];
    const starts = g !== undefined && (ri === 0 || groups![ri - 1] !== g);
    const needed = h + (starts ? groupHeight(g) : 0);
    if (doc.y + needed > doc.page.height - doc.page.margins.bottom) {
      doc.addPage();
      drawHeader();
      // a group carried over to a new page is named again
      if (g !== undefined && !starts) drawGroup(`${g} (continued)`);
    }
    if (starts) drawGroup(g);
    const y = doc.y;
    let x = left;
    part.columns.forEach((c, i) => {
      const numeric = headers[c].align === "right";
      doc
        .font(FONT.regular)
        .fontSize(size)
        .fillColor(INK)
        .text(r[c] ?? "", x + PAD_X, y + PAD_TOP, { width: inner(i), align: headers[c].align, features: numeric ? NUMBER_FEATURES : TEXT_FEATURES });
      x += part.widths[i];
    });
    rule(doc, left, y + h, total);
    doc.y = y + h;
  });
}

function rule(doc: PDFKit.PDFDocument, left: number, y: number, width: number) {
  doc.moveTo(left, y).lineTo(left + width, y).lineWidth(0.4).strokeColor(RULE).stroke();
}
