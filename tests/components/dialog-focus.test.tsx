// A dialog gives the focus back to the control that opened it when it closes — also when the page
// takes it away instead of closing it (the save and fork dialogs are rendered only while needed),
// so the keyboard carries on where it was and never falls back to the page's start.
import { act, render, screen } from "@testing-library/react";
import { useState } from "react";
import { beforeAll, describe, expect, it } from "vitest";
import { Dialog } from "@/components/versions/Dialog";
import { withModalDialogs } from "./dialog-support";

beforeAll(() => {
  withModalDialogs();
});

function Page({ mountedOnlyWhileOpen }: { mountedOnlyWhileOpen: boolean }) {
  const [open, setOpen] = useState(false);
  const dialog = (
    <Dialog open={open} title="Save a version" onClose={() => setOpen(false)}>
      <button type="button" onClick={() => setOpen(false)}>
        Cancel
      </button>
    </Dialog>
  );
  return (
    <>
      <button type="button" onClick={() => setOpen(true)}>
        Save version
      </button>
      {mountedOnlyWhileOpen ? (open ? dialog : null) : dialog}
    </>
  );
}

describe("a dialog's focus", () => {
  for (const mountedOnlyWhileOpen of [false, true])
    it(`returns to its opener on closing${mountedOnlyWhileOpen ? " when the page takes the dialog away" : ""}`, () => {
      render(<Page mountedOnlyWhileOpen={mountedOnlyWhileOpen} />);
      const opener = screen.getByRole("button", { name: "Save version" });
      opener.focus();
      act(() => opener.click());
      const cancel = screen.getByRole("button", { name: "Cancel" });
      cancel.focus();
      expect(document.activeElement).toBe(cancel);
      act(() => cancel.click());
      expect(document.activeElement).toBe(opener);
    });
});
