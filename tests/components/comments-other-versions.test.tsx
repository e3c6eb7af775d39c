// The comments panel says where threads are still open on the sketch's other versions, earlier and
// later alike (a check or an approval counts both, `noteForOpenThreads`), each version linked to
// its comments; versions with none are not named.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { CommentsPanel, type CommentsData } from "@/components/review/Comments";
import { commentsPanelProps } from "./comments-support";

function show(data: CommentsData) {
  return render(
    <QueryClientProvider client={new QueryClient()}>
      <CommentsPanel {...commentsPanelProps(data)} />
    </QueryClientProvider>,
  );
}

const base: CommentsData = { threads: [], earlierOpen: [], members: [], locked: false, canComment: true };
const linksIn = (id: string) => within(screen.getByTestId(id)).getAllByRole("link").map((a) => [a.textContent, a.getAttribute("href")]);

describe("open threads on other versions", () => {
  it("lists earlier and later versions apart, each linked to its comments", () => {
    show({ ...base, earlierOpen: [{ number: 1, open: 2 }], laterOpen: [{ number: 4, open: 1 }, { number: 6, open: 3 }] });
    expect(screen.getByTestId("earlier-open").textContent).toBe("Still open on earlier versions: v1 (2 threads). Answer or resolve them there if this version settles them.");
    expect(linksIn("earlier-open")).toEqual([["v1", "/v/1#comments"]]);
    expect(screen.getByTestId("later-open").textContent).toBe(
      "Still open on later versions: v4 (1 thread), v6 (3 threads). Asked of the drawing as it went on. A check or an approval of this version counts them too: resolve them there, or say in its note why they do not apply here.",
    );
    expect(linksIn("later-open")).toEqual([
      ["v4", "/v/4#comments"],
      ["v6", "/v/6#comments"],
    ]);
  });

  it("later versions only, and none at all", () => {
    const { unmount } = show({ ...base, laterOpen: [{ number: 2, open: 1 }] });
    expect(screen.queryByTestId("earlier-open")).toBeNull();
    expect(linksIn("later-open")).toEqual([["v2", "/v/2#comments"]]);
    unmount();
    // an answer without laterOpen (older server), or a version with nothing open elsewhere
    show({ ...base, laterOpen: [{ number: 2, open: 0 }] });
    expect(screen.queryByTestId("earlier-open")).toBeNull();
    expect(screen.queryByTestId("later-open")).toBeNull();
  });

  it("on an approved version they are listed, without asking for a sign-off it no longer takes", () => {
    show({ ...base, locked: true, canComment: false, laterOpen: [{ number: 3, open: 1 }] });
    expect(screen.getByTestId("later-open").textContent).toBe("Still open on later versions: v3 (1 thread). Asked of the drawing as it went on.");
  });
});
