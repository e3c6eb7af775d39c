// The fork dialog (also the way out of a save conflict) says when it is still fetching the
// workspaces to fork into, and when they could not be fetched offers to ask again, instead of an
// empty, disabled list with no word about why.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { fireEvent, render, screen } from "@testing-library/react";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { ForkDialog } from "@/components/sketches/ForkDialog";
import { withModalDialogs } from "./dialog-support";

const show = () =>
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <ForkDialog open onClose={() => {}} sketchId="s1" sketchTitle="Skid at pier 7" version={2} onForked={() => {}} />
    </QueryClientProvider>,
  );

const json = (body: unknown, status = 200) => new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

afterEach(() => vi.unstubAllGlobals());

beforeAll(() => {
  withModalDialogs();
});

describe("the fork dialog's list of workspaces", () => {
  it("says it is loading while the list is on its way", () => {
    vi.stubGlobal("fetch", vi.fn(() => new Promise<Response>(() => {})));
    show();
    const select = screen.getByLabelText("Into the workspace") as HTMLSelectElement;
    expect(select.disabled).toBe(true);
    expect(select.textContent).toBe("Loading your workspaces…");
    expect(screen.getByRole("button", { name: "Fork" })).toBeDisabled();
  });

  it("when it cannot be fetched: says so, keeps the title typed, and fetches again on request", async () => {
    const fetch = vi
      .fn()
      .mockResolvedValueOnce(json({ error: { code: "internal", message: "Something went wrong on our side." } }, 500))
      .mockResolvedValueOnce(json({ workspaces: [{ id: "w1", name: "Riverside", role: "editor", personal: false }] }));
    vi.stubGlobal("fetch", fetch);
    show();
    fireEvent.change(screen.getByLabelText("Title of the fork"), { target: { value: "My skid" } });
    expect(await screen.findByText("Your workspaces could not be loaded")).toBeInTheDocument();
    fireEvent.click(screen.getByRole("button", { name: "Try again" }));
    const select = (await screen.findByRole("option", { name: "Riverside" })).closest("select")!;
    expect(select.value).toBe("w1");
    expect((screen.getByLabelText("Title of the fork") as HTMLInputElement).value).toBe("My skid");
    expect(screen.getByRole("button", { name: "Fork" })).toBeEnabled();
  });
});
