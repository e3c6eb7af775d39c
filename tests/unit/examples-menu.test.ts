// The example menu says what the sketch it opens says: its name starts the sketch's own title.
import { describe, expect, it } from "vitest";
import { EXAMPLES } from "@/canvas/examples";

describe("the example menu", () => {
  it.each(EXAMPLES.map((e) => [e.id, e] as const))("%s: the menu's name is the sketch's title or its start", (_id, e) => {
    const title = (e.sketch as { title?: string }).title ?? "";
    expect(title.startsWith(e.title)).toBe(true);
  });
});
