// A switch of radio buttons is one Tab stop, the arrow keys move the choice (WAI-ARIA Authoring
// Practices, radio group pattern).
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { describe, expect, it } from "vitest";
import { Segmented } from "@/components/shell/controls";

function Units() {
  const [v, setV] = useState<"SI" | "US">("SI");
  return (
    <>
      <button type="button">before</button>
      <Segmented label="Units" value={v} onChange={setV} options={[{ value: "SI", label: "SI" }, { value: "US", label: "US" }]} />
      <button type="button">after</button>
    </>
  );
}

describe("radio switches", () => {
  it("take one Tab stop, the checked option, and move with the arrow keys", async () => {
    const user = userEvent.setup();
    render(<Units />);
    await user.click(screen.getByRole("button", { name: "before" }));
    await user.tab();
    expect(screen.getByRole("radio", { name: "SI" })).toHaveFocus();
    await user.keyboard("{ArrowRight}");
    expect(screen.getByRole("radio", { name: "US" })).toHaveFocus();
    expect(screen.getByRole("radio", { name: "US" })).toBeChecked();
    await user.tab();
    expect(screen.getByRole("button", { name: "after" })).toHaveFocus();
    await user.tab({ shift: true });
    expect(screen.getByRole("radio", { name: "US" })).toHaveFocus();
    await user.keyboard("{ArrowRight}");
    expect(screen.getByRole("radio", { name: "SI" })).toBeChecked();
  });
});
