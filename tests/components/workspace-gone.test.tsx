// An open page whose workspace was deleted: the first request that learns it (a 404 with
// error.workspaceDeleted) puts a notice over the page, which stays as it is; other errors do not.
import { useQuery } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { Providers } from "@/components/shell/Providers";
import { ApiError } from "@/lib/api-client";

function Reader({ id, fail }: { id: string; fail: () => Promise<never> }) {
  const q = useQuery({ queryKey: ["probe", id], queryFn: fail });
  return <p>{q.isError ? "the list could not be loaded" : "loading"}</p>;
}

describe("a page whose workspace was deleted", () => {
  it("says so over the page when a request is refused for that reason, keeping the page", async () => {
    const gone = { workspaceId: "w1", name: "Pump house 7", deletedBy: "Olivia Closer", deletedAt: "2026-12-05T10:04:00.000Z" };
    const fail = () => Promise.reject(new ApiError(404, "not_found", "The workspace … was deleted", [], { code: "not_found", workspaceDeleted: gone }));
    render(
      <Providers>
        <Reader id="one" fail={fail} />
      </Providers>,
    );
    const banner = await screen.findByTestId("workspace-gone");
    expect(banner.getAttribute("role")).toBe("alert");
    expect(banner.textContent).toContain("The workspace “Pump house 7” was deleted by Olivia Closer on 5 Dec 2026, 10:04 UTC");
    expect(banner.textContent).toContain("Nothing here can be saved any more");
    expect(screen.getByRole("link", { name: "Your workspaces" }).getAttribute("href")).toBe("/workspaces");
    expect(await screen.findByText("the list could not be loaded")).toBeTruthy();
  });

  it("stays away for any other refusal", async () => {
    const fail = () => Promise.reject(new ApiError(404, "not_found", "No such workspace, or you are not a member of it."));
    render(
      <Providers>
        <Reader id="two" fail={fail} />
      </Providers>,
    );
    expect(await screen.findByText("the list could not be loaded")).toBeTruthy();
    expect(screen.queryByTestId("workspace-gone")).toBeNull();
  });
});
