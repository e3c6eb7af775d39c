// Drawing a result table on the calc sheet with pdfkit, in the widths table-layout.ts chooses:
// headings with their unit on a second line, numbers right-aligned, a row never split across
// pages, and the heading repeated at the top of every page the table runs onto.
import type { Table } from "@/solver/report";
import { layoutTable, type Measure, type TablePart, type TableLayout } from "./table-layout";

export const FONT = { regular: "Inter", bold: "Inter-SemiBold" } as const;

const INK = "#1d2329";
const FAINT = "#6b7580";
const RULE = "#cfc8b8";
const HEAD_BG = "#ece7dc";
/** padding inside a cell: left and right (the layout's padding is their sum), top */
const PAD_X = 3;
const PAD_TOP = 2.5;
const PAD_Y = 5;

/** pdfkit's own measure of a string: the widths it wraps text by. */
export function pdfMeasure(doc: PDFKit.PDFDocument): Measure {
  return (text, bold, size) => doc.font(bold ? FONT.bold : FONT.regular).fontSize(size).widthOfString(text);
}

export function drawTable(doc: PDFKit.PDFDocument, t: Table, left: number, width: number): TableLayout | null {
  if (t.rows.length === 0) {
    doc.font(FONT.regular).fontSize(8.5).fillColor(FAINT).text("(none)", left, doc.y, { width });
    return null;
  }
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
    drawPart(doc, layout, part, left);
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

function drawPart(doc: PDFKit.PDFDocument, layout: TableLayout, part: TablePart, left: number) {
  const { size, headers, cells } = layout;
  const total = part.widths.reduce((a, b) => a + b, 0);
  const inner = (i: number) => part.widths[i] - 2 * PAD_X;
  const textHeight = (text: string, font: string, i: number) => (text ? doc.font(font).fontSize(size).heightOfString(text, { width: inner(i) }) : 0);

  const headerHeight =
    Math.max(...part.columns.map((c, i) => textHeight(headers[c].label, FONT.bold, i) + (headers[c].unit ? textHeight(headers[c].unit!, FONT.regular, i) : 0))) + PAD_Y;
  const rowHeight = (r: string[]) => Math.max(...part.columns.map((c, i) => textHeight(r[c] ?? "", FONT.regular, i))) + PAD_Y;

  const drawHeader = () => {
    const y = doc.y;
    doc.rect(left, y, total, headerHeight).fillColor(HEAD_BG).fill();
    let x = left;
    part.columns.forEach((c, i) => {
      const h = headers[c];
      doc.font(FONT.bold).fontSize(size).fillColor(INK).text(h.label, x + PAD_X, y + PAD_TOP, { width: inner(i), align: h.align });
      if (h.unit) doc.font(FONT.regular).fontSize(size).fillColor(INK).text(h.unit, x + PAD_X, doc.y, { width: inner(i), align: h.align });
      x += part.widths[i];
    });
    rule(doc, left, y + headerHeight, total);
    doc.y = y + headerHeight;
  };

  // the heading never stands alone at the foot of a page
  ensureRoom(doc, headerHeight + rowHeight(cells[0]));
  drawHeader();
  for (const r of cells) {
    const h = rowHeight(r);
    if (doc.y + h > doc.page.height - doc.page.margins.bottom) {
      doc.addPage();
      drawHeader();
    }
    const y = doc.y;
    let x = left;
    part.columns.forEach((c, i) => {
      doc.font(FONT.regular).fontSize(size).fillColor(INK).text(r[c] ?? "", x + PAD_X, y + PAD_TOP, { width: inner(i), align: headers[c].align });
      x += part.widths[i];
    });
    rule(doc, left, y + h, total);
    doc.y = y + h;
  }
}

function rule(doc: PDFKit.PDFDocument, left: number, y: number, width: number) {
  doc.moveTo(left, y).lineTo(left + width, y).lineWidth(0.4).strokeColor(RULE).stroke();
}
