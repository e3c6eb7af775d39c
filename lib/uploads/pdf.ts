import "server-only";
// PDFs, with Debian's poppler-utils (sharp reads no PDF): the first page drawn to PNG (an
// underlay, or an attachment's thumbnail), and an attached PDF rewritten without its document
// metadata. Every poppler call runs on a file in a fresh temporary folder, with a time limit.
import { execFile } from "node:child_process";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { promisify } from "node:util";
import sharp from "sharp";
import { AppError } from "../errors";
import type { UploadLimits } from "./process";

const run = promisify(execFile);

async function inTempDir<T>(pdf: Buffer, act: (src: string, dir: string) => Promise<T>): Promise<T> {
  const dir = await mkdtemp(join(tmpdir(), "cp-pdf-"));
  try {
    const src = join(dir, "in.pdf");
    await writeFile(src, pdf);
    return await act(src, dir);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

export type PageBox = { widthPt: number; heightPt: number; rotationDeg: number };

/** The first page's visible size (its crop box, as pdfinfo reports it) and turn, from pdfinfo's page lines. */
export function firstPageBox(pdfinfoOut: string): PageBox | null {
  const size = /^Page\s+1\s+size:\s+([\d.]+)\s+x\s+([\d.]+)\s+pts/m.exec(pdfinfoOut);
  if (!size) return null;
  const rot = Number(/^Page\s+1\s+rot:\s+(-?\d+)/m.exec(pdfinfoOut)?.[1] ?? 0);
  return { widthPt: Number(size[1]), heightPt: Number(size[2]), rotationDeg: ((rot % 360) + 360) % 360 };
}

const mm = (pt: number) => Math.round((pt / 72) * 25.4);

/**
 * The resolution to draw a page at: the preferred dpi, lowered for a large drawing so the image
 * stays within the pixel caps, or an error when even the lowest dpi would not fit (or the page is
 * too small to show anything). Decided from the page size alone, before anything is drawn: poppler
 * spends time and memory in proportion to the pixels it draws, whatever the file's size.
 */
export function pdfRenderDpi(box: PageBox, limits: UploadLimits): number {
  const { widthPt: w, heightPt: h } = box;
  const longest = Math.max(w, h);
  const fits = Math.min(limits.pdfDpi, (limits.maxSide * 72) / longest, Math.sqrt((limits.maxPixels * 72 * 72) / (w * h)));
  if (!(fits >= limits.pdfMinDpi)) {
    const sideMm = mm((limits.maxSide * 72) / limits.pdfMinDpi);
    const areaM2 = ((limits.maxPixels / limits.pdfMinDpi ** 2) * 0.0254 ** 2).toFixed(1);
    throw new AppError("validation_failed", `The PDF's first page is ${mm(w)} × ${mm(h)} mm, too large to draw: pages up to ${sideMm} mm a side and ${areaM2} m² are accepted. Export the part you need as a smaller page or an image.`);
  }
  if ((Math.min(w, h) * fits) / 72 < limits.pdfMinSide) throw new AppError("validation_failed", `The PDF's first page is ${mm(w)} × ${mm(h)} mm, too small to trace over.`);
  return fits;
}

/** The first page of a PDF as PNG: pdfinfo counts the pages and reads the first one's size, pdftoppm draws it. */
export function firstPageOfPdf(pdf: Buffer, limits: UploadLimits): Promise<Buffer> {
  return inTempDir(pdf, async (src, dir) => {
    let pages = 0;
    let box: PageBox | null = null;
    try {
      const { stdout } = await run("pdfinfo", ["-f", "1", "-l", "1", src], { timeout: 20000 });
      pages = Number(/^Pages:\s+(\d+)/m.exec(stdout)?.[1] ?? 0);
      box = firstPageBox(stdout);
    } catch (err) {
      // poppler refuses a document whose page tree is empty ("Invalid page count 0")
      if (/page count 0|last page \(0\)/.test(String((err as { stderr?: string }).stderr ?? ""))) pages = 0;
      else throw new AppError("validation_failed", "The PDF could not be read: it is damaged, encrypted or not really a PDF.");
    }
    if (pages < 1) throw new AppError("validation_failed", "The PDF has no pages.");
    if (!box || !(box.widthPt > 0 && box.heightPt > 0)) throw new AppError("validation_failed", "The PDF's first page has no readable size.");
    const dpi = pdfRenderDpi(box, limits);
    // -cropbox: draw the very box whose size was checked (the media box may be far larger)
    try {
      await run("pdftoppm", ["-f", "1", "-l", "1", "-r", dpi.toFixed(3), "-cropbox", "-png", "-singlefile", src, join(dir, "page")], { timeout: 60000 });
    } catch {
      throw new AppError("validation_failed", "The PDF's first page could not be drawn.");
    }
    const png = await readFile(join(dir, "page.png"));
    // poppler answers a page it cannot allocate with a blank 1 × 1 image rather than an error
    const meta = await sharp(png).metadata();
    const turned = box.rotationDeg === 90 || box.rotationDeg === 270;
    const expectW = ((turned ? box.heightPt : box.widthPt) * dpi) / 72;
    const expectH = ((turned ? box.widthPt : box.heightPt) * dpi) / 72;
    if (Math.abs((meta.width ?? 0) - expectW) > 2 || Math.abs((meta.height ?? 0) - expectH) > 2) {
      throw new AppError("validation_failed", `The PDF's first page could not be drawn at its size (${mm(box.widthPt)} × ${mm(box.heightPt)} mm). Export the page as PNG and upload that instead.`);
    }
    return png;
  });
}

/**
 * A PDF rewritten page by page (poppler's pdfunite) into a new document. What goes: the
 * document Info dictionary (author, title, producer, dates), the document's XMP metadata
 * stream, and the old catalog's document JavaScript and open action. What stays: each page as
 * it was (drawing, text, links, annotations), including any XMP the page itself carries and
 * metadata inside embedded images (the EXIF of a photo placed in a page), which poppler copies
 * byte for byte. Null when poppler will not rewrite the file (an encrypted PDF that opens
 * without a password, for one): the caller then keeps the file as sent.
 */
export function withoutDocumentMetadata(pdf: Buffer): Promise<Buffer | null> {
  return inTempDir(pdf, async (src, dir) => {
    const out = join(dir, "out.pdf");
    try {
      await run("pdfunite", [src, out], { timeout: 60000 });
      return await readFile(out);
    } catch (err) {
      console.error("[uploads] a PDF was kept with its metadata: poppler would not rewrite it", String((err as { stderr?: string }).stderr ?? err).slice(0, 200));
      return null;
    }
  });
}
