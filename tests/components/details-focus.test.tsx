// "Edit details" opens the sketch's details in place: the keyboard goes to its first field.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { SketchDetailsForm } from "@/components/sketches/SketchDetailsForm";

describe("the sketch's details form", () => {
  it("takes the focus to its title when it opens", () => {
    render(
      <QueryClientProvider client={new QueryClient()}>
        <SketchDetailsForm sketchId="s1" title="Skid at pier 7" description="" tags={["pumps"]} onDone={() => {}} />
      </QueryClientProvider>,
    );
    expect(document.activeElement).toBe(screen.getByLabelText("Title"));
  });
});
