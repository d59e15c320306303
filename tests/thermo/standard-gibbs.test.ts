import { describe, expect, it } from "vitest";
import type { HeatCapacity } from "../../lib/data/schema";
import { gasConstantJPerMolK, joulesPerCalorie } from "../../lib/thermo/physical-constants";
import {
  apparentEnthalpyJPerMol,
  apparentGibbsJPerMol,
  heatCapacityJPerMolK,
  standardEntropyJPerMolK,
  type StandardStateEntry,
} from "../../lib/thermo/standard-gibbs";
import { ThermoInputError } from "../../lib/thermo/thermo-error";
import { log10Kw } from "../../lib/thermo/water-ionisation";

const referenceTemperatureK = 298.15;

// OH-: revised HKF parameters of Shock & Helgeson 1988 (Geochim. Cosmochim. Acta 52, 2009), from memory:
// ΔfG° −37595 cal/mol, ΔfH° −54977 cal/mol, S° −2.56 cal/(mol·K), c1 4.1860 cal/(mol·K), c2 −1.0346e5 cal·K/mol, ω 1.7246e5 cal/mol.
const hydroxide: StandardStateEntry = {
  standard: { gibbsJPerMol: -37595 * joulesPerCalorie, enthalpyJPerMol: -54977 * joulesPerCalorie, entropyJPerMolK: -2.56 * joulesPerCalorie },
  heatCapacity: { model: "hkf-1bar", c1CalPerMolK: 4.186, c2CalKPerMol: -1.0346e5, omegaCalPerMol: 1.7246e5 },
};

// H2O(l): CODATA Key Values (Cox, Wagman & Medvedev 1989): ΔfG° −237.140 kJ/mol, ΔfH° −285.830 kJ/mol, S° 69.95 J/(mol·K);
// Cp° 75.3 J/(mol·K) at 25 °C (CODATA 1989), held constant.
const liquidWater: StandardStateEntry = {
  standard: { gibbsJPerMol: -237140, enthalpyJPerMol: -285830, entropyJPerMolK: 69.95 },
  heatCapacity: { model: "constant", cpJPerMolK: 75.3 },
};

// A Haas–Fisher case with typical magnitudes (invented for the mathematical check, not data).
const typicalHaasFisherSolid: StandardStateEntry = {
  standard: { gibbsJPerMol: -1.0e6, enthalpyJPerMol: -1.1e6, entropyJPerMolK: 90 },
  heatCapacity: { model: "haas-fisher", aJPerMolK: 150, bJPerMolK2: 0.03, cJKPerMol: -3.0e6, dJPerMolK05: -600 },
};

const cases: { name: string; entry: StandardStateEntry }[] = [
  { name: "revised HKF (OH-)", entry: hydroxide },
  { name: "constant Cp (H2O(l))", entry: liquidWater },
  { name: "Haas–Fisher (typical solid)", entry: typicalHaasFisherSolid },
];

/** Composite Simpson quadrature of f on [a, b] with n (even) intervals. */
function simpson(f: (x: number) => number, a: number, b: number, n = 2000): number {
  const h = (b - a) / n;
  let sum = f(a) + f(b);
  for (let k = 1; k < n; k++) sum += (k % 2 === 1 ? 4 : 2) * f(a + k * h);
  return (sum * h) / 3;
}

