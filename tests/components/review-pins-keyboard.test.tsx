// Comment pins on a version's drawing are buttons a keyboard reaches: Tab to a pin, Enter or Space
// opens its thread (selected, focused). Each is named by its number, author and first words, and
// sits outside the drawing's role="img" (whose insides assistive technology does not enter).
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { VersionReview } from "@/components/review/VersionReview";
import { pinName } from "@/components/review/drawingOverlay";
import { plainText } from "@/lib/review/comment-text";
import { parseSketch } from "@/solver";
import { fixture } from "../api/sketch-fixtures";

const parsed = parseSketch(fixture("pump-skid-discharge"));
if (!parsed.ok) throw new Error("fixture does not parse");
const document_ = parsed.file;


const comment = (id: string, authorName: string | null, body: string, deleted = false) => ({ id, authorId: "u-x", authorName, body, deleted, editedAt: null, createdAt: "2026-11-30T10:00:00Z" });
const threads = [
  { id: "t1", pin: { kind: "element", elementId: "front" }, resolvedAt: null, resolvedByName: null, comments: [comment("c1", "Chen Checker", "Is the **front foot** bolted down, or only resting on the plinth as drawn here?")] },
  { id: "t2", pin: null, resolvedAt: null, resolvedByName: null, comments: [comment("c2", "Eddie Editor", "No pin on this one.")] },
  { id: "t3", pin: { kind: "point", at: [1.5, 0.6] }, resolvedAt: "2026-12-01T10:00:00Z", resolvedByName: "Eddie Editor", comments: [comment("c3", "Eddie Editor", "Mass checked.")] },
];

beforeAll(() => {
  // jsdom lays nothing out: a thread scrolled into view does nothing here
  Element.prototype.scrollIntoView = () => {};
});
afterEach(() => vi.unstubAllGlobals());

function answers() {
  const body = (url: string) => {
    if (url.endsWith("/signoff")) return { state: "draft", sentence: "Prepared; not yet submitted for checking.", entries: [], titleBlock: { prepared: null, checked: null, approved: null }, allowed: [] };
    if (url.endsWith("/comments")) return { threads, earlierOpen: [], members: [], locked: false, canComment: true };
    if (url.endsWith("/api/sketches/s1")) return { sketch: { id: "s1", title: "Skid", latestVersion: 1, approvedVersion: null }, latest: null };
    return { version: { id: "v", number: 1, message: "first", authorName: "Eddie Editor", createdAt: "2026-11-30T10:00:00Z", status: "holds", largestReaction: 1000, warnings: [], document: document_ } };
  };
  vi.stubGlobal("fetch", vi.fn(async (url: string) => new Response(JSON.stringify(body(String(url))), { status: 200, headers: { "content-type": "application/json" } })));
}

describe("comment pins by keyboard", () => {
  it("Tab reaches each pinned thread's pin (not the unpinned one), named by number, author and first words; Enter and Space open its thread", async () => {
    answers();
    render(
      <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
        <VersionReview workspaceId="w1" sketchId="s1" sketchTitle="Skid" number={1} latest={1} viewerId="u-chen" canEdit={false} />
      </QueryClientProvider>,
    );
    const layer = await screen.findByTestId("comment-pins");
    const pins = within(layer).getAllByRole("button");
    expect(pins.map((p) => p.getAttribute("aria-label"))).toEqual(["Comment 1 by Chen Checker: Is the front foot bolted down, or only…", "Comment 3 by Eddie Editor: Mass checked. (resolved)"]);
    // outside the drawing's image role, which would hide them
    expect(screen.getByTestId("review-drawing").contains(pins[0])).toBe(false);
    // the drawn pins stay drawn under their buttons, pictures only
    const drawn = screen.getByTestId("review-drawing").querySelectorAll("[data-thread]");
    expect([...drawn].map((g) => [g.getAttribute("data-thread"), g.getAttribute("aria-hidden"), g.getAttribute("role")])).toEqual([
      ["t1", "true", null],
      ["t3", "true", null],
    ]);
    // placed on the drawing: the front foot's point (2.8 m, 0 m) is right of the point pin at 1.5 m
    const left = pins.map((p) => parseFloat(p.style.left));
    expect(left.every((x) => x > 0 && x < 100)).toBe(true);
    expect(left[0]).toBeGreaterThan(left[1]);

    const user = userEvent.setup();
    pins[0].focus();
    expect(document.activeElement).toBe(pins[0]);
    await user.keyboard("{Enter}");
    await waitFor(() => expect(screen.getByTestId("thread-1")).toHaveAttribute("data-selected", "true"));
    await waitFor(() => expect(document.activeElement).toBe(screen.getByTestId("thread-1")));
    expect(window.location.hash).toBe("#thread-t1");

    // back to the drawing: Tab from the first pin goes to the second, and Space opens it
    pins[0].focus();
    await user.tab();
    expect(document.activeElement).toBe(pins[1]);
    await user.keyboard(" ");
    await waitFor(() => expect(screen.getByTestId("thread-3")).toHaveAttribute("data-selected", "true"));
    expect(screen.getByTestId("thread-1")).not.toHaveAttribute("data-selected");
  });
});

describe("a pin's name", () => {
  it("cuts the first comment after eight words, says a deleted comment or account, and (resolved)", () => {
    expect(pinName(4, { authorName: "Chen Checker", body: "one two three four five six seven eight nine", deleted: false }, false, plainText)).toBe("Comment 4 by Chen Checker: one two three four five six seven eight…");
    expect(pinName(2, { authorName: null, body: "gone", deleted: true }, true, plainText)).toBe("Comment 2 by a deleted account: a deleted comment (resolved)");
    expect(pinName(1, { authorName: "Vera Viewer", body: "`Fy` _looks_ low", deleted: false }, false, plainText)).toBe("Comment 1 by Vera Viewer: Fy looks low");
  });
});
