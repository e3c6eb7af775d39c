// Resolve shows it is working while the server answers (a press that shows nothing invites a
// second), on that thread only; the thread then reads resolved.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CommentsPanel, type CommentsData, type ThreadItem } from "@/components/review/Comments";
import { commentsPanelProps } from "./comments-support";

const reply = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

function thread(id: string, resolved = false): ThreadItem {
  return {
    id,
    pin: null,
    resolvedAt: resolved ? "2026-03-02T11:00:00Z" : null,
    resolvedByName: resolved ? "Chen Checker" : null,
    comments: [{ id, authorId: "u-chen", authorName: "Chen Checker", body: `Comment ${id}`, deleted: false, editedAt: null, createdAt: "2026-03-02T10:00:00Z", attachments: [] }],
  };
}

function Harness({ start, afterChange }: { start: ThreadItem[]; afterChange: ThreadItem[] }) {
  const [threads, setThreads] = useState(start);
  const data: CommentsData = { threads, earlierOpen: [], members: [], locked: false, canComment: true };
  return <CommentsPanel {...commentsPanelProps(data, { onChanged: () => setThreads(afterChange) })} />;
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe("resolving a thread", () => {
  it("marks that thread's Resolve busy until the server answers, then shows it resolved", async () => {
    let answer: (r: Response) => void = () => {};
    const fetch = vi.fn((url: string, init?: RequestInit) => {
      expect([url, init?.method, init?.body]).toEqual(["/api/comments/a", "PATCH", JSON.stringify({ resolved: true })]);
      return new Promise<Response>((r) => (answer = r));
    });
    vi.stubGlobal("fetch", fetch);
    render(
      <QueryClientProvider client={new QueryClient({ defaultOptions: { mutations: { retry: false } } })}>
        <Harness start={[thread("a"), thread("b")]} afterChange={[thread("a", true), thread("b")]} />
      </QueryClientProvider>,
    );
    const user = userEvent.setup();
    await user.click(within(screen.getByTestId("thread-1")).getByRole("button", { name: "Resolve" }));
    const first = within(screen.getByTestId("thread-1")).getByRole("button", { name: "Resolve" });
    await waitFor(() => expect(first).toHaveAttribute("aria-busy", "true"));
    // the other thread's button is not the one working
    expect(within(screen.getByTestId("thread-2")).getByRole("button", { name: "Resolve" })).not.toHaveAttribute("aria-busy");
    // a second press while it works sends nothing more
    await user.click(first);
    expect(fetch).toHaveBeenCalledTimes(1);
    answer(reply(200, { id: "a", resolved: true }));
    await waitFor(() => expect(within(screen.getByTestId("thread-1")).getByRole("button", { name: "Reopen" })).not.toHaveAttribute("aria-busy"));
    expect(screen.getByTestId("thread-1").textContent).toContain("resolved by Chen Checker");
  });
});
