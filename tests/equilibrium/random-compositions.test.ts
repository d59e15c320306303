import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { equilibrate } from "../../lib/equilibrium/equilibrate";
import { expectEquilibriumInvariants } from "./invariants";

/**
 * Property: for random closed compositions in Ca–Na–K–S–C–Cl–O–H with water, and random temperatures
 * 0–100 °C, the minimiser converges and every invariant holds (element balance, SI of stable and absent
 * phases, μ of every present species equal to its element-potential sum).
 */
describe("equilibrate on random compositions", () => {
  it("converges and satisfies the equilibrium invariants", () => {
    const amount = (max: number) => fc.double({ min: 0, max, noNaN: true });
    fc.assert(
      fc.property(
        fc.record({
          temperatureC: fc.double({ min: 0, max: 100, noNaN: true }),
          water: fc.double({ min: 5, max: 60, noNaN: true }),
          portlandite: amount(0.3),
          gypsum: amount(0.3),
          calcite: amount(0.1),
          halite: amount(1),
          potassiumHydroxide: amount(0.5),
          carbonDioxide: amount(0.2),
        }),
        (c) => {
          const outcome = equilibrate({
            temperatureC: c.temperatureC,
            components: {
              H2O: c.water,
              "Ca(OH)2": c.portlandite,
              "CaSO4·2H2O": c.gypsum,
              CaCO3: c.calcite,
              NaCl: c.halite,
              KOH: c.potassiumHydroxide,
              CO2: c.carbonDioxide,
            },
          });
          if (!outcome.ok) throw new Error(`${JSON.stringify(c)} → ${JSON.stringify(outcome.error)}`);
          expect(outcome.value.converged).toBe(true);
          expectEquilibriumInvariants(outcome.value);
        },
      ),
      { numRuns: 60, seed: 20261201 },
    );
  });
});
