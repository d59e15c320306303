import { describe, it, expect } from "vitest";
import { pasteFailureMessage } from "../../lib/service/paste-failure";
import type { BulkComposition } from "../../lib/cement/bulk-composition";

const failure = { code: "no_convergence" as const, iterations: 628, residual: NaN, activePhases: [], message: "a phase left out during the search is supersaturated at the end" };
const composition = (warnings: BulkComposition["warnings"]) => ({ warnings }) as unknown as BulkComposition;

describe("the message of a paste the engine could not solve", () => {
  it("names the paste's age and temperature and the engine's reason", () => {
    const message = pasteFailureMessage(failure, { age: { mode: "age", ageDays: 3650, curingTemperatureC: 20 }, temperatureC: 20, composition: composition([]) });
    expect(message).toBe("The equilibrium of the hydrated paste at 3650 d and 20 °C could not be computed: no convergence in 628 iterations (residual NaN): a phase left out during the search is supersaturated at the end.");
  });

  it("adds, for a paste short of water (Powers' sealed minimum, about 0.42), that nearly dry pastes are the engine's known weak case", () => {
    const short = composition([{ code: "water_insufficient_for_full_hydration", waterBinderRatio: 0.25, minimumSealed: 0.419, minimumSaturated: 0.356 }]);
    const message = pasteFailureMessage(failure, { age: { mode: "degrees", clinkerDegrees: { alite: 1, belite: 1, aluminate: 1, ferrite: 1 } }, temperatureC: 25, composition: short });
    expect(message).toMatch(/^The equilibrium of the hydrated paste at the given reaction degrees and 25 °C could not be computed: /);
    expect(message).toContain("The w/b 0.25 is below the 0.42 that full hydration needs (sealed, Powers' model), so little pore water is left: nearly dry pastes are the case the engine solves least reliably (a known limitation).");
  });
});
