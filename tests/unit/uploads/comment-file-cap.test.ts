// The comment's file picker stops at the server's cap, so what it lets through is what is attached.
import { describe, expect, it } from "vitest";
import { MAX_COMMENT_FILES } from "@/components/review/Attachments";
import { MAX_ATTACHMENTS } from "@/lib/uploads/service";

describe("files on a comment", () => {
  it("the picker's cap is the server's", () => {
    expect(MAX_COMMENT_FILES).toBe(MAX_ATTACHMENTS);
  });
});
