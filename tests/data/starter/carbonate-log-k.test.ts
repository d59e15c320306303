import { describe, it, expect } from "vitest";
import { loadDataset } from "../../../lib/data/load-dataset";
import { speciesAtTemperature } from "../../../lib/data/species-at-temperature";
import { gasConstantJPerMolK } from "../../../lib/thermo/physical-constants";

/**
 * The carbonate system computed from the starter data (CODATA gases and water, revised-HKF ions of Shock &
 * Helgeson 1988 and Shock et al. 1989, calcite of Helgeson et al. 1978) against the independent
 * temperature functions of Plummer & Busenberg (1982, Geochim. Cosmochim. Acta 46, 1011), which were fitted
 * to their own solubility and conductance measurements. None of the data entries used here came from that
 * paper (only CaHCO3+ and CaCO3(aq) did, and they do not enter these four reactions).
 */
const log10 = Math.log10;
const plummerBusenberg = {
  // log K(CO2(g) = CO2(aq))
  henry: (t: number) => 108.3865 + 0.01985076 * t - 6919.53 / t - 40.45154 * log10(t) + 669365 / t ** 2,
  // log K1(CO2(aq) + H2O = HCO3- + H+)
  first: (t: number) => -356.3094 - 0.06091964 * t + 21834.37 / t + 126.8339 * log10(t) - 1684915 / t ** 2,
  // log K2(HCO3- = CO3-2 + H+)
  second: (t: number) => -107.8871 - 0.03252849 * t + 5151.79 / t + 38.92561 * log10(t) - 563713.9 / t ** 2,
  // log K(calcite = Ca+2 + CO3-2)
  calcite: (t: number) => -171.9065 - 0.077993 * t + 2839.319 / t + 71.595 * log10(t),
};

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const dataset = loaded.value;

function log10KFromData(reaction: Record<string, number>, temperatureK: number): number {
  const gibbs = new Map(speciesAtTemperature(dataset, temperatureK).map((s) => [s.id, s.gibbsJPerMol]));
  let deltaGJPerMol = 0;
  for (const [id, coefficient] of Object.entries(reaction)) deltaGJPerMol += coefficient * gibbs.get(id)!;
  return -deltaGJPerMol / (gasConstantJPerMolK * temperatureK * Math.LN10);
}

const reactions = [
  ["CO2(g) = CO2(aq)", { "CO2(aq)": 1, "CO2(g)": -1 }, plummerBusenberg.henry],
  ["CO2(aq) + H2O = HCO3- + H+", { "HCO3-": 1, "H+": 1, "CO2(aq)": -1, "H2O(l)": -1 }, plummerBusenberg.first],
  ["HCO3- = CO3-2 + H+", { "CO3-2": 1, "H+": 1, "HCO3-": -1 }, plummerBusenberg.second],
  ["calcite = Ca+2 + CO3-2", { "Ca+2": 1, "CO3-2": 1, calcite: -1 }, plummerBusenberg.calcite],
] as const;

/**
 * Points where the data miss the 0.05 target. Reported, not tuned away: log K2 from the revised-HKF
 * HCO3- and CO3-2 of Shock & Helgeson (1988) rises 0.055 above Plummer & Busenberg at 90 °C (0.073 at
 * 100 °C). If the data improve, the "greater than 0.05" assertion fails and this entry should go.
 *
 * Reason (checked once against an independent evaluation of the HKF equations with python3-iapws, which agrees
 * with the code to 0.5 J/mol): ΔrCp°. The HKF parameters give ΔrCp° of −247 J/(mol·K) at 25 °C and −212
 * to −218 from 50 to 90 °C; the Plummer & Busenberg function implies −285 to −292. That gap accounts for
 * +0.062 at 90 °C (−0.006 comes from ΔrH° at 25 °C, 14.70 against their 14.90 kJ/mol). About 0.01 of it
 * is the permittivity: the parameters reproduce the tabulated Cp° (−8.46, −69.50 cal/(mol·K)) only with
 * the Born X of −3.09e-7 1/K the HKF authors used (from memory), 11 % larger in magnitude than the IAPWS
 * R8-97 value used here (see born-functions.test.ts). Other permittivity fits (Malmberg & Maryott 1956,
 * J. Res. NBS 56, 1; Bradley & Pitzer 1979, J. Phys. Chem. 83, 1599; both from memory) give 0.054–0.061,
 * so the rest of the deviation lies in the ion parameters themselves.
 *
 * Tried and not taken (December 2026): CO3-2 from Millero's (1979, Geochim. Cosmochim. Acta 43, 1651) pure-water
 * K2, ln K2 = 207.6548 − 11843.79/T − 33.6485 ln T (from memory; ΔrCp° −279.8 J/(mol·K)). log K2 then follows
 * Plummer & Busenberg within 0.011 to 90 °C, but calcite = Ca+2 + CO3-2 falls 0.069 below them at 75 °C and
 * 0.088 at 90 °C (now −0.044): the Helgeson et al. (1978) calcite was made consistent with the HKF CO3-2, so
 * the error would only move from K2 to calcite solubility, which matters more for cement carbonation.
 */
const knownDeviations = [{ reaction: "HCO3- = CO3-2 + H+", temperatureC: 90, observed: 0.055 }];

describe("carbonate equilibria from the starter data", () => {
  it("reproduces the published 25 °C values of the Plummer & Busenberg functions themselves", () => {
    // Plummer & Busenberg (1982) quote −1.468, −6.352, −10.329, −8.480 at 25 °C: guards against typos above.
    expect(plummerBusenberg.henry(298.15)).toBeCloseTo(-1.468, 2);
    expect(plummerBusenberg.first(298.15)).toBeCloseTo(-6.352, 2);
    expect(plummerBusenberg.second(298.15)).toBeCloseTo(-10.329, 2);
    expect(plummerBusenberg.calcite(298.15)).toBeCloseTo(-8.48, 2);
  });

  for (const [name, reaction, reference] of reactions) {
    for (const temperatureC of [5, 25, 50, 75, 90]) {
      const known = knownDeviations.find((d) => d.reaction === name && d.temperatureC === temperatureC);
      const temperatureK = temperatureC + 273.15;
      if (known) {
        it(`gives log K of ${name} at ${temperatureC} °C off Plummer & Busenberg (1982) by the known ${known.observed} (over the 0.05 target, reported), no more than 0.1`, () => {
          const deviation = Math.abs(log10KFromData(reaction, temperatureK) - reference(temperatureK));
          expect(deviation).toBeGreaterThan(0.05);
          expect(deviation).toBeLessThanOrEqual(0.1);
        });
        continue;
      }
      it(`gives log K of ${name} at ${temperatureC} °C within 0.05 of Plummer & Busenberg (1982)`, () => {
        expect(Math.abs(log10KFromData(reaction, temperatureK) - reference(temperatureK))).toBeLessThanOrEqual(0.05);
      });
    }
  }
});
