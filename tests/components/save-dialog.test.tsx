// The save dialog on the newest version says which version the save makes; opened on an older
// one, it says up front that a version only goes on top of the newest, and what happens next.
import { render, screen } from "@testing-library/react";
import { beforeAll, describe, expect, it } from "vitest";
import { SaveDialog } from "@/components/versions/editor/SaveDialogs";
import { withModalDialogs } from "./dialog-support";

beforeAll(() => {
  withModalDialogs();
});

const noop = () => {};

describe("the save dialog", () => {
  it("on the newest version: saving makes the next one", () => {
    render(<SaveDialog open base={3} latest={3} title="Trailer" busy={false} error={null} onSave={noop} onCancel={noop} />);
    expect(screen.getByRole("heading").textContent).toBe("Save version 4 of “Trailer”");
    expect(screen.queryByTestId("save-older")).toBeNull();
    expect(screen.getByRole("button", { name: "Save v4" })).toBeInTheDocument();
  });

  it("on an older version: says v3 is newer and what saving will ask", () => {
    render(<SaveDialog open base={1} latest={3} title="Trailer" busy={false} error={null} onSave={noop} onCancel={noop} />);
    expect(screen.getByRole("heading").textContent).toBe("Save your changes to v1 of “Trailer”");
    expect(screen.getByTestId("save-older").textContent).toBe(
      "You opened v1, and v3 is newer: a version goes on top of the newest only. Saving asks you next whether to fork a new sketch from your changes or to bring them onto v3.",
    );
    // no "Save v2": v2 exists, and the save makes no version until the next question is answered
    expect(screen.queryByRole("button", { name: /^Save v\d+$/ })).toBeNull();
    expect(screen.getByRole("button", { name: "Choose how to save…" })).toBeInTheDocument();
  });
});
