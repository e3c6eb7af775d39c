// The calc sheet's font: Inter has Σ, ṁ, μ and the ▲ ▼ marks. TrueType files (pdfkit cannot
// subset the web fonts' WOFF2), read from the installed package at run time: the bundler must
// not try to bundle a font file.
import { join } from "node:path";
import { FONT } from "./table";

const FONT_DIR = join(process.cwd(), "node_modules", "@expo-google-fonts", "inter");
const FONT_REGULAR = join(FONT_DIR, "400Regular", "Inter_400Regular.ttf");
const FONT_SEMIBOLD = join(FONT_DIR, "600SemiBold", "Inter_600SemiBold.ttf");

export function registerFonts(doc: PDFKit.PDFDocument) {
  doc.registerFont(FONT.regular, FONT_REGULAR);
  doc.registerFont(FONT.bold, FONT_SEMIBOLD);
}
