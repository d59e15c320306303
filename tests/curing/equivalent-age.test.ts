import { describe, it, expect } from "vitest";
import { equivalentAgeH } from "../../lib/curing/equivalent-age";

describe("ASTM C1074 equivalent age", () => {
  it("reproduces a hand calculation from the standard's equation for a two-stage history to 1 %", () => {
    // ASTM C1074 eq.: te = Σ exp[−Q(1/Ta − 1/Ts)] Δt, Q = E/R = 40 000/8.314 = 4811 K, Ts = 293.15 K (20 °C).
    // 12 h at 10 °C: exp[−4811 (1/283.15 − 1/293.15)] = exp(−0.5796) = 0.5601 → 6.721 h
    // 12 h at 30 °C: exp[−4811 (1/303.15 − 1/293.15)] = exp(+0.5414) = 1.7184 → 20.62 h
    // total 27.34 h (hand calculation, four-figure tables).
    const times = [0, 12, 12.000001, 24];
    const temps = [10, 10, 30, 30];
    const ages = equivalentAgeH(times, temps, 40000, 20);
    expect(Math.abs(ages[3] - 27.34) / 27.34).toBeLessThan(0.01);
  });

  it("uses the average temperature of each interval, as ASTM C1074 prescribes", () => {
    // One interval of 2 h from 10 °C to 30 °C: Ta = 20 °C = Ts, so te = 2 h exactly.
    expect(equivalentAgeH([0, 2], [10, 30], 40000, 20)[1]).toBeCloseTo(2, 12);
  });

  it("counts 20 °C concrete as younger against a 23 °C reference", () => {
    // At 20 °C and reference 23 °C: exp[−4811 (1/293.15 − 1/296.15)] = exp(−0.1663) = 0.8468 (hand calculation).
    const ages = equivalentAgeH([0, 10], [20, 20], 40000, 23);
    expect(ages[1]).toBeCloseTo(8.468, 2);
  });
});
