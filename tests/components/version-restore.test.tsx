// "Restore" on the version history: offered on every version but the latest to those who may save,
// it asks before saving, says what will happen (a new version on top, nothing deleted), sends the
// latest the page knows as the base, and says a colleague's newer save in words.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { RestoreDialog, type Restored } from "@/components/versions/RestoreDialog";
import { VersionHistory, type VersionItem } from "@/components/versions/VersionHistory";
import { versionItem as item } from "./version-items";
import { withModalDialogs } from "./dialog-support";
import { jsonResponse } from "./editor-helpers";

beforeAll(() => withModalDialogs());
afterEach(() => vi.unstubAllGlobals());

const VERSIONS = [item(3, "smaller block"), item(2, "thicker wall"), item(1, "anchor block as quoted")];

function Page({ canSave, onRestored }: { canSave: boolean; onRestored?: (m: Restored) => void }) {
  const [restoring, setRestoring] = useState<VersionItem | null>(null);
  return (
    <>
      <VersionHistory sketchId="sk1" latest={3} canFork={false} onFork={() => {}} onRestore={canSave ? setRestoring : undefined} />
      {restoring ? <RestoreDialog sketchId="sk1" sketchTitle="Bend DN150" version={restoring} latest={3} onClose={() => setRestoring(null)} onRestored={(m) => onRestored?.(m)} /> : null}
    </>
  );
}

function renderPage(props: Parameters<typeof Page>[0]) {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={qc}>
      <Page {...props} />
    </QueryClientProvider>,
  );
}

describe("restoring a version from the history", () => {
  it("offers Restore on the older versions only, and not to a reader", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => jsonResponse({ versions: VERSIONS })));
    const { unmount } = renderPage({ canSave: true });
    await screen.findByTestId("version-row-1");
    expect(within(screen.getByTestId("version-row-3")).queryByRole("button", { name: /^Restore version/ })).toBeNull();
    expect(within(screen.getByTestId("version-row-1")).getByRole("button", { name: "Restore version 1" })).toBeTruthy();
    unmount();
    renderPage({ canSave: false });
    await screen.findByTestId("version-row-1");
    expect(screen.queryByRole("button", { name: /^Restore version/ })).toBeNull();
  });

  it("says what happens and saves on top of the latest with the message given", async () => {
    const calls: { path: string; body: unknown }[] = [];
    vi.stubGlobal(
      "fetch",
      vi.fn(async (path: string, init?: RequestInit) => {
        if (init?.method === "POST") {
          calls.push({ path, body: JSON.parse(String(init.body)) });
          return jsonResponse({ version: { number: 4, restoredFrom: 1, message: "quote back" } }, 201);
        }
        return jsonResponse({ versions: VERSIONS });
      }),
    );
    const restored = vi.fn();
    renderPage({ canSave: true, onRestored: restored });
    await userEvent.click(await screen.findByRole("button", { name: "Restore version 1" }));
    const dialog = screen.getByTestId("restore-dialog");
    expect(within(dialog).getByTestId("restore-what").textContent).toBe(
      "Its drawing is saved as a new version, v4, on top of v3. v2 to v3 stay in the history: nothing is deleted. The sketch keeps its name, “Bend DN150”. The new version starts its own sign-off.",
    );
    expect(within(dialog).getByText("Left empty, the message is “Restored v1 — anchor block as quoted”.")).toBeTruthy();
    await userEvent.type(within(dialog).getByLabelText("Why (the new version's message)"), "quote back");
    await userEvent.click(within(dialog).getByRole("button", { name: "Save as v4" }));
    expect(calls).toEqual([{ path: "/api/sketches/sk1/versions/1/restore", body: { baseVersion: 3, message: "quote back" } }]);
    expect(restored).toHaveBeenCalledWith({ number: 4, restoredFrom: 1, message: "quote back" });
  });

  it("says a colleague's newer save in words and keeps the message typed", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async (_path: string, init?: RequestInit) =>
        init?.method === "POST"
          ? jsonResponse({ error: { code: "version_conflict", message: "Chen Checker saved version 4 since you opened version 3. Nothing was overwritten.", latest: { number: 4 } } }, 409)
          : jsonResponse({ versions: VERSIONS }),
      ),
    );
    renderPage({ canSave: true });
    await userEvent.click(await screen.findByRole("button", { name: "Restore version 2" }));
    const dialog = screen.getByTestId("restore-dialog");
    await userEvent.type(within(dialog).getByLabelText("Why (the new version's message)"), "wall back");
    await userEvent.click(within(dialog).getByRole("button", { name: "Save as v4" }));
    const alert = await within(dialog).findByRole("alert");
    expect(alert.textContent).toContain("Someone saved a newer version");
    expect(alert.textContent).toContain("Chen Checker saved version 4 since you opened version 3. Nothing was overwritten. The history is up to date now: ask again to restore on top of it.");
    expect(within(dialog).getByLabelText("Why (the new version's message)")).toHaveValue("wall back");
  });
});
