// "In every case" when a case does not reach the target in the range: its row says, as the single
// search does, where the quantity came closest and which way it goes past an end, and the tab offers
// one wider range covering every case's — checked against statics worked by hand (common practice).
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { mountResultsDock, setUpSweep } from "./editor-helpers";
import { G0 } from "@/solver/constants";

// A 200 kg stand (weight at x = 1 m) on a front pin at x = 2 m and a rear contact at x = 0 facing
// up, a thrust T in +x at 1.2 m and a load D down at x = 1 m (demo data). Moments about the pin:
// −2·n + (W + D)·1 − 1.2·T = 0, so n = (W + D − 1.2·T)/2, zero at T* = (W + D)/1.2 (the rear
// lifts at T = W·d/h, common practice).
const W = 200 * G0;
function stand(cases = [
  { id: "empty", name: "Empty", parameters: { D: "0 N" } },
  { id: "loaded", name: "Loaded", parameters: { D: "600 N" } },
]) {
  return {
    format: "counterpoise.sketch",
    version: 2,
    title: "stand",
    parameters: { T: "500 N", D: "0 N" },
    bodies: [{ id: "s", label: "stand", mass: "200 kg", cg: [1, 0.7], outline: [[0, 0], [2, 0], [2, 1.5], [0, 1.5]] }],
    supports: [
      { id: "front", label: "front pin", body: "s", kind: "pin", at: [2, 0] },
      { id: "rear", label: "rear foot", body: "s", kind: "contact", at: [0, 0], angle: 90 },
    ],
    loads: [
      { id: "thrust", body: "s", kind: "force", at: [0, 1.2], fx: "T", fy: 0 },
      { id: "ballast", body: "s", kind: "force", at: [1, 1.5], fx: 0, fy: "-D" },
    ],
    ports: [],
    massSources: [],
    cases,
  };
}

/** T swept from 0 to 1000 N and the rear foot's margin searched in every case: the answer's box. */
async function everyCase(user: ReturnType<typeof userEvent.setup>) {
  await setUpSweep(user, "T", ["0", "1000", "11"]);
  await user.click(screen.getByRole("button", { name: "Run the sweep" }));
  await screen.findByTestId("crossings");
  await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "margin at rear foot");
  await user.click(screen.getByRole("button", { name: "In every case" }));
  return screen.findByTestId("limit-everywhere");
}

describe("In every case, a case without a crossing", () => {
  it("says where it came closest and where a line reaches the target, and offers one wider range that finds both", async () => {
    const user = userEvent.setup();
    mountResultsDock(stand());
    const box = await everyCase(user);
    const rows = () => [...box.querySelectorAll("tbody tr")].map((tr) => tr.querySelector("td")!.textContent);
    // n falls with T (linear, so the line through the last samples is exact): closest at T = 1000 N,
    // n = (W + D − 1200)/2 = 380.7 N empty, 680.7 N loaded; T* = W/1.2 = 1634.4 N, (W + 600)/1.2 = 2134.4 N
    expect(((W - 1200) / 2 / 1000).toFixed(4)).toBe("0.3807");
    expect(((W + 600 - 1200) / 2 / 1000).toFixed(4)).toBe("0.6807");
    expect(Math.round(W / 1.2)).toBe(1634);
    expect(Math.round((W + 600) / 1.2)).toBe(2134);
    expect(rows()).toEqual([
      "no crossing in this range: above 0 kN throughout; closest 0.3807 kN at T = 1,000 N; past 1,000 N heading for 0 kN (a line reaches it near T = 1,634 N)",
      "no crossing in this range: above 0 kN throughout; closest 0.6807 kN at T = 1,000 N; past 1,000 N heading for 0 kN (a line reaches it near T = 2,134 N)",
    ]);
    // each case's wider range: half as far again past the end as the line says, rounded out to 10 N
    // (empty 1000 + 1.5·634.4 = 1951.7 → 1960; loaded 1000 + 1.5·1134.4 = 2701.7 → 2710): one search covers both
    const wider = screen.getByTestId("limit-everywhere-wider");
    expect(wider).toHaveTextContent("Search every case from 0 to 2,710 N");
    // the CSV says what the row says
    const blobs: Blob[] = [];
    const orig = URL.createObjectURL;
    const click = HTMLAnchorElement.prototype.click;
    URL.createObjectURL = ((b: Blob) => (blobs.push(b), "blob:x")) as typeof URL.createObjectURL;
    HTMLAnchorElement.prototype.click = () => {};
    try {
      await user.click(screen.getByRole("button", { name: "Download the limit in every case as CSV" }));
    } finally {
      URL.createObjectURL = orig;
      HTMLAnchorElement.prototype.click = click;
    }
    const [, ...csv] = Papa.parse<string[]>((await blobs[0].text()).replace(/^\ufeff/, "").trimEnd()).data;
    expect(csv.map((r) => r[3])).toEqual(rows());
    // searched over the wider range: both lift, the empty stand first at W/1.2
    await user.click(wider);
    await within(box.ownerDocument.body).findByText(/reaches 0 kN first in Empty/);
    expect(screen.getByRole("textbox", { name: "From" })).toHaveValue("0");
    expect(screen.getByRole("textbox", { name: "To" })).toHaveValue("2710");
    const found = [...screen.getByTestId("limit-everywhere").querySelectorAll("tbody tr")].map((tr) => tr.querySelector("td")!.textContent);
    expect(found[0]).toMatch(/^T = 1,634 N/);
    expect(found[1]).toMatch(/^T = 2,134 N/);
    expect(screen.queryByTestId("limit-everywhere-wider")).toBeNull();
  });

  it("a case in which the stand is held nowhere says so, and still where the margin its foot would need comes closest", async () => {
    const user = userEvent.setup();
    // D = −3000 N lifts the stand at x = 1 m: W + D < 0, so n = (W + D − 1.2·T)/2 < 0 for every
    // T ≥ 0 and nothing holds it (a pin alone takes no moment); n is closest to 0 at T = 0,
    // (W − 3000)/2 = −519.3 N, and below T = 0 it rises toward 0, which a line reaches at
    // T = (W − 3000)/1.2 = −865.6 N; half as far again, −1298.4 N, rounded out to 10 N: −1300 N
    expect(((W - 3000) / 2 / 1000).toFixed(4)).toBe("-0.5193");
    expect(((W - 3000) / 1.2).toFixed(1)).toBe("-865.6");
    mountResultsDock(stand([{ id: "lifted", name: "Lifted", parameters: { D: "-3000 N" } }, { id: "empty", name: "Empty", parameters: { D: "0 N" } }]));
    const box = await everyCase(user);
    const rows = [...box.querySelectorAll("tbody tr")].map((tr) => tr.querySelector("td")!.textContent);
    expect(rows).toEqual([
      "no crossing in this range: stand is not held anywhere in it (what its supports would need, not a load they carry); closest −0.5193 kN at T = 0 N; below 0 N heading for 0 kN (a line reaches it near T = −865.6 N)",
      "no crossing in this range: above 0 kN throughout; closest 0.3807 kN at T = 1,000 N; past 1,000 N heading for 0 kN (a line reaches it near T = 1,634 N)",
    ]);
    expect(screen.getByTestId("limit-everywhere-wider")).toHaveTextContent("Search every case from −1,300 to 1,960 N");
  });
});
