import type { Flag } from "../flag";
import { advisoryThresholds } from "../thresholds";
import type { ExposureInput } from "../../schema/exposure-input";
import type { CarbonationScenario } from "../../scenarios/carbonation";
import { describeCarbonationTime } from "../../scenarios/carbonation-depth";

/**
 * `carbonation-depassivation`: the carbonation front (Papadakis model with the engine's binding capacity)
 * reaches the reinforcement within the design working life, so the steel loses its passive film.
 */
export function carbonationDepassivationFlag(
  result: CarbonationScenario,
  context: { exposure: ExposureInput; designWorkingLifeYears?: number },
): Flag | undefined {
  if (context.exposure.reinforced === false || !result.depth || result.depth.timeToCoverYears === undefined) return undefined;
  const life = context.designWorkingLifeYears ?? advisoryThresholds.carbonation.designWorkingLifeYears.value;
  const years = result.depth.timeToCoverYears;
  const severity = years < life ? "warning" : years < 2 * life ? "caution" : "info";
  const s = result.summary;
  return {
    id: "carbonation-depassivation",
    severity,
    title: years < life ? "Carbonation reaches the reinforcement within the design working life" : "Carbonation of the cover: time to reach the reinforcement",
    explanation:
      `CO2 from the air turns portlandite and C-S-H into calcite (Ca(OH)2 + CO2 → CaCO3 + H2O); the paste binds ${s.co2BindingCapacityMolPerM3.toFixed(0)} mol CO2 per m³ of concrete before it is fully carbonated, ` +
      `and its pore solution falls below pH ${s.depassivationPH} after ${s.depassivationUptakeMolPerM3?.toFixed(0) ?? "—"} mol/m³. ` +
      `With the Papadakis diffusion model the carbonation coefficient is ${result.depth.coefficientMmPerSqrtYear.toFixed(1)} mm/√year, so the front reaches ${context.exposure.coverMm ?? "the"} mm cover in ${describeCarbonationTime(years)} (design working life ${life} years).`,
    basis: "Papadakis, Vayenas & Fardis 1991, ACI Mater. J. 88, 363; depassivation below pH about 9 (Broomfield 2007, common practice); EN 1990 design working life; EN 206 XC classes and EN 1992-1-1 Table 4.4N minimum cover govern.",
    actions: [
      "Check the cover against EN 1992-1-1 Table 4.4N (or ACI 318 Table 20.5.1.3) for the XC class and the design working life.",
      "Lower w/cm or use a denser binder; high-SCM binders bind less CO2 per m³ and carbonate faster.",
      "Measure carbonation resistance (EN 12390-12 accelerated or EN 12390-10 natural carbonation) where the margin is small.",
    ],
  };
}
