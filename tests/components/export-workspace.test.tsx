// The owners' "Download all sketches (JSON)" on the workspace page: the file is fetched first and
// saved under the name the server gives; a refusal or an unreachable app is said in words beside
// it and nothing is saved; with no sketches there is nothing to download.
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { ExportWorkspace, exportFailure } from "@/components/workspaces/ExportWorkspace";
import { brokenOffReply } from "../support/broken-off";

const saved: string[] = [];
beforeEach(() => {
  saved.length = 0;
  vi.stubGlobal("URL", Object.assign(URL, { createObjectURL: () => "blob:export", revokeObjectURL: () => {} }));
  vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) {
    if (this.download) saved.push(this.download);
  });
});
afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

describe("downloading a workspace's sketches", () => {
  it("saves the file under the server's name and says so", async () => {
    const fetched: string[] = [];
    vi.stubGlobal(
      "fetch",
      vi.fn(async (url: string) => {
        fetched.push(url);
        return new Response(JSON.stringify({ format: "counterpoise.workspace-export", sketches: [] }), {
          status: 200,
          headers: { "content-type": "application/json", "content-disposition": 'attachment; filename="bay-4-sketches-2026-12-05.json"' },
        });
      }),
    );
    render(<ExportWorkspace workspaceId="w1" sketches={7} />);
    expect(screen.getByText("All 7 sketches, the latest version of each, in one JSON file.", { exact: false })).toBeInTheDocument();
    const link = screen.getByRole("link", { name: "Download all sketches (JSON)" });
    expect(link).toHaveAttribute("href", "/api/workspaces/w1/export");
    await userEvent.click(link);
    expect(await screen.findByRole("status")).toHaveTextContent("Downloaded bay-4-sketches-2026-12-05.json.");
    expect(fetched).toEqual(["/api/workspaces/w1/export"]);
    expect(saved).toEqual(["bay-4-sketches-2026-12-05.json"]);
  });

  it("says a refusal in the server's words and saves nothing", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => new Response(JSON.stringify({ error: { code: "forbidden", message: "As editor you may not export the workspace's sketches" } }), { status: 403, headers: { "content-type": "application/json" } })),
    );
    render(<ExportWorkspace workspaceId="w1" sketches={1} />);
    await userEvent.click(screen.getByRole("link", { name: "Download all sketches (JSON)" }));
    expect(await screen.findByRole("alert")).toHaveTextContent("Nothing was downloaded (the server answered 403): As editor you may not export the workspace's sketches.");
    expect(saved).toEqual([]);
  });

  it("says when the app cannot be reached, or the session ended", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => Promise.reject(new TypeError("Failed to fetch"))));
    render(<ExportWorkspace workspaceId="w1" sketches={1} />);
    await userEvent.click(screen.getByRole("link", { name: "Download all sketches (JSON)" }));
    expect(await screen.findByRole("alert")).toHaveTextContent("Nothing was downloaded: the app could not be reached. Check the connection and try again.");
    expect(exportFailure(401, "")).toBe("Nothing was downloaded: your session has ended. Sign in again, then ask again.");
    expect(exportFailure(503, "")).toBe("Nothing was downloaded (the server answered 503): the export could not be made. Try again in a moment.");
  });

  it("saves nothing when the streamed file breaks off part-way, and says so", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => brokenOffReply('{"format":"counterpoise.workspace-export","sketches":[', { "content-type": "application/json", "content-disposition": 'attachment; filename="bay-4-sketches-2026-12-05.json"' })),
    );
    render(<ExportWorkspace workspaceId="w1" sketches={40} />);
    await userEvent.click(screen.getByRole("link", { name: "Download all sketches (JSON)" }));
    expect(await screen.findByRole("alert")).toHaveTextContent("Nothing was saved: the download broke off part-way, and a part of the file would not open. Try again.");
    expect(saved).toEqual([]);
    expect(screen.queryByRole("status")).toBeNull();
  });

  it("offers nothing to download in a workspace without sketches", () => {
    render(<ExportWorkspace workspaceId="w1" sketches={0} />);
    expect(screen.getByText("There are no sketches to export yet.")).toBeInTheDocument();
    expect(screen.queryByRole("link")).toBeNull();
  });
});