describe("apparent standard properties against temperature", () => {
  for (const { name, entry } of cases) {
    it(`return ΔfG°, ΔfH° and S° at 298.15 K for ${name}`, () => {
      expect(apparentGibbsJPerMol(entry, referenceTemperatureK)).toBeCloseTo(entry.standard.gibbsJPerMol, 6);
      expect(apparentEnthalpyJPerMol(entry, referenceTemperatureK)).toBeCloseTo(entry.standard.enthalpyJPerMol!, 6);
      expect(standardEntropyJPerMolK(entry, referenceTemperatureK)).toBeCloseTo(entry.standard.entropyJPerMolK, 9);
    });

    it(`obey ∂G/∂T = −S, ∂H/∂T = Cp and ∂S/∂T = Cp/T by central differences for ${name} (Gibbs–Helmholtz)`, () => {
      const stepK = 0.01;
      for (const temperatureK of [274, 288.15, 310, 333.15, 350, 372]) {
        const dG = (apparentGibbsJPerMol(entry, temperatureK + stepK) - apparentGibbsJPerMol(entry, temperatureK - stepK)) / (2 * stepK);
        const dH = (apparentEnthalpyJPerMol(entry, temperatureK + stepK) - apparentEnthalpyJPerMol(entry, temperatureK - stepK)) / (2 * stepK);
        const dS = (standardEntropyJPerMolK(entry, temperatureK + stepK) - standardEntropyJPerMolK(entry, temperatureK - stepK)) / (2 * stepK);
        const cp = heatCapacityJPerMolK(entry.heatCapacity, temperatureK);
        expect(dG).toBeCloseTo(-standardEntropyJPerMolK(entry, temperatureK), 3);
        expect(dH).toBeCloseTo(cp, 3);
        expect(dS).toBeCloseTo(cp / temperatureK, 5);
      }
    });

    it(`keep G − H + TS equal to ΔfG° − ΔfH° + Tr·S° at every temperature for ${name}`, () => {
      const { gibbsJPerMol, enthalpyJPerMol, entropyJPerMolK } = entry.standard;
      const expected = gibbsJPerMol - enthalpyJPerMol! + referenceTemperatureK * entropyJPerMolK;
      for (const temperatureK of [273.15, 300, 330, 373.15]) {
        const combination =
          apparentGibbsJPerMol(entry, temperatureK) - apparentEnthalpyJPerMol(entry, temperatureK) + temperatureK * standardEntropyJPerMolK(entry, temperatureK);
        expect(combination).toBeCloseTo(expected, 5);
      }
    });
  }

  it("match a hand integration (Simpson quadrature of Cp and Cp/T) for the Haas–Fisher polynomial", () => {
    const cp = (t: number) => 150 + 0.03 * t - 3.0e6 / t ** 2 - 600 / Math.sqrt(t);
    for (const temperatureK of [273.15, 323.15, 373.15, 600]) {
      const enthalpyIncrement = simpson(cp, referenceTemperatureK, temperatureK);
      const entropyIncrement = simpson((t) => cp(t) / t, referenceTemperatureK, temperatureK);
      const expectedGibbs = -1.0e6 - 90 * (temperatureK - referenceTemperatureK) + enthalpyIncrement - temperatureK * entropyIncrement;
      expect(apparentGibbsJPerMol(typicalHaasFisherSolid, temperatureK)).toBeCloseTo(expectedGibbs, 4);
      expect(apparentEnthalpyJPerMol(typicalHaasFisherSolid, temperatureK)).toBeCloseTo(-1.1e6 + enthalpyIncrement, 4);
      expect(heatCapacityJPerMolK(typicalHaasFisherSolid.heatCapacity, temperatureK)).toBeCloseTo(cp(temperatureK), 9);
    }
  });

  it("give log Kw from HKF OH- and H2O(l) within 0.05 of IAPWS R11-07 from 0 to 100 °C (Bandura & Lvov 2006)", () => {
    const deviations: number[] = [];
    for (let temperatureC = 0; temperatureC <= 100; temperatureC += 5) {
      const temperatureK = 273.15 + temperatureC;
      // H2O(l) = H+ + OH-, with G(H+) = 0 at every temperature (convention).
      const reactionGibbsJPerMol = apparentGibbsJPerMol(hydroxide, temperatureK) - apparentGibbsJPerMol(liquidWater, temperatureK);
      const log10KFromPotentials = -reactionGibbsJPerMol / (gasConstantJPerMolK * temperatureK * Math.LN10);
      deviations.push(log10KFromPotentials - log10Kw(temperatureK));
    }
    // Measured when written: +0.017 at 0 °C, +0.007 at 25 °C, 0.000 at 60 °C, +0.004 at 100 °C.
    for (const deviation of deviations) expect(Math.abs(deviation)).toBeLessThan(0.05);
  });

  it("give Cp°(OH-, 25 °C) within 10 J/(mol·K) of −137.2 J/(mol·K) (−32.79 cal, Shock & Helgeson 1988; from memory)", () => {
    // The IAPWS permittivity has a smaller curvature (X) than the one the HKF fit used, which shifts ωTX by about 7 J/(mol·K).
    expect(Math.abs(heatCapacityJPerMolK(hydroxide.heatCapacity, referenceTemperatureK) - -137.2)).toBeLessThan(10);
  });

  it("throw a typed error naming standard.enthalpyJPerMol when the enthalpy is absent", () => {
    const withoutEnthalpy: StandardStateEntry = { standard: { gibbsJPerMol: -1e5, entropyJPerMolK: 10 }, heatCapacity: { model: "constant", cpJPerMolK: 30 } };
    expect(() => apparentEnthalpyJPerMol(withoutEnthalpy, 300)).toThrow(ThermoInputError);
    try {
      apparentEnthalpyJPerMol(withoutEnthalpy, 300);
    } catch (error) {
      expect((error as ThermoInputError).field).toBe("standard.enthalpyJPerMol");
      expect((error as ThermoInputError).code).toBe("missing-field");
    }
    expect(apparentGibbsJPerMol(withoutEnthalpy, 300)).toBeCloseTo(-1e5 - 10 * 1.85 + 30 * (1.85 - 300 * Math.log(300 / 298.15)), 6);
  });

  it("reject temperatures outside each model's range with a typed error naming temperatureK", () => {
    const hkf: HeatCapacity = hydroxide.heatCapacity;
    expect(() => heatCapacityJPerMolK(hkf, 400)).toThrow(/temperatureK/);
    expect(() => apparentGibbsJPerMol(hydroxide, 263.15)).toThrow(ThermoInputError);
    expect(() => apparentGibbsJPerMol(liquidWater, 1500)).toThrow(/temperatureK/);
    expect(() => apparentGibbsJPerMol(liquidWater, Number.NaN)).toThrow(/finite/);
  });
});
