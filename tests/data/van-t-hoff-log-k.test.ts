import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { vanTHoffLog10K } from "../../lib/data/van-t-hoff-log-k";
import { gasConstantJPerMolK } from "../../lib/thermo/physical-constants";

describe("vanTHoffLog10K", () => {
  it("returns log10 K25 at 298.15 K", () => {
    expect(vanTHoffLog10K({ log10K25: -8.48, deltaHJPerMol: -10000, deltaCpJPerMolK: -200 }, 298.15)).toBeCloseTo(-8.48, 12);
  });

  it("satisfies the van 't Hoff equation d ln K / dT = ΔrH°(T)/(R T²) with ΔrH°(T) = ΔrH° + ΔrCp°(T − 298.15) (property test)", () => {
    // The differential van 't Hoff equation (e.g. Anderson & Crerar 1993, Thermodynamics in Geochemistry, ch. 11).
    fc.assert(
      fc.property(
        fc.double({ min: -1e5, max: 1e5, noNaN: true }),
        fc.double({ min: -800, max: 800, noNaN: true }),
        fc.double({ min: 274, max: 372, noNaN: true }),
        (deltaHJPerMol, deltaCpJPerMolK, temperatureK) => {
          const reaction = { log10K25: 1, deltaHJPerMol, deltaCpJPerMolK };
          const stepK = 1e-3;
          const slopePerK = (Math.LN10 * (vanTHoffLog10K(reaction, temperatureK + stepK) - vanTHoffLog10K(reaction, temperatureK - stepK))) / (2 * stepK);
          const enthalpyAtTJPerMol = deltaHJPerMol + deltaCpJPerMolK * (temperatureK - 298.15);
          const expectedPerK = enthalpyAtTJPerMol / (gasConstantJPerMolK * temperatureK ** 2);
          expect(Math.abs(slopePerK - expectedPerK)).toBeLessThan(1e-6 + 1e-5 * Math.abs(expectedPerK));
        },
      ),
    );
  });

  it("follows the Plummer & Busenberg (1982) CO2 solubility function to 0.02 over 0–90 °C given its own 25 °C ΔrH° and ΔrCp°", () => {
    // Plummer & Busenberg (1982, Geochim. Cosmochim. Acta 46, 1011): log K(CO2(g) = CO2(aq)) as a function of T.
    // ΔrH° and ΔrCp° at 298.15 K are taken from that function by differentiation here, so the check is of the
    // constant-ΔrCp° approximation, not of any data entry.
    const henry = (t: number) => 108.3865 + 0.01985076 * t - 6919.53 / t - 40.45154 * Math.log10(t) + 669365 / t ** 2;
    const h = 1e-3;
    const tr = 298.15;
    const slope = (t: number) => (henry(t + h) - henry(t - h)) / (2 * h);
    const rLn10 = gasConstantJPerMolK * Math.LN10;
    const deltaHJPerMol = rLn10 * tr ** 2 * slope(tr);
    const deltaCpJPerMolK = (rLn10 * ((tr + h) ** 2 * slope(tr + h) - (tr - h) ** 2 * slope(tr - h))) / (2 * h);
    // Published ΔrH° of CO2 dissolution at 25 °C is about −19.98 kJ/mol (Plummer & Busenberg 1982, from memory).
    expect(deltaHJPerMol / 1000).toBeCloseTo(-19.98, 0);
    for (let temperatureK = 273.15; temperatureK <= 363.15; temperatureK += 5) {
      const approximation = vanTHoffLog10K({ log10K25: henry(tr), deltaHJPerMol, deltaCpJPerMolK }, temperatureK);
      expect(Math.abs(approximation - henry(temperatureK))).toBeLessThan(0.02);
    }
  });
});
