import { describe, expect, it } from "vitest";
import { gasConstantJPerMolK, joulesPerCalorie } from "../../lib/thermo/physical-constants";

describe("physical constants", () => {
  it("give R = 8.314462618 J/(mol·K) from N_A·k (CODATA 2018, Tiesinga et al. 2021, Rev. Mod. Phys. 93, 025010)", () => {
    expect(gasConstantJPerMolK).toBeCloseTo(8.314462618, 9);
  });

  it("use the thermochemical calorie, 4.184 J (NIST SP 811, 2008)", () => {
    expect(joulesPerCalorie).toBe(4.184);
  });
});
