// A check or an approval while comment threads are open on the sketch (this version, an earlier
// or a later one) says where they are and takes no step without a note saying why the version
// stands; the server's refusal says the same (tests/api/signoff-open-threads.test.ts). Submit and
// a sign-off with every thread resolved ask for nothing.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import type { SignOffData } from "@/components/review/SignOff";
import { showSignOff } from "./signoff-support";
import { withModalDialogs } from "./dialog-support";

beforeAll(withModalDialogs);
afterEach(() => vi.unstubAllGlobals());

const data = (over: Partial<SignOffData>): SignOffData => ({
  state: "submitted",
  sentence: "Submitted for checking.",
  entries: [],
  titleBlock: { prepared: { name: "Eddie Editor", date: "2026-11-30T10:00:00Z" }, checked: null, approved: null },
  allowed: ["check"],
  ...over,
});

/** The requests the dialog sends, answered 200. */
function recordPosts() {
  const sent: unknown[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (_url: string, init?: RequestInit) => {
      sent.push(JSON.parse(String(init?.body ?? "null")));
      return new Response(JSON.stringify({ state: "checked" }), { status: 200, headers: { "content-type": "application/json" } });
    }),
  );
  return sent;
}

describe("signing off over open comment threads", () => {
  it("a check names the threads per version and is not taken until a note says why it stands", async () => {
    const sent = recordPosts();
    showSignOff(data({ openThreads: [{ number: 1, open: 1 }, { number: 2, open: 2 }] }), [], 2);
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Mark checked" }));
    const dialog = within(screen.getByTestId("signoff-dialog"));
    expect(dialog.getByTestId("signoff-open-threads").textContent).toBe(
      "3 comment threads are still open (1 on v1 and 2 on this version): resolve them, or say in the note why the version stands checked with them open.",
    );
    const box = dialog.getByLabelText("Why it stands with the open threads (required; kept in the sign-off record)");
    const take = dialog.getByRole("button", { name: "Mark checked" });
    expect(take).toHaveProperty("disabled", true);
    await user.type(box, "   ");
    expect(take).toHaveProperty("disabled", true);
    await user.type(box, "v1's question is for site; v2's two are answered in their replies.");
    expect(take).toHaveProperty("disabled", false);
    await user.click(take);
    expect(sent).toEqual([{ step: "check", note: "v1's question is for site; v2's two are answered in their replies." }]);
  });

  it("the threads are said once: the findings keep the results' own, not the open threads again", async () => {
    const threads = "1 comment thread still open on an earlier version (v1): resolve it there if this version settles it, or say why not";
    showSignOff(data({ openThreads: [{ number: 1, open: 1 }] }), ["Sliding factor of safety 1.213, below the required 1.5 (as drawn)", threads], 2);
    await userEvent.setup().click(screen.getByRole("button", { name: "Mark checked" }));
    const dialog = within(screen.getByTestId("signoff-dialog"));
    expect(dialog.getByTestId("signoff-concerns").querySelectorAll("li")).toHaveLength(1);
    expect(dialog.getByTestId("signoff-concerns").textContent).toContain("Sliding factor of safety 1.213");
    expect(dialog.queryByText(threads)).toBeNull();
    expect(dialog.getByTestId("signoff-open-threads").textContent).toBe("1 comment thread is still open (1 on v1): resolve it, or say in the note why the version stands checked with it open.");
  });

  it("an approval says so with its own word, a later version's thread counted too", async () => {
    showSignOff(data({ state: "checked", allowed: ["approve"], openThreads: [{ number: 4, open: 1 }] }), [], 3);
    await userEvent.setup().click(screen.getByRole("button", { name: "Approve" }));
    const dialog = within(screen.getByTestId("signoff-dialog"));
    expect(dialog.getByTestId("signoff-open-threads").textContent).toBe(
      "1 comment thread is still open (1 on v4): resolve it, or say in the note why the version stands approved with it open.",
    );
    expect(dialog.getByRole("button", { name: "Approve" })).toHaveProperty("disabled", true);
  });

  it("each other version named links to its comments; this version's own threads are here", async () => {
    showSignOff(data({ openThreads: [{ number: 1, open: 2 }, { number: 3, open: 1 }, { number: 5, open: 1 }] }), [], 3);
    await userEvent.setup().click(screen.getByRole("button", { name: "Mark checked" }));
    const note = within(within(screen.getByTestId("signoff-dialog")).getByTestId("signoff-open-threads"));
    expect(note.getByText(/still open/).closest("p")!.textContent).toBe(
      "4 comment threads are still open (2 on v1, 1 on this version and 1 on v5): resolve them, or say in the note why the version stands checked with them open.",
    );
    const links = note.getAllByRole("link");
    expect(links.map((a) => [a.textContent, a.getAttribute("href")])).toEqual([
      ["v1", "/workspaces/w1/sketches/s1/versions/1#comments"],
      ["v5", "/workspaces/w1/sketches/s1/versions/5#comments"],
    ]);
  });

  it("a submit lists the other versions' threads among its findings, linked the same way", async () => {
    const earlier = "2 comment threads still open on an earlier version (v1): resolve them there if this version settles them, or say why not";
    showSignOff(data({ state: "draft", allowed: ["submit"], openThreads: [{ number: 1, open: 2 }] }), [earlier], 2);
    await userEvent.setup().click(screen.getByRole("button", { name: "Submit for checking" }));
    const findings = within(within(screen.getByTestId("signoff-dialog")).getByTestId("signoff-concerns"));
    expect(findings.getByRole("listitem").textContent).toBe(earlier);
    expect(findings.getByRole("link", { name: "v1" }).getAttribute("href")).toBe("/workspaces/w1/sketches/s1/versions/1#comments");
  });

  it("with every thread resolved, or for a submit, the note stays optional", async () => {
    const user = userEvent.setup();
    const { unmount } = showSignOff(data({ openThreads: [] }), [], 2);
    await user.click(screen.getByRole("button", { name: "Mark checked" }));
    let dialog = within(screen.getByTestId("signoff-dialog"));
    expect(dialog.queryByTestId("signoff-open-threads")).toBeNull();
    expect(dialog.getByRole("button", { name: "Mark checked" })).toHaveProperty("disabled", false);
    unmount();

    showSignOff(data({ state: "draft", allowed: ["submit"], openThreads: [{ number: 2, open: 1 }] }), [], 2);
    await user.click(screen.getByRole("button", { name: "Submit for checking" }));
    dialog = within(screen.getByTestId("signoff-dialog"));
    expect(dialog.queryByTestId("signoff-open-threads")).toBeNull();
    expect(dialog.getByRole("button", { name: "Submit for checking" })).toHaveProperty("disabled", false);
  });
});
