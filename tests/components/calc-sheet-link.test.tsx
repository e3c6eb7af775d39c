// The calc sheet link: a plain link (no `download`: without JavaScript an error page shows rather
// than being saved as a PDF); with JavaScript the sheet is fetched first, a failure is said beside
// the link with what the server said and its status, and only a PDF is saved, under the route's name.
import { render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { attachmentName, calcSheetFailure, CalcSheetLink } from "@/components/versions/CalcSheetLink";
import { brokenOffReply } from "../support/broken-off";

const HREF = "/api/sketches/sk1/versions/3/calc-sheet?units=SI";

afterEach(() => vi.unstubAllGlobals());

function link() {
  render(
    <div>
      <CalcSheetLink href={HREF} className="chip" testId="sheet">
        Calc sheet (PDF)
      </CalcSheetLink>
    </div>,
  );
  return screen.getByRole("link", { name: "Calc sheet (PDF)" });
}

describe("calc sheet link", () => {
  it("is a plain link to the route, without download", () => {
    const a = link();
    expect(a.getAttribute("href")).toBe(HREF);
    expect(a.hasAttribute("download")).toBe(false);
  });

  it("says a 503 in words and saves nothing", async () => {
    const body = JSON.stringify({ error: { code: "unavailable", message: "The database is out of reach" } });
    vi.stubGlobal("fetch", vi.fn(async () => new Response(body, { status: 503, headers: { "content-type": "application/json" } })));
    const created = vi.fn(() => "blob:x");
    vi.stubGlobal("URL", Object.assign(URL, { createObjectURL: created, revokeObjectURL: vi.fn() }));
    await userEvent.click(link());
    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toBe("The calc sheet could not be made (the server answered 503): The database is out of reach. Try again in a moment.");
    expect(created).not.toHaveBeenCalled();
  });

  it("says a 404 with the server's words, and a reply that is not a PDF is not saved", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => new Response(JSON.stringify({ error: { code: "not_found", message: "This sketch has no version 3." } }), { status: 404 })));
    await userEvent.click(link());
    expect((await screen.findByRole("alert")).textContent).toBe("The calc sheet could not be made (the server answered 404): This sketch has no version 3.");
  });

  it("saves a PDF under the name the route gives", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => new Response("%PDF-1.7", { status: 200, headers: { "content-type": "application/pdf", "content-disposition": 'attachment; filename="Pump-set-v3-calc-sheet-SI.pdf"' } })),
    );
    vi.stubGlobal("URL", Object.assign(URL, { createObjectURL: vi.fn(() => "blob:sheet"), revokeObjectURL: vi.fn() }));
    const clicks: { href: string; download: string }[] = [];
    const click = vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) {
      clicks.push({ href: this.getAttribute("href")!, download: this.download });
    });
    await userEvent.click(link());
    await waitFor(() => expect(clicks).toEqual([{ href: "blob:sheet", download: "Pump-set-v3-calc-sheet-SI.pdf" }]));
    expect(screen.queryByRole("alert")).toBeNull();
    click.mockRestore();
  });

  it("saves nothing when the PDF breaks off part-way, and says it broke off rather than that the app could not be reached", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => brokenOffReply("%PDF-1.7\n1 0 obj", { "content-type": "application/pdf", "content-disposition": 'attachment; filename="Pump-set-v3-calc-sheet-SI.pdf"' })),
    );
    const created = vi.fn(() => "blob:part");
    vi.stubGlobal("URL", Object.assign(URL, { createObjectURL: created, revokeObjectURL: vi.fn() }));
    const click = vi.spyOn(HTMLAnchorElement.prototype, "click");
    const a = link();
    await userEvent.click(a);
    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toBe("The calc sheet was not saved: its download broke off part-way, and a part of the PDF would not open. Try again.");
    expect(alert.textContent).not.toMatch(/could not be reached/);
    expect(created).not.toHaveBeenCalled();
    expect(click).not.toHaveBeenCalled();
    // the link is back to itself, ready to be asked again
    expect(a.getAttribute("aria-busy")).toBeNull();
    click.mockRestore();
  });

  it("says a failure where the editor asks (onError) when given one", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => Promise.reject(new TypeError("Failed to fetch"))));
    const said: string[] = [];
    render(
      <CalcSheetLink href={HREF} className="chip" onError={(m) => said.push(m)}>
        Calc sheet (PDF)
      </CalcSheetLink>,
    );
    await userEvent.click(screen.getByRole("link", { name: "Calc sheet (PDF)" }));
    await waitFor(() => expect(said).toEqual(["The calc sheet could not be fetched: the app could not be reached. Check the connection and try again."]));
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("words the other failures", () => {
    expect(calcSheetFailure(0, "")).toMatch(/could not be reached/);
    expect(calcSheetFailure(0, "", true)).toMatch(/^The calc sheet was not saved: its download broke off part-way/);
    expect(calcSheetFailure(401, "")).toMatch(/your session has ended/);
    expect(calcSheetFailure(500, "<html>")).toBe("The calc sheet could not be made (the server answered 500): the server could not make it. Try again in a moment.");
    expect(attachmentName(null, "calc-sheet.pdf")).toBe("calc-sheet.pdf");
  });
});
