// "Waiting for you" on the dashboard: each version to check, approve or revise, linked to its
// review page; one with a newer version saved since says the step is of that version only.
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ReviewQueue } from "@/components/review/ReviewQueue";
import type { QueueItem } from "@/lib/review/queue";

const item = (over: Partial<QueueItem>): QueueItem => ({
  sketchId: "s1",
  sketchTitle: "Bend D",
  number: 1,
  state: "submitted",
  authorName: "Eddie Editor",
  since: "2026-12-01T09:00:00Z",
  action: "check",
  newer: null,
  ...over,
});

describe("the review queue", () => {
  it("says when a newer version was saved since, for a check and for an approval, and not otherwise", () => {
    render(
      <ReviewQueue
        workspaceId="w1"
        items={[
          item({ number: 1, newer: 3 }),
          item({ number: 3 }),
          item({ sketchId: "s2", sketchTitle: "Skid", number: 2, state: "checked", action: "approve", newer: 4 }),
        ]}
      />,
    );
    const rows = within(screen.getByTestId("review-queue")).getAllByRole("listitem");
    expect(rows.map((r) => within(r).getByRole("link").textContent)).toEqual(["Bend D v1", "Bend D v3", "Skid v2"]);
    expect(within(rows[0]).getByRole("link").getAttribute("href")).toBe("/workspaces/w1/sketches/s1/versions/1");
    expect(within(rows[0]).getByTestId("queue-newer").textContent).toBe("v3 was saved since: a check here is of v1 only");
    expect(within(rows[1]).queryByTestId("queue-newer")).toBeNull();
    expect(within(rows[2]).getByTestId("queue-newer").textContent).toBe("v4 was saved since: an approval here is of v2 only");
  });

  it("shows nothing when nothing waits", () => {
    const { container } = render(<ReviewQueue workspaceId="w1" items={[]} />);
    expect(container.textContent).toBe("");
  });
});
