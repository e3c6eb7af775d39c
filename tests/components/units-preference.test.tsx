// The reader's SI / US choice: kept in the browser under the editor's key, read by every review
// screen, and followed at once by every part of the page that shows a value.
import { act, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { formatForce, UNITS_KEY } from "@/components/sketches/format";
import { useUnitsPreference } from "@/components/sketches/useUnitsPreference";

function Value({ newtons, testId }: { newtons: number; testId: string }) {
  const [units] = useUnitsPreference();
  return <span data-testid={testId}>{formatForce(newtons, units)}</span>;
}

function Switch() {
  const [, set] = useUnitsPreference();
  return (
    <button type="button" onClick={() => set("SI")}>
      SI
    </button>
  );
}

afterEach(() => window.localStorage.clear());

describe("useUnitsPreference", () => {
  it("starts from the stored choice and moves every reader when it changes (lbf = 4.4482216152605 N, NIST SP 811)", () => {
    window.localStorage.setItem(UNITS_KEY, "US");
    render(
      <>
        <Value newtons={4448.2216152605} testId="a" />
        <Value newtons={2000} testId="b" />
        <Switch />
      </>,
    );
    expect(screen.getByTestId("a").textContent).toBe("1,000 lbf");
    act(() => screen.getByRole("button", { name: "SI" }).click());
    expect(window.localStorage.getItem(UNITS_KEY)).toBe("SI");
    expect(screen.getByTestId("a").textContent).toBe("4.448 kN");
    expect(screen.getByTestId("b").textContent).toBe("2 kN");
  });

  it("is SI when nothing is stored", () => {
    render(<Value newtons={950} testId="c" />);
    expect(screen.getByTestId("c").textContent).toBe("950 N");
  });
});
