// The owners' audit log keeps the "Show sign-ins" choice in the page's address, so a reload or a
// shared link shows the same rows, and it asks the server for exactly those rows.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { AuditLog } from "@/components/workspaces/AuditLog";

const signIn = { id: 2, at: "2026-11-02T08:00:00Z", action: "auth.sign_in", actorName: "Eli Editor", actorEmail: "eli@example.com", targetType: null, targetId: null, targetName: null, detail: {} };
const save = { id: 3, at: "2026-11-03T08:00:00Z", action: "sketch.save", actorName: "Eli Editor", actorEmail: "eli@example.com", targetType: "sketch", targetId: "s9", targetName: null, detail: { title: "Bend", number: 2, message: "Hydrotest" } };
const gone = { id: 4, at: "2026-11-04T08:00:00Z", action: "sketch.delete", actorName: "Orla Owner", actorEmail: "orla@example.com", targetType: "sketch", targetId: "s8", targetName: null, detail: { title: "Old", versions: 1 } };
const invite = { id: 1, at: "2026-11-01T08:00:00Z", action: "invitation.create", actorName: "Orla Owner", actorEmail: "orla@example.com", targetType: null, targetId: null, targetName: null, detail: { email: "cho@example.com", role: "checker" } };

function serve() {
  const asked: string[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string) => {
      asked.push(path);
      const events = path.includes("signIns=hide") ? [invite] : [gone, save, signIn, invite];
      return new Response(JSON.stringify({ events, nextBefore: null }), { status: 200, headers: { "content-type": "application/json" } });
    }),
  );
  return asked;
}

const show = (showSignIns?: boolean) =>
  render(
    <QueryClientProvider client={new QueryClient()}>
      <AuditLog workspaceId="w1" showSignIns={showSignIns} />
    </QueryClientProvider>,
  );

afterEach(() => {
  vi.unstubAllGlobals();
  window.history.replaceState(null, "", "/");
});

describe("the audit log's entries about sketches", () => {
  it("link to the version they name, or the sketch; a deleted sketch has no link", async () => {
    serve();
    show();
    const open = await screen.findByRole("link", { name: "Open “Bend” v2" });
    expect(open.getAttribute("href")).toBe("/workspaces/w1/sketches/s9/versions/2");
    expect(screen.queryByRole("link", { name: /Old/ })).toBeNull();
    expect(screen.getAllByRole("link")).toHaveLength(1);
  });
});

describe("the audit log's sign-ins switch", () => {
  it("starts from the address and writes the choice back to it", async () => {
    const asked = serve();
    window.history.replaceState(null, "", "/workspaces/w1/audit?signIns=hide");
    show(false);
    expect(await screen.findByText("invited cho@example.com as checker")).toBeTruthy();
    expect(screen.queryByText("signed in")).toBeNull();
    expect(asked).toEqual(["/api/workspaces/w1/audit?signIns=hide"]);
    const box = screen.getByRole("checkbox", { name: "Show sign-ins" }) as HTMLInputElement;
    expect(box.checked).toBe(false);

    await userEvent.setup().click(box);
    expect(await screen.findByText("signed in")).toBeTruthy();
    expect(asked.at(-1)).toBe("/api/workspaces/w1/audit");
    expect(window.location.search).toBe("");
    expect(window.location.pathname).toBe("/workspaces/w1/audit");
  });

  it("shows sign-ins by default and hiding them puts ?signIns=hide in the address", async () => {
    const asked = serve();
    window.history.replaceState(null, "", "/workspaces/w1/audit");
    show();
    expect(await screen.findByText("signed in")).toBeTruthy();
    await userEvent.setup().click(screen.getByRole("checkbox", { name: "Show sign-ins" }));
    expect(window.location.search).toBe("?signIns=hide");
    await vi.waitFor(() => expect(screen.queryByText("signed in")).toBeNull());
    expect(asked).toEqual(["/api/workspaces/w1/audit", "/api/workspaces/w1/audit?signIns=hide"]);
  });
});

describe("the audit log's older entries", () => {
  it("a failed 'Show older entries' keeps the rows on screen, says why and can be tried again", async () => {
    let olderFails = true;
    vi.stubGlobal(
      "fetch",
      vi.fn(async (path: string) => {
        if (!path.includes("before=")) return Response.json({ events: [gone, save], nextBefore: 3 });
        if (olderFails) return Response.json({ error: { code: "unavailable", message: "The database is busy. Try again in a moment." } }, { status: 503 });
        return Response.json({ events: [signIn, invite], nextBefore: null });
      }),
    );
    render(
      <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
        <AuditLog workspaceId="w1" />
      </QueryClientProvider>,
    );
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "Show older entries" }));
    expect(await screen.findByText("The older entries could not be loaded")).toBeTruthy();
    // the rows already read stay where they were
    expect(screen.getByRole("link", { name: "Open “Bend” v2" })).toBeTruthy();
    expect(screen.getAllByRole("row")).toHaveLength(3);

    olderFails = false;
    await user.click(screen.getByRole("button", { name: "Show older entries" }));
    expect(await screen.findByText("invited cho@example.com as checker")).toBeTruthy();
    expect(screen.queryByText("The older entries could not be loaded")).toBeNull();
    expect(screen.getAllByRole("row")).toHaveLength(5);
    expect(screen.getByText("That is everything recorded for this workspace.")).toBeTruthy();
  });
});
