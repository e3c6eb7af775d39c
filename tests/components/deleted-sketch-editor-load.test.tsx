// The editor opening a saved sketch that has been deleted: a member of its workspace reads the server's
// sentence (who deleted it and when); anyone else, the words of a sketch that never was.
import { afterEach, describe, expect, it, vi } from "vitest";
import { SKETCH_NOT_FOUND_MESSAGE } from "@/components/versions/editor/notFound";
import { createSaveFlow, savedPersistence } from "@/components/versions/editor/savedPersistence";

const SENTENCE = "“Riser bend” was deleted by Olivia Owner on 5 Dec 2026, 13:38 UTC, with all its versions. Forks of it keep their own copies.";

function answer(error: Record<string, unknown>) {
  vi.stubGlobal(
    "fetch",
    vi.fn(async () => new Response(JSON.stringify({ error }), { status: 404, headers: { "content-type": "application/json" } })),
  );
}

afterEach(() => vi.unstubAllGlobals());

describe("the editor's load of a deleted sketch", () => {
  it("says who deleted it and when, in the server's words, to a member of its workspace", async () => {
    answer({
      code: "not_found",
      message: SENTENCE,
      deleted: { title: "Riser bend", deletedBy: "Olivia Owner", deletedAt: "2026-12-05T13:38:00.000Z", workspaceId: "w1" },
    });
    const out = await savedPersistence("s1", createSaveFlow()).load();
    expect(out).toEqual({ ok: false, reason: "not-found", message: SENTENCE });
  });

  it("keeps the words of a sketch that never was for anyone else", async () => {
    answer({ code: "not_found", message: "No such sketch, or you are not a member of its workspace." });
    const out = await savedPersistence("s1", createSaveFlow()).load();
    expect(out).toEqual({ ok: false, reason: "not-found", message: SKETCH_NOT_FOUND_MESSAGE });
  });
});
