// Errors in the editor's words wherever they are shown: a body labelled "Body 1" is not "Body
// Body 1", an outline that crosses itself is the outline (not a corner), a server's refusal of a
// saved sketch names the port rather than "document.ports[0].area", the import dialog's path and
// message are two words apart, and the File menu carries the links the page adds to it.
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { describe, expect, it } from "vitest";
import { scratchPersistence } from "@/canvas/persistence";
import { importSketchText } from "@/canvas/files";
import { Editor } from "@/components/editor/Editor";
import { useFileMenuLink } from "@/components/editor/fileMenuLinks";
import { ImportErrorDialog } from "@/components/editor/ImportErrorDialog";
import { errorInWords, errorPlace, inputErrorsInWords, refusedInWords } from "@/components/results/errorPlace";
import { parseSketch } from "@/solver";
import type { SketchFile } from "@/solver/schema";
import { beam, memoryStorage } from "./editor-helpers";

/** The beam with its body labelled "Body 1" and an inlet p1 on its left end (demo data). */
function withInlet(area: number | string = 0.01): SketchFile {
  const s = beam("F1");
  return {
    ...s,
    bodies: [{ ...s.bodies[0], label: "Body 1" }],
    ports: [{ id: "p1", body: "b1", kind: "inlet", at: [0, 0.25], angle: 0, massFlow: 10, velocity: 5, area }],
  } as SketchFile;
}

describe("the kind is not said twice", () => {
  it("a body labelled \"Body 1\" is \"Body 1\"; an outline that crosses itself is its outline", () => {
    const s = withInlet();
    const crossed = { ...s, bodies: [{ ...s.bodies[0], outline: [[0, 0], [1, 1], [1, 0], [0, 1]] }] } as SketchFile;
    const parsed = parseSketch(crossed);
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    const e = parsed.errors.find((x) => x.path === "bodies[0].outline")!;
    expect(errorInWords(crossed, e)).toMatch(/^Body 1 — outline: crosses itself: its edge from corner 1 to 2 crosses its edge from corner 3 to 4/);
    expect(errorPlace(s, "bodies[0].outline[2]")).toBe("Body 1 — outline corner 3");
    expect(errorPlace(s, "bodies[0].outline[2][0]")).toBe("Body 1 — outline corner 3 x");
    // a label that does not start with the kind keeps it
    expect(errorPlace(beam("F1"), "bodies[0].outline[2][1]")).toBe("Body Beam — outline corner 3 y");
    expect(errorPlace(s, "ports[0].area")).toBe("Inlet p1 — area");
  });
});

describe("a refused save, in words", () => {
  it("names the element and the field of each issue of the document; other fields keep their name", () => {
    const s = withInlet(-1);
    expect(
      refusedInWords(s, [
        { path: "document.ports[0].area", message: "must be more than zero" },
        { path: "document", message: "Send the sketch file (format counterpoise.sketch)." },
        { path: "message", message: "is too long" },
      ]),
    ).toEqual(["Inlet p1 — area: must be more than zero", "Send the sketch file (format counterpoise.sketch).", "message: is too long"]);
  });

  it("the editor's own input errors, before anything is sent: the count and the first in words", () => {
    const s = withInlet(-1);
    const parsed = parseSketch(s);
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(inputErrorsInWords(s, parsed.errors)).toEqual({ count: 1, words: "an input error: Inlet p1 — area: must be more than zero" });
    expect(inputErrorsInWords(s, [...parsed.errors, { path: "loads[0].magnitude", message: 'unknown name "span"' }])?.words).toBe(
      "2 input errors, the first: Inlet p1 — area: must be more than zero",
    );
    expect(inputErrorsInWords(s, [])).toBeNull();
    // a solve that failed is not the sketch's input
    expect(inputErrorsInWords(s, [{ path: "", message: "the solve failed: out of memory" }])).toBeNull();
  });
});

describe("the import dialog", () => {
  it("keeps a space between the path and the message", () => {
    const out = importSketchText(JSON.stringify({ ...beam(), supports: [beam().supports[0], { id: "s2", body: "b1", kind: "roller", at: [4, 0] }] }));
    expect(out.ok).toBe(false);
    if (out.ok) return;
    render(<ImportErrorDialog problem={{ file: "bad.json", errors: out.errors }} onClose={() => {}} />);
    const text = screen.getByTestId("import-error").textContent ?? "";
    expect(text).toMatch(/supports\[1\]\.angle \S/);
    expect(text).not.toMatch(/supports\[1\]\.angle[a-z]/);
  });
});

describe("links the page adds to the File menu", () => {
  function Slot() {
    const [on, setOn] = useState(true);
    useFileMenuLink("file.calcSheet", on ? { label: "Calc sheet (PDF)", href: "/api/sketches/sk1/versions/2/calc-sheet?units=SI" } : null);
    return (
      <button type="button" onClick={() => setOn(false)}>
        drop the link
      </button>
    );
  }

  it("is a link in the File menu while the slot offers it, and gone when it stops", async () => {
    const user = userEvent.setup();
    const { storage } = memoryStorage(beam());
    render(<Editor persistence={scratchPersistence(storage)} toolbarExtra={<Slot />} />);
    await screen.findByRole("heading", { name: "Add" });
    await user.click(screen.getByTestId("menu-file"));
    const item = within(screen.getByRole("menu", { name: "File" })).getByRole("menuitem", { name: "Calc sheet (PDF)" });
    expect(item.tagName).toBe("A");
    expect(item.getAttribute("href")).toBe("/api/sketches/sk1/versions/2/calc-sheet?units=SI");
    await user.click(screen.getByTestId("menu-file"));
    await user.click(screen.getByRole("button", { name: "drop the link" }));
    await user.click(screen.getByTestId("menu-file"));
    expect(within(screen.getByRole("menu", { name: "File" })).queryByRole("menuitem", { name: "Calc sheet (PDF)" })).toBeNull();
  });

  it("the scratch sketch's File menu has none", async () => {
    const user = userEvent.setup();
    const { storage } = memoryStorage(beam());
    render(<Editor persistence={scratchPersistence(storage)} />);
    await screen.findByRole("heading", { name: "Add" });
    await user.click(screen.getByTestId("menu-file"));
    expect(within(screen.getByRole("menu", { name: "File" })).queryByRole("menuitem", { name: /Calc sheet/ })).toBeNull();
  });
});
