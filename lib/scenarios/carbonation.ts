import { caToSiOf } from "../cement/csh-ca-si";
import type { ExposureInput } from "../schema/exposure-input";
import thresholds from "../data/advisory-thresholds.json";
import { estimateCarbonation, type CarbonationEstimate } from "./carbonation-depth";
import { linearDoses, phaseMoles, sweepPaste, sweepPoint, type ScenarioBase, type ScenarioSweep, type SweepFailure, type SweepPoint } from "./sweep";

/** Relative humidity assumed when the exposure gives none: 65 %, sheltered outdoor concrete (common practice; EN 12390-12 conditioning is 57 %). */
const DEFAULT_RELATIVE_HUMIDITY_PERCENT = 65;
/** The sweep runs to this multiple of the carbonatable Ca and alkali, so that it ends fully carbonated. */
const DOSE_RANGE_MULTIPLE = 1.25;
/** Calcite within this fraction of its final amount marks full carbonation. */
const FULL_CARBONATION_FRACTION = 0.99;

export type CarbonationPoint = SweepPoint & {
  portlanditeMol: number;
  calciteMol: number;
  cshCaToSi: number | null;
  dissolvedSulfateMmolPerKg: number;
  dissolvedChlorideMmolPerKg: number;
};

export type CarbonationScenario = {
  sweep: ScenarioSweep<CarbonationPoint>;
  summary: {
    /** CO2 bound at full carbonation, mol per 100 g binder and mol per m³ of concrete. */
    co2BindingCapacityMolPer100g: number;
    co2BindingCapacityMolPerM3: number;
    /** CO2 uptake at which the pore solution pH falls below the depassivation threshold (null: not within the sweep). */
    depassivationUptakeMolPer100g: number | null;
    depassivationUptakeMolPerM3: number | null;
    depassivationPH: number;
    finalPH: number | null;
    finalPhases: string[];
    /** Sulfate and chloride released to solution by carbonation of AFm/AFt (peak dissolved, mmol/kg). */
    peakDissolvedSulfateMmolPerKg: number;
    peakDissolvedChlorideMmolPerKg: number;
  };
  /** Papadakis et al. (1991) depth against time with the binding capacity and porosity from the engine. */
  depth: CarbonationEstimate | null;
  depthError?: string;
};

/**
 * Carbonation: the paste takes up CO2 step by step to full carbonation (closed system per step, as in the
 * equilibrium carbonation studies of Lothenbach et al. 2008/2012 and Anstice, Page & Page 2005): pH,
 * portlandite, C-S-H Ca/Si, calcite and the sulfate and chloride released from AFm/AFt. The CO2-binding
 * capacity is the uptake at full carbonation; the depassivation point is where the pH falls below the
 * threshold (about 9). Both feed the Papadakis, Vayenas & Fardis (1991, ACI Mater. J. 88, 363) diffusion
 * model for depth against time, with the engine's water-filled and empty pore fraction (pore solution + shrinkage
 * space, gel pores of the C-S-H included) as the paste porosity.
 */
export function carbonationScenario(
  base: ScenarioBase,
  exposure: ExposureInput,
  options: { points: number; coverMm?: number },
): { ok: true; value: CarbonationScenario } | { ok: false; error: SweepFailure } {
  const start = sweepPaste(base, [0], () => ({}), "carbonation-start");
  if (!start.ok) return start;
  const reacted = base.composition.reactedElementsMol;
  const capacityGuessMol = start.value[0].paste.carbonatableCaMol + ((reacted.Na ?? 0) + (reacted.K ?? 0)) / 2;
  const doses = linearDoses(DOSE_RANGE_MULTIPLE * Math.max(capacityGuessMol, 1e-3), options.points);
  // The unexposed paste is the first point's warm start: dose 0 is the same system.
  const swept = sweepPaste({ ...base, warmFrom: start.value[0].paste }, doses, (dose) => ({ addedElementsMol: { C: dose, O: 2 * dose } }), "carbonation");
  if (!swept.ok) return swept;
  const points: CarbonationPoint[] = swept.value.map(({ dose, paste }) => ({
    ...sweepPoint(dose, paste),
    portlanditeMol: phaseMoles(paste, "portlandite"),
    calciteMol: phaseMoles(paste, "calcite") + phaseMoles(paste, "aragonite"),
    cshCaToSi: caToSiOf(paste),
    dissolvedSulfateMmolPerKg: paste.poreSolution?.elementsMmolPerKg.S ?? 0,
    dissolvedChlorideMmolPerKg: paste.poreSolution?.elementsMmolPerKg.Cl ?? 0,
  }));
  const finalCalcite = points[points.length - 1].calciteMol;
  const full = points.find((p) => p.calciteMol >= FULL_CARBONATION_FRACTION * finalCalcite) ?? points[points.length - 1];
  const depassivationPH = thresholds.carbonation.depassivationPH.value;
  let depassivation: number | null = null;
  for (let i = 1; i < points.length; i++) {
    const [a, b] = [points[i - 1], points[i]];
    if (a.pH !== null && b.pH !== null && a.pH >= depassivationPH && b.pH < depassivationPH) {
      depassivation = a.dose + ((a.pH - depassivationPH) / (a.pH - b.pH)) * (b.dose - a.dose);
      break;
    }
  }
  // mol per 100 g binder × binder kg/m³ × 10 (100 g per 0.1 kg) = mol/m³ of concrete.
  const perM3 = (molPer100g: number) => molPer100g * base.binderContentKgPerM3 * 10;
  const last = swept.value[swept.value.length - 1].paste;
  const capacityPerM3 = perM3(full.dose);
  const depth = estimateCarbonation({
    pastePorosity: start.value[0].paste.porosity.waterFilledAndEmptyFraction,
    relativeHumidityPercent: exposure.relativeHumidityPercent ?? DEFAULT_RELATIVE_HUMIDITY_PERCENT,
    co2Percent: exposure.co2Percent,
    bindingCapacityMolPerM3: capacityPerM3,
    coverMm: options.coverMm ?? exposure.coverMm,
  });
  return {
    ok: true,
    value: {
      sweep: { id: "carbonation", title: "Carbonation to completion", doseLabel: "CO2 taken up", doseUnit: "mol CO2 per 100 g binder", points },
      summary: {
        co2BindingCapacityMolPer100g: full.dose,
        co2BindingCapacityMolPerM3: capacityPerM3,
        depassivationUptakeMolPer100g: depassivation,
        depassivationUptakeMolPerM3: depassivation === null ? null : perM3(depassivation),
        depassivationPH,
        finalPH: last.poreSolution?.pH ?? null,
        finalPhases: last.assemblage.phases.map((p) => p.id),
        peakDissolvedSulfateMmolPerKg: Math.max(...points.map((p) => p.dissolvedSulfateMmolPerKg)),
        peakDissolvedChlorideMmolPerKg: Math.max(...points.map((p) => p.dissolvedChlorideMmolPerKg)),
      },
      depth: depth.ok ? depth.value : null,
      depthError: depth.ok ? undefined : depth.error.message,
    },
  };
}
