import type { AssessInputRaw } from "../../lib/schema/assess-input";

/**
 * Starting values of a new assessment. Each one is a default the engineer is expected to check; the hint
 * beside the field gives its source.
 * - age 28 d at 20 °C: the standard age of compliance testing and the standard curing temperature of
 *   specimens (EN 206 8.2 and EN 12390-2, 20 ± 2 °C; common practice).
 * - CO2 0.04 % by volume: the schema's default (about 420 µmol/mol, from memory).
 * - reinforced: the schema's default (EN 206 XC/XD/XS apply only to reinforced concrete).
 */
export const newAssessmentDefaults = {
  project: { name: "", element: { type: "wall" } },
  binder: { cement: { kind: "preset", presetId: "en197-cem-i" }, supplementaryMaterials: [] },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  exposure: { co2Percent: 0.04, reinforced: true },
  curing: {},
  options: { sweepPoints: 40, suppressedPhases: [], allowedPhases: [] },
} as unknown as AssessInputRaw;
