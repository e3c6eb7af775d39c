// The sketch page's "Forked from" line: a link for a reader of the origin, the title without a link
// for someone who may not read it, and "since deleted" once the origin is gone.
import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ForkedFrom } from "@/components/sketches/SketchScreen";

describe("ForkedFrom", () => {
  it("links to an origin the reader may see", () => {
    render(<ForkedFrom origin={{ visible: true, sketchId: "s1", title: "Riser bend", workspaceId: "w1", versionNumber: 2 }} />);
    expect(screen.getByRole("link", { name: "Riser bend v2" }).getAttribute("href")).toBe("/workspaces/w1/sketches/s1/versions/2");
  });

  it("names an origin in another workspace without a link", () => {
    render(<ForkedFrom origin={{ visible: false, title: "Riser bend", versionNumber: 2 }} />);
    expect(screen.getByTestId("forked-from").textContent?.trim()).toBe("Forked from “Riser bend” v2, in a workspace you are not a member of");
    expect(screen.queryByRole("link")).toBeNull();
  });

  it("says a deleted origin is gone, keeping its name and version", () => {
    render(<ForkedFrom origin={{ visible: false, deleted: true, title: "Riser bend", versionNumber: 2 }} />);
    expect(screen.getByTestId("forked-from").textContent?.trim()).toBe("Forked from “Riser bend” v2, a sketch since deleted (this fork keeps its own copy)");
    expect(screen.queryByRole("link")).toBeNull();
  });

  it("leaves out a version it no longer knows", () => {
    render(<ForkedFrom origin={{ visible: false, deleted: true, title: "Riser bend", versionNumber: null }} />);
    expect(screen.getByTestId("forked-from").textContent?.trim()).toBe("Forked from “Riser bend”, a sketch since deleted (this fork keeps its own copy)");
  });
});
