// The hand check of a body that tips, and of the moment block's momentum side: a checker reading the
// sums alone must not take "the two sides agree" for "it holds", nor a moment sum for a force sum.
import { readFileSync } from "node:fs";
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock } from "./editor-helpers";

const load = (n: string) => JSON.parse(readFileSync(`tests/fixtures/sketches/${n}.json`, "utf8"));

describe("hand check: what the sums agreeing means", () => {
  it("a stand that tips: the sums agree only with the rear pad pulling, and the check says the body is not held", async () => {
    const user = userEvent.setup();
    // The fixture's stand tips about its front pin. Taking moments about the pin (statics, any
    // textbook): the rear pad n = (W·0.8 m − T·1.5 m) / 1.6 m = (1961 × 0.8 − 2200 × 1.5) / 1.6
    // = −1082 N: it would have to pull 1.082 kN, which a contact cannot.
    mountResultsDock(load("thrust-stand-tips"));
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    const m = screen.getByTestId("hand-m");
    // about the front pin (the default P) the pad's term is r × F = −1.6 m × (−1.082 kN) = 1.731 kN·m
    expect(within(m).getAllByRole("listitem").map((li) => li.textContent)).toContainEqual(expect.stringMatching(/^\+ reaction at “rear pad”, acting at \(0, 0\) m1\.731 kN·m$/));
    const verdict = within(m).getByTestId("hand-verdict").textContent;
    expect(verdict).toMatch(/not held/);
    expect(verdict).toMatch(/tips/);
    expect(verdict).not.toBe("the two sides agree to 4 significant figures");
    // ΣFx and ΣFy say it too
    expect(within(screen.getByTestId("hand-fx")).getByTestId("hand-verdict").textContent).toMatch(/not held/);
  });

  it("a body that holds keeps the plain verdict", async () => {
    const user = userEvent.setup();
    const d = load("thrust-stand-tips");
    d.ports[0].at = [0, 0.6];
    mountResultsDock(d);
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    expect(within(screen.getByTestId("hand-m")).getByTestId("hand-verdict").textContent).toBe("the two sides agree to 4 significant figures");
  });

  it("the moment block's momentum side is written as moments of the flux, the force blocks' as the flux", async () => {
    const user = userEvent.setup();
    mountResultsDock(load("thrust-stand-tips"));
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    const total = (key: string) => screen.getByTestId(`hand-${key}`).querySelector("[data-testid=momentum-sum]")!.parentElement!.firstElementChild!.textContent;
    expect(total("fx")).toBe("= Σ(ṁV)out − Σ(ṁV)in");
    expect(total("m")).toBe("= Σ r × (ṁV)out − Σ r × (ṁV)in");
  });
});
