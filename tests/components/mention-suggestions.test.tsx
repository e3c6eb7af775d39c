// The @mention suggestions of the comment box close once the comment is posted (the field is
// emptied under them), and whenever the text no longer ends in an @mention.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CommentsPanel, mentionQuery, type CommentsData } from "@/components/review/Comments";
import { commentsPanelProps } from "./comments-support";

const data: CommentsData = {
  threads: [],
  earlierOpen: [],
  members: [
    { id: "u-eddie", name: "Eddie Editor" },
    { id: "u-chen", name: "Chen Checker" },
  ],
  locked: false,
  canComment: true,
};

function show() {
  return render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { mutations: { retry: false } } })}>
      <CommentsPanel {...commentsPanelProps(data)} />
    </QueryClientProvider>,
  );
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe("the @mention suggestions of a new comment", () => {
  it("close when the comment is posted", async () => {
    const fetch = vi.fn(async () => new Response(JSON.stringify({ comment: { id: "c1" } }), { status: 201, headers: { "content-type": "application/json" } }));
    vi.stubGlobal("fetch", fetch);
    show();
    const user = userEvent.setup();
    const box = screen.getByRole("combobox", { name: "New comment" });
    await user.type(box, "Please look at the anchor load @Eddie");
    expect(screen.getByRole("listbox", { name: "Mention a member" })).toBeInTheDocument();
    expect(box).toHaveAttribute("aria-expanded", "true");

    await user.click(screen.getByRole("button", { name: "Comment" }));
    await waitFor(() => expect(box).toHaveValue(""));
    expect(fetch).toHaveBeenCalledTimes(1);
    expect(JSON.parse(String((fetch.mock.calls[0] as unknown as [string, RequestInit])[1].body))).toEqual({ body: "Please look at the anchor load @Eddie" });
    expect(screen.queryByRole("listbox", { name: "Mention a member" })).toBeNull();
    expect(box).toHaveAttribute("aria-expanded", "false");
  });

  it("close when the text no longer ends in an @mention, and open again at the next one", async () => {
    show();
    const user = userEvent.setup();
    const box = screen.getByRole("combobox", { name: "New comment" });
    await user.type(box, "Ask @Ch");
    expect(screen.getByRole("option", { name: "@Chen Checker" })).toBeInTheDocument();
    await user.type(box, ", please");
    expect(screen.queryByRole("listbox")).toBeNull();
    await user.type(box, " and @");
    expect(screen.getAllByRole("option")).toHaveLength(2);
    await user.keyboard("{Escape}");
    expect(screen.queryByRole("listbox")).toBeNull();
  });

  it("reads the mention being typed at the end of the text", () => {
    expect(mentionQuery("Ask @")).toBe("");
    expect(mentionQuery("Ask @Eddie Ed")).toBe("Eddie Ed");
    expect(mentionQuery("Ask @Eddie, please")).toBeNull();
    expect(mentionQuery("Ask @Eddie ")).toBeNull();
    expect(mentionQuery("mail@Eddie")).toBeNull();
    expect(mentionQuery("")).toBeNull();
  });
});
