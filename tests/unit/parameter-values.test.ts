// The parameters table's Value column: as typed, and in the units on screen when they differ.
import { describe, expect, it } from "vitest";
import { readableValue } from "@/components/editor/ParametersTable";

describe("a parameter's value", () => {
  it("keeps the typed unit and adds the one on screen (NIST SP 811 factors)", () => {
    // 6 in = 0.1524 m; 600 kPa / 6894.757 Pa/psi = 87.02 psi; 998.2 kg/m³ / 16.01846 = 62.32 lb/ft³
    expect(readableValue(6, "in", "SI")).toBe("6 in (0.1524 m)");
    expect(readableValue(600, "kPa", "US")).toBe("600 kPa (87.02 psi)");
    expect(readableValue(998.2, "kg / m^3", "US")).toBe("998.2 kg/m³ (62.32 lb/ft³)");
    // already in the units on screen, or an angle: as typed, once
    expect(readableValue(998.2, "kg / m^3", "SI")).toBe("998.2 kg/m³");
    expect(readableValue(30, "deg", "US")).toBe("30 deg");
  });
});
