// Files that fail to attach once a comment is posted are not lost: they wait under that comment,
// each with its reason, to be attached again or taken off; and one's own comment takes more files
// later ("Attach files…", as the server allows: its author, not deleted, on a version not approved).
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CommentsPanel, type CommentsData, type ThreadItem } from "@/components/review/Comments";
import { commentsPanelProps } from "./comments-support";

const NOT_AN_IMAGE = "This file is not a PNG, JPEG or WebP image or a PDF (whatever its name says).";

const reply = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });
const uploaded = (id: string, name: string) => ({ upload: { id, name, purpose: "attachment", sourceType: "image/png", storedType: "image/png", size: 2048, width: 40, height: 30, url: `/api/uploads/${id}`, thumbnailUrl: `/api/uploads/${id}/thumbnail` } });

function thread(id: string, authorId: string, opts: { attachments?: number } = {}): ThreadItem {
  return {
    id: `t-${id}`,
    pin: null,
    resolvedAt: null,
    resolvedByName: null,
    comments: [
      {
        id,
        authorId,
        authorName: authorId === "u-chen" ? "Chen Checker" : "Eddie Editor",
        body: `Comment ${id}`,
        deleted: false,
        editedAt: null,
        createdAt: "2026-03-02T10:00:00Z",
        attachments: Array.from({ length: opts.attachments ?? 0 }, (_, i) => ({ ...uploaded(`${id}-a${i}`, `old ${i}.png`).upload })),
      },
    ],
  };
}

function Harness({ start, afterChange, locked = false }: { start: ThreadItem[]; afterChange?: ThreadItem[]; locked?: boolean }) {
  const [threads, setThreads] = useState(start);
  const data: CommentsData = { threads, earlierOpen: [], members: [], locked, canComment: true };
  return (
    <CommentsPanel {...commentsPanelProps(data, { onChanged: () => afterChange && setThreads(afterChange) })} />
  );
}

function show(props: Parameters<typeof Harness>[0]) {
  return render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { mutations: { retry: false } } })}>
      <Harness {...props} />
    </QueryClientProvider>,
  );
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe("files that fail to attach to a posted comment", () => {
  it("wait under the comment with their reasons, and attach from there; the ones that went are not sent again", async () => {
    let refuse = true;
    const fetch = vi.fn(async (url: string, init?: RequestInit) => {
      if (url.endsWith("/comments") && init?.method === "POST") return reply(201, { comment: { id: "c9" } });
      const file = (init?.body as FormData).get("file") as File;
      if (file.name === "notes.png" && refuse) return reply(415, { error: { code: "unsupported_media_type", message: NOT_AN_IMAGE } });
      return reply(201, uploaded(`u-${file.name}`, file.name));
    });
    vi.stubGlobal("fetch", fetch);
    show({ start: [], afterChange: [thread("c9", "u-chen")] });
    const user = userEvent.setup();
    await user.type(screen.getByRole("combobox", { name: "New comment" }), "The anchor bolts as built");
    fireEvent.change(screen.getByTestId("new-comment-files"), { target: { files: [new File(["png"], "foot.png", { type: "image/png" }), new File(["just text"], "notes.png", { type: "image/png" })] } });
    await user.click(screen.getByRole("button", { name: "Comment" }));

    // the comment is posted: its box and picker are empty for the next one
    await waitFor(() => expect(screen.getByRole("combobox", { name: "New comment" })).toHaveValue(""));
    expect(within(screen.getByRole("form", { name: "Write a comment" })).queryByRole("button", { name: /^Do not attach/ })).toBeNull();
    expect(within(screen.getByTestId("attach-problems")).getByText(`“notes.png”: ${NOT_AN_IMAGE}`)).toBeInTheDocument();
    // the file that failed waits under the comment it was for, with its reason; the one that went does not
    const comment = await screen.findByTestId("comment");
    const waiting = within(comment).getByTestId("attach-c9-waiting");
    expect(within(waiting).getByRole("button", { name: "Do not attach notes.png" })).toBeInTheDocument();
    expect(within(waiting).queryByRole("button", { name: "Do not attach foot.png" })).toBeNull();
    expect(within(waiting).getByTestId("attach-c9-problems")).toHaveTextContent(`“notes.png”: ${NOT_AN_IMAGE}`);

    // attached again (the server takes it this time): sent to the same comment, and the box closes
    refuse = false;
    await user.click(within(waiting).getByRole("button", { name: "Attach 1 file" }));
    await waitFor(() => expect(within(comment).queryByTestId("attach-c9-waiting")).toBeNull());
    const sends = fetch.mock.calls.filter(([url]) => url === "/api/comments/c9/attachments").map(([, init]) => ((init!.body as FormData).get("file") as File).name);
    expect(sends).toEqual(["foot.png", "notes.png", "notes.png"]);
    expect(screen.queryByTestId("attach-problems")).toBeNull();
  });
});

