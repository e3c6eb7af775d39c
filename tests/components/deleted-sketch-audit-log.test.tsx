// The owners' audit log: an entry about a sketch deleted since (`targetDeleted`) says so in place of
// the "Open" link, which would lead to a 404; a sketch still there keeps its link.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { AuditLog } from "@/components/workspaces/AuditLog";

const entry = (id: number, action: string, targetId: string, detail: Record<string, unknown>, targetDeleted: boolean) => ({
  id,
  at: `2026-11-0${id}T08:00:00Z`,
  action,
  actorName: "Eli Editor",
  actorEmail: "eli@example.com",
  targetType: "sketch",
  targetId,
  targetName: null,
  detail,
  targetDeleted,
});

const events = [
  entry(5, "sketch.delete", "s8", { title: "Old bend", versions: 2 }, true),
  entry(4, "sketch.save", "s9", { title: "Pump skid", number: 2, message: "Hydrotest" }, false),
  entry(3, "sketch.save", "s8", { title: "Old bend", number: 2, message: "moved the anchor" }, true),
  entry(2, "sketch.create", "s8", { title: "Old bend" }, true),
];

afterEach(() => vi.unstubAllGlobals());

describe("the audit log's entries about a sketch deleted since", () => {
  it("say “since deleted” with no link; the delete itself and a kept sketch read as before", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => new Response(JSON.stringify({ events, nextBefore: null }), { status: 200, headers: { "content-type": "application/json" } })),
    );
    render(
      <QueryClientProvider client={new QueryClient()}>
        <AuditLog workspaceId="w1" />
      </QueryClientProvider>,
    );
    const kept = await screen.findByRole("link", { name: "Open “Pump skid” v2" });
    expect(kept.getAttribute("href")).toBe("/workspaces/w1/sketches/s9/versions/2");
    expect(screen.getAllByRole("link")).toHaveLength(1);

    const row = (text: string) => screen.getByText((_, el) => el?.tagName === "TD" && (el.textContent ?? "").includes(text));
    expect(within(row("saved v2 of \"Old bend\"")).getByTestId("audit-since-deleted").textContent).toBe("since deleted");
    expect(within(row("created the sketch \"Old bend\"")).getByTestId("audit-since-deleted").textContent).toBe("since deleted");
    // the deletion needs no mark: it says so itself
    expect(within(row("deleted the sketch \"Old bend\"")).queryByTestId("audit-since-deleted")).toBeNull();
    expect(screen.getAllByTestId("audit-since-deleted")).toHaveLength(2);
  });
});
