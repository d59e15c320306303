import { describe, expect, it } from "vitest";
import { gasConstantJPerMolK } from "../../lib/thermo/physical-constants";

describe("physical constants", () => {
  it("give R = 8.314462618 J/(mol·K) from N_A·k (CODATA 2018, Tiesinga et al. 2021, Rev. Mod. Phys. 93, 025010)", () => {
    expect(gasConstantJPerMolK).toBeCloseTo(8.314462618, 9);
  });
});
