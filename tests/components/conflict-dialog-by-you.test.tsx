// The conflict dialog when the newer version is the user's own save (`byYou`, from another tab or
// window, or a script): it says so, not the user's own name as if a colleague had saved.
import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ConflictDialog } from "@/components/versions/editor/SaveDialogs";
import { withModalDialogs } from "./dialog-support";

withModalDialogs();

const show = (latest: { byYou?: boolean; authorName: string | null }) =>
  render(
    <ConflictDialog
      open
      base={2}
      latest={{ number: 3, message: "moved the anchor 0.3 m east", createdAt: "2026-12-05T13:38:00.000Z", ...latest }}
      onFork={() => undefined}
      onStay={() => undefined}
      compareHref="/workspaces/w1/sketches/s1/compare?from=3&to=draft&draft=t1&open=1"
      onCompare={() => undefined}
      onReload={() => undefined}
      onKeepEditing={() => undefined}
    />,
  );

describe("the conflict dialog", () => {
  it("says a newer version was the user's own save from another tab or window", () => {
    show({ byYou: true, authorName: "Olivia Owner" });
    const dialog = screen.getByTestId("conflict-dialog");
    expect(screen.getByRole("heading", { name: "You saved a newer version elsewhere" })).toBeTruthy();
    expect(dialog.textContent).toContain("You saved v3 on 5 Dec 2026, 13:38 UTC in another tab or window (or a script did, signed in as you), after v2 was opened here: moved the anchor 0.3 m east.");
    expect(dialog.textContent).not.toContain("Olivia Owner");
  });

  it("names a colleague who saved, as before", () => {
    show({ byYou: false, authorName: "Eddie Editor" });
    const dialog = screen.getByTestId("conflict-dialog");
    expect(screen.getByRole("heading", { name: "Someone saved a newer version" })).toBeTruthy();
    expect(dialog.textContent).toContain("Eddie Editor saved v3 on 5 Dec 2026, 13:38 UTC, after you opened v2: moved the anchor 0.3 m east.");
  });
});
