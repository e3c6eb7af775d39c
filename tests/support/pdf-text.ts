// A PDF's text as a reader gets it (pdfjs-dist), every page, runs of white space made one space.
export async function pdfText(buf: Uint8Array | ArrayBuffer): Promise<{ text: string; pages: number }> {
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await pdfjs.getDocument({ data: new Uint8Array(buf), useSystemFonts: false, isEvalSupported: false }).promise;
  let text = "";
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    const content = await page.getTextContent();
    text += content.items.map((it) => ("str" in it ? it.str : "")).join(" ") + "\n";
  }
  return { text: text.replace(/\s+/g, " "), pages: doc.numPages };
}

/** A piece of a page's text with its place: left edge, baseline and width (pt, from the page's bottom left), and its type size (pt). */
export interface PdfItem {
  str: string;
  x: number;
  y: number;
  width: number;
  size: number;
}

/** Every piece of text with its place, per page, and the page width (pt). */
export async function pdfItems(buf: Uint8Array | ArrayBuffer): Promise<{ pages: PdfItem[][]; pageWidth: number }> {
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await pdfjs.getDocument({ data: new Uint8Array(buf), useSystemFonts: false, isEvalSupported: false }).promise;
  const pages: PdfItem[][] = [];
  let pageWidth = 0;
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    pageWidth = page.view[2];
    const content = await page.getTextContent();
    pages.push(content.items.flatMap((it) => ("str" in it && it.str.trim() ? [{ str: it.str, x: it.transform[4], y: it.transform[5], width: it.width, size: Math.hypot(it.transform[2], it.transform[3]) }] : [])));
  }
  return { pages, pageWidth };
}
