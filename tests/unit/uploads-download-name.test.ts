// The name a served upload is saved under ends in the extension of what is stored, whatever the
// name it was sent with said, so the saved file opens in the program its contents need.
import { describe, expect, it } from "vitest";
import { downloadName } from "@/lib/uploads/names";

describe("downloadName", () => {
  it("keeps the name as sent when its extension already says what is stored", () => {
    expect(downloadName("GA skid rev B.png", "image/png", "file")).toBe("GA skid rev B.png");
    expect(downloadName("site photo.JPEG", "image/jpeg", "file")).toBe("site photo.JPEG");
    expect(downloadName("pump data sheet.pdf", "application/pdf", "file")).toBe("pump data sheet.pdf");
  });
  it("puts the stored type's extension on a name that says another type", () => {
    // a JPEG sent as .png is stored (and served) as the JPEG it is
    expect(downloadName("site photo.png", "image/jpeg", "file")).toBe("site photo.jpg");
    // a PDF's first page, drawn for an underlay, is a PNG
    expect(downloadName("GA-100.pdf", "image/png", "file")).toBe("GA-100.png");
  });
  it("adds an extension to a name without one, keeping dots that are part of the name", () => {
    expect(downloadName("scan", "image/webp", "file")).toBe("scan.webp");
    expect(downloadName("GA-100 rev.B", "image/png", "file")).toBe("GA-100 rev.B.png");
  });
  it("names a file sent without a name", () => {
    expect(downloadName("", "image/png", "file")).toBe("file.png");
    expect(downloadName("", "application/pdf", "thumbnail")).toBe("file-thumbnail.png");
  });
  it("names a thumbnail after its file, as a PNG", () => {
    expect(downloadName("pump data sheet.pdf", "application/pdf", "thumbnail")).toBe("pump data sheet-thumbnail.png");
  });
});