describe("Attach files… on a comment", () => {
  it("is offered on one's own comment only, never on another's nor on an approved version", () => {
    const { unmount } = show({ start: [thread("c1", "u-chen"), thread("c2", "u-eddie")] });
    const [mine, theirs] = screen.getAllByTestId("comment");
    expect(within(mine).getByRole("button", { name: "Attach files…" })).toBeInTheDocument();
    expect(within(theirs).queryByRole("button", { name: "Attach files…" })).toBeNull();
    unmount();
    show({ start: [thread("c1", "u-chen")], locked: true });
    expect(within(screen.getByTestId("comment")).queryByRole("button", { name: "Attach files…" })).toBeNull();
  });

  it("sends the chosen files to the comment, at most as many as it still takes", async () => {
    const fetch = vi.fn(async (_url: string, init?: RequestInit) => {
      const file = (init?.body as FormData).get("file") as File;
      return reply(201, uploaded(`u-${file.name}`, file.name));
    });
    vi.stubGlobal("fetch", fetch);
    // six files on it already: two more at most (a comment takes eight)
    show({ start: [thread("c1", "u-chen", { attachments: 6 })] });
    const user = userEvent.setup();
    await user.click(within(screen.getByTestId("comment")).getByRole("button", { name: "Attach files…" }));
    const chosen = ["a.png", "b.png", "c.png"].map((n) => new File(["png"], n, { type: "image/png" }));
    fireEvent.change(screen.getByTestId("attach-c1-files"), { target: { files: chosen } });
    expect(screen.getByTestId("attach-c1-left-out")).toHaveTextContent("This comment takes 2 more files: “c.png” not added");
    await user.click(screen.getByRole("button", { name: "Attach 2 files" }));
    await waitFor(() => expect(screen.queryByTestId("attach-c1-waiting")).toBeNull());
    expect(fetch.mock.calls.map(([url, init]) => [url, ((init!.body as FormData).get("file") as File).name])).toEqual([
      ["/api/comments/c1/attachments", "a.png"],
      ["/api/comments/c1/attachments", "b.png"],
    ]);
  });

  it("Cancel takes the chosen files back without sending anything", async () => {
    const fetch = vi.fn();
    vi.stubGlobal("fetch", fetch);
    show({ start: [thread("c1", "u-chen")] });
    const user = userEvent.setup();
    await user.click(within(screen.getByTestId("comment")).getByRole("button", { name: "Attach files…" }));
    fireEvent.change(screen.getByTestId("attach-c1-files"), { target: { files: [new File(["png"], "a.png", { type: "image/png" })] } });
    await user.click(within(screen.getByTestId("attach-c1-waiting")).getByRole("button", { name: "Cancel" }));
    expect(screen.queryByTestId("attach-c1-waiting")).toBeNull();
    expect(fetch).not.toHaveBeenCalled();
  });
});
