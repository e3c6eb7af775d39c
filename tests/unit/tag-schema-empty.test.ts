// A tag left empty (or only spaces) is refused with one message, not a second one about its characters
// on the same path; a tag with several real faults still gets each.
import { describe, expect, it } from "vitest";
import { tagSchema, tagsSchema, updateSketchInput } from "@/lib/sketch-schemas";

const messages = (r: { success: boolean; error?: { issues: Array<{ path: PropertyKey[]; message: string }> } }) =>
  (r.error?.issues ?? []).map((i) => [i.path.join("."), i.message]);

describe("an empty tag", () => {
  it("gets one message", () => {
    expect(messages(tagSchema.safeParse(""))).toEqual([["", "A tag cannot be empty."]]);
    expect(messages(tagSchema.safeParse("   "))).toEqual([["", "A tag cannot be empty."]]);
  });

  it("gets one message at its place in a list and in an edit", () => {
    expect(messages(tagsSchema.safeParse(["pump", " "]))).toEqual([["1", "A tag cannot be empty."]]);
    expect(messages(updateSketchInput.safeParse({ tags: ["", "bend"] }))).toEqual([["tags.0", "A tag cannot be empty."]]);
  });

  it("leaves the other checks as they were", () => {
    expect(tagSchema.safeParse("  Riser Bend ").data).toBe("riser bend");
    expect(messages(tagSchema.safeParse("-x"))).toEqual([["", "Tags are letters, digits, spaces and . _ / -, starting with a letter or digit."]]);
    expect(messages(tagSchema.safeParse("#".repeat(40)))).toEqual([
      ["", "Keep each tag under 32 characters."],
      ["", "Tags are letters, digits, spaces and . _ / -, starting with a letter or digit."],
    ]);
  });
});
