// An attached PDF downloads under the name the server gives it (lib/uploads/names.ts: what it
// holds decides the extension, so "pump datasheet" uploaded without ".pdf" saves as
// "pump datasheet.pdf"): the link asks for a download but names nothing itself.
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { AttachmentList, type Attachment } from "@/components/review/Attachments";

const sheet: Attachment = { id: "a2", name: "pump datasheet", storedType: "application/pdf", sourceType: "application/pdf", size: 3_400_000, width: 1275, height: 1650, url: "/api/uploads/a2", thumbnailUrl: "/api/uploads/a2/thumbnail" };

describe("an attached PDF's link", () => {
  it("is a bare download, so the server's corrected name is the one the file is saved under", () => {
    render(<AttachmentList files={[sheet]} />);
    const link = within(screen.getByTestId("attachment")).getByRole("link");
    expect(link).toHaveAttribute("href", "/api/uploads/a2");
    // present and empty: a download, named by the server's Content-Disposition
    expect(link.getAttribute("download")).toBe("");
    expect(link.getAttribute("download")).not.toBe(sheet.name);
    expect(link).toHaveAttribute("title", "Download pump datasheet (PDF, 3.2 MB)");
  });
});
