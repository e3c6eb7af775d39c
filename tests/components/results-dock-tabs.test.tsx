// The results dock's views are one row of tabs for the keyboard (WAI-ARIA Authoring Practices,
// "Tabs"): one Tab stop, the arrows, Home and End move between them, and each panel is labelled by
// its tab. The dock opens a tab on Enter or Space, not as the focus passes (opening Cases or Sweep
// grows the dock and starts its panel); the shared hook also opens on the arrow keys.
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { useTabList } from "@/components/shell/Tabs";
import { beam, mountResultsDock } from "./editor-helpers";

beforeEach(() => window.localStorage.removeItem("counterpoise:results-height"));
afterEach(cleanup);

const selected = () => screen.getAllByRole("tab").filter((t) => t.getAttribute("aria-selected") === "true").map((t) => t.textContent);

describe("the results dock's tabs from the keyboard", () => {
  it("takes one Tab stop, the selected tab, and its panel is labelled by it", async () => {
    const user = userEvent.setup();
    mountResultsDock(beam());
    const tabs = screen.getAllByRole("tab");
    expect(tabs.map((t) => t.textContent)).toEqual(["Reactions", "Hand check", "Cases", "Sweep"]);
    expect(tabs.map((t) => t.tabIndex)).toEqual([0, -1, -1, -1]);
    // Tab from the resizer down through the dock to its panel: the row of tabs is one stop, the selected tab
    screen.getByRole("separator", { name: /Resize the results/ }).focus();
    const visited: Element[] = [];
    for (let i = 0; i < 12 && document.activeElement?.getAttribute("role") !== "tabpanel"; i++) {
      await user.tab();
      if (document.activeElement) visited.push(document.activeElement);
    }
    expect(visited.filter((el) => el.getAttribute("role") === "tab")).toEqual([screen.getByRole("tab", { name: "Reactions" })]);
    const panel = screen.getByRole("tabpanel", { name: "Reactions" });
    expect(screen.getByRole("tab", { name: "Reactions" })).toHaveAttribute("aria-controls", panel.id);
  });

  it("moves the focus with the arrows (wrapping), Home and End, and opens the focused tab on Enter or Space", async () => {
    const user = userEvent.setup();
    mountResultsDock(beam());
    screen.getByRole("tab", { name: "Reactions" }).focus();
    await user.keyboard("{ArrowRight}");
    expect(document.activeElement).toBe(screen.getByRole("tab", { name: "Hand check" }));
    // passing over a tab opens nothing
    expect(selected()).toEqual(["Reactions"]);
    await user.keyboard("{Enter}");
    expect(selected()).toEqual(["Hand check"]);
    expect(screen.getByRole("tabpanel", { name: "Hand check" })).toBeInTheDocument();
    expect(screen.getByRole("tab", { name: "Hand check" }).tabIndex).toBe(0);
    expect(screen.getByRole("tab", { name: "Reactions" }).tabIndex).toBe(-1);
    await user.keyboard("{End}");
    expect(document.activeElement).toBe(screen.getByRole("tab", { name: "Sweep" }));
    await user.keyboard("{ArrowRight}");
    expect(document.activeElement).toBe(screen.getByRole("tab", { name: "Reactions" }));
    await user.keyboard("{ArrowLeft}");
    expect(document.activeElement).toBe(screen.getByRole("tab", { name: "Sweep" }));
    await user.keyboard("{Home}");
    expect(document.activeElement).toBe(screen.getByRole("tab", { name: "Reactions" }));
    await user.keyboard("{ArrowLeft}{ArrowLeft} ");
    expect(selected()).toEqual(["Cases"]);
    expect(screen.getByRole("tabpanel", { name: "Cases" })).toBeInTheDocument();
  });
});

function Row() {
  const [tab, setTab] = useState<"a" | "b" | "c">("a");
  const list = useTabList({ tabs: ["a", "b", "c"] as const, selected: tab, onSelect: setTab });
  return (
    <>
      <button type="button">before</button>
      <div {...list.listProps("Letters")}>
        {(["a", "b", "c"] as const).map((id) => (
          <button key={id} {...list.tabProps(id)}>
            {id.toUpperCase()}
          </button>
        ))}
      </div>
      <div {...list.panelProps()}>Panel {tab}</div>
    </>
  );
}

describe("useTabList, automatic activation", () => {
  it("selects as the arrows, Home and End move the focus, and labels the panel by its tab", async () => {
    const user = userEvent.setup();
    render(<Row />);
    expect(screen.getByRole("tablist", { name: "Letters" })).toBeInTheDocument();
    await user.tab();
    await user.tab();
    expect(document.activeElement).toBe(screen.getByRole("tab", { name: "A" }));
    await user.keyboard("{ArrowRight}");
    expect(document.activeElement).toBe(screen.getByRole("tab", { name: "B" }));
    expect(selected()).toEqual(["B"]);
    expect(screen.getByRole("tabpanel", { name: "B" })).toHaveTextContent("Panel b");
    await user.keyboard("{End}");
    expect(selected()).toEqual(["C"]);
    await user.keyboard("{ArrowRight}");
    expect(selected()).toEqual(["A"]);
    expect(document.activeElement).toBe(screen.getByRole("tab", { name: "A" }));
    await user.keyboard("{ArrowLeft}");
    expect(selected()).toEqual(["C"]);
    await user.keyboard("{Home}");
    expect(selected()).toEqual(["A"]);
    expect(screen.getAllByRole("tab").map((t) => t.tabIndex)).toEqual([0, -1, -1]);
    // Tab leaves the row for its panel
    await user.tab();
    expect(document.activeElement).toBe(screen.getByRole("tabpanel", { name: "A" }));
  });
});
