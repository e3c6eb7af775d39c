// Files on comments, as the review page shows them: thumbnails that open or download the file, a
// picker that marks what is over the cap, and a remove button only where one may remove.
import { fireEvent, render, screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { useState } from "react";
import { AttachmentList, attachFiles, FilePicker, MAX_COMMENT_FILES, sizeWords, type Attachment } from "@/components/review/Attachments";
import { MAX_UPLOAD_BYTES } from "@/components/uploads/uploadFile";
import { UPLOAD_LIMITS } from "@/lib/uploads/process";

const photo: Attachment = { id: "a1", name: "foot.jpg", storedType: "image/jpeg", sourceType: "image/jpeg", size: 240_000, width: 1600, height: 1200, url: "/api/uploads/a1", thumbnailUrl: "/api/uploads/a1/thumbnail" };
const sheet: Attachment = { id: "a2", name: "pump datasheet.pdf", storedType: "application/pdf", sourceType: "application/pdf", size: 3_400_000, width: 1275, height: 1650, url: "/api/uploads/a2", thumbnailUrl: "/api/uploads/a2/thumbnail" };

describe("attachments on comments", () => {
  it("shows each file as a thumbnail: an image opens in a new tab, a PDF downloads", () => {
    render(<AttachmentList files={[photo, sheet]} />);
    const items = screen.getAllByTestId("attachment");
    expect(items).toHaveLength(2);
    const photoLink = within(items[0]).getByRole("link");
    expect(photoLink).toHaveAttribute("target", "_blank");
    expect(photoLink).not.toHaveAttribute("download");
    expect(photoLink).toHaveAttribute("title", "Open foot.jpg (1600 × 1200 px, 234 KB)");
    const link = within(items[1]).getByRole("link");
    expect(link).toHaveAttribute("href", "/api/uploads/a2");
    expect(link).not.toHaveAttribute("target");
    expect(link).toHaveAttribute("download", "");
    expect(link).toHaveAttribute("title", "Download pump datasheet.pdf (PDF, 3.2 MB)");
    expect(within(items[1]).getByRole("img")).toHaveAttribute("src", "/api/uploads/a2/thumbnail");
    expect(within(items[0]).getByRole("img")).toHaveAttribute("alt", "Thumbnail of foot.jpg");
    expect(items[1]).toHaveTextContent("PDF · pump datasheet.pdf");
    expect(screen.queryByRole("button", { name: /Remove/ })).toBeNull();
  });

  it("offers removal to the comment's author, after asking", () => {
    const onRemove = vi.fn();
    vi.spyOn(window, "confirm").mockReturnValue(true);
    render(<AttachmentList files={[photo]} onRemove={onRemove} />);
    fireEvent.click(screen.getByRole("button", { name: "Remove foot.jpg" }));
    expect(onRemove).toHaveBeenCalledWith(photo);
  });

  it("the picker lists chosen files, marks one over the cap, and lets one go", () => {
    const onChange = vi.fn();
    const big = new File([new Uint8Array(8)], "site survey.png");
    Object.defineProperty(big, "size", { value: MAX_UPLOAD_BYTES + 1 });
    render(<FilePicker id="t" files={[new File(["x"], "a.png"), big]} onChange={onChange} />);
    expect(screen.getByText("over 10 MB: it will not be attached")).toBeInTheDocument();
    fireEvent.click(screen.getByRole("button", { name: "Do not attach a.png" }));
    expect(onChange).toHaveBeenCalledWith([big]);
  });

  it("the browser's cap is the server's", () => {
    expect(MAX_UPLOAD_BYTES).toBe(UPLOAD_LIMITS.maxBytes);
    expect(sizeWords(2048)).toBe("2 KB");
  });

  it("more files than a comment takes: the ones left out are named at the picker", () => {
    function Picker() {
      const [files, setFiles] = useState<File[]>([new File(["x"], "already.png")]);
      return <FilePicker id="t" files={files} onChange={setFiles} />;
    }
    render(<Picker />);
    const chosen = Array.from({ length: 9 }, (_, i) => new File(["x"], `photo ${i + 1}.jpg`));
    fireEvent.change(screen.getByTestId("t-files"), { target: { files: chosen } });
    expect(screen.getAllByRole("button", { name: /^Do not attach/ })).toHaveLength(MAX_COMMENT_FILES);
    expect(screen.getByTestId("t-left-out")).toHaveTextContent("8 files at most on a comment: “photo 8.jpg”, “photo 9.jpg” not added");
  });

  it("a refused file is named once in the words the comment shows", async () => {
    const fetchMock = vi.spyOn(globalThis, "fetch").mockResolvedValue(
      new Response(JSON.stringify({ error: { code: "unsupported_media_type", message: "This file is not a PNG, JPEG or WebP image or a PDF (whatever its name says)." } }), { status: 415, headers: { "content-type": "application/json" } }),
    );
    try {
      const problems = await attachFiles("c1", [new File(["just text"], "notes.png", { type: "image/png" })]);
      expect(problems).toEqual(["“notes.png”: This file is not a PNG, JPEG or WebP image or a PDF (whatever its name says)."]);
      expect(fetchMock).toHaveBeenCalledWith("/api/comments/c1/attachments", expect.objectContaining({ method: "POST" }));
    } finally {
      fetchMock.mockRestore();
    }
  });
});
