// What the sheet of an earlier version says of the later ones: an approved version whose later
// versions are unapproved drafts still governs; one with a later approved version is superseded.
// Keeping the approved revision identifiable on every issued sheet is common practice.
import { describe, expect, it } from "vitest";
import { laterVersionsWords } from "@/lib/calcsheet/pdf";

describe("laterVersionsWords", () => {
  it("an approved v1 with only unapproved drafts after it remains the approved design", () => {
    expect(laterVersionsWords(1, 3, null)).toBe("Later versions: v3 is the latest version of this sketch. No later version is approved, so this one, v1, remains the approved design.");
  });
  it("an approved v1 with a later approved v2 and a draft v3 is superseded by v2", () => {
    expect(laterVersionsWords(1, 3, 2)).toBe("Superseded: v2, a later version, is approved; v3 is the latest version of this sketch.");
    expect(laterVersionsWords(1, 2, 2)).toBe("Superseded: v2, the latest version of this sketch, is approved.");
  });
  it("a version that was never approved is simply superseded", () => {
    expect(laterVersionsWords(2, 4)).toBe("Superseded: v4 is the latest version of this sketch.");
  });
});
