// A file of a kind people often have at hand but that uploads do not take is refused with what to
// do about it: a phone's HEIC photo is exported as JPEG, a scanner's TIFF saved as PNG or JPEG, a
// GIF as PNG. The sniffed type stays in the words, so it can be looked up.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { processUpload } from "@/lib/uploads/process";

/** The first bytes of a HEIC photo (an ISO box "ftyp" of brand heic), as phones save them. */
const heic = () => Buffer.concat([Buffer.from([0, 0, 0, 0x18]), Buffer.from("ftypheic"), Buffer.from([0, 0, 0, 0]), Buffer.from("mif1heic"), Buffer.alloc(256)]);

describe("a refused kind of file says what to do", () => {
  it("a HEIC photo from a phone: export it as JPEG", async () => {
    await expect(processUpload(heic())).rejects.toMatchObject({
      code: "unsupported_media_type",
      message: "This file is image/heic, whatever its name says: a photo in the HEIC format phones save by default. Export or share it as JPEG (or set the camera to save JPEG), then upload that.",
      fields: [{ path: "file" }],
    });
  });

  it("a scanned TIFF: save it as PNG or JPEG", async () => {
    const tiff = await sharp({ create: { width: 20, height: 10, channels: 3, background: "#ffffff" } }).tiff().toBuffer();
    const err = await processUpload(tiff).then(
      () => null,
      (e: Error & { code?: string }) => e,
    );
    expect(err?.code).toBe("unsupported_media_type");
    expect(err?.message).toBe("This file is image/tiff, whatever its name says: a TIFF image, as scanners save. Save it as PNG (a drawing) or JPEG (a photo), then upload that.");
  });

  it("a GIF: save it as PNG", async () => {
    const gif = Buffer.from("R0lGODlhAQABAAAAACw=", "base64");
    await expect(processUpload(gif)).rejects.toMatchObject({ message: "This file is image/gif, whatever its name says: a GIF image. Save it as PNG, then upload that." });
  });
});
