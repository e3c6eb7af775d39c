// How comment changes and a fork read in a sketch's activity feed.
import { describe, expect, it } from "vitest";
import { activitySentence } from "@/components/review/activitySentence";

const event = (action: string, detail: Record<string, unknown>) => ({ id: 1, at: "2031-05-04T10:00:00Z", action, actorName: "Chen Checkwell", detail });

describe("comment changes in the activity feed", () => {
  it("an edit quotes the new text; a deletion quotes nothing", () => {
    expect(activitySentence(event("comment.edit", { number: 3, reply: false, note: "Friction taken as **0.4**" }))).toBe("edited a comment on v3: “Friction taken as 0.4”");
    // every mark the comment text knows goes: *italic*, _italic_, `code`, nested bold and italic;
    // line breaks become spaces; a bare address stays as written
    expect(activitySentence(event("comment.create", { number: 2, reply: true, note: "Use *wet* μ, see _table 4_ and `mu_wet`;\n**Check *both* feet** https://example.com/a" }))).toBe(
      "replied on v2: “Use wet μ, see table 4 and mu_wet; Check both feet https://example.com/a”",
    );
    expect(activitySentence(event("comment.edit", { number: 3, reply: true, note: "" }))).toBe("edited a reply on v3");
    expect(activitySentence(event("comment.delete", { number: 2, reply: true }))).toBe("deleted a reply on v2");
    expect(activitySentence(event("comment.delete", { number: 2, reply: false }))).toBe("deleted a comment on v2");
  });
});

describe("a fork in its own activity feed", () => {
  it("names the sketch it came from when that is in the same workspace, and not otherwise", () => {
    expect(activitySentence(event("sketch.fork", { fromVersion: 3, fromTitle: "Fire-fighting monitor trailer" }))).toBe("started it as a fork of v3 of “Fire-fighting monitor trailer”");
    expect(activitySentence(event("sketch.fork", { fromVersion: 3 }))).toBe("started it as a fork of v3 of another sketch");
  });
  it("says a restore as one, with the message it was saved with", () => {
    expect(activitySentence(event("sketch.save", { number: 5, message: "Back to 900 kg", restoredFrom: 2 }))).toBe("restored v2 as v5: “Back to 900 kg”");
    expect(activitySentence(event("sketch.save", { number: 5, message: "Back to 900 kg" }))).toBe("saved v5: “Back to 900 kg”");
  });
});
