// The browser's tab carries the sketch's title, so several sketches open at once are told apart.
import { screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { beam, renderEditor } from "./editor-helpers";

describe("the editor's tab", () => {
  it("the browser's tab is named after the sketch, and follows a new title", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    expect(document.title).toBe("Beam on a pin and a contact · Counterpoise");
    const field = screen.getByLabelText("Title");
    await user.clear(field);
    await user.type(field, "Skid on the quay");
    await waitFor(() => expect(document.title).toBe("Skid on the quay · Counterpoise"));
  });
});
