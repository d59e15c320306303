import { molarMassGPerMol } from "../chem/atomic-weights";
import { bogueAstmC150 } from "../cement/bogue";
import type { OxideAnalysisMassPercent } from "../schema/binder-input";

/**
 * Carbonation depth by the model of Papadakis, Vayenas & Fardis (1989, AIChE J. 35, 1639; 1991, ACI Mater. J.
 * 88(4), 363): CO2 diffuses through the carbonated layer and is bound at a sharp front by the carbonatable
 * constituents. The quasi-steady solution of this moving-boundary problem is
 *
 *   x_c = sqrt( 2 · D_e,CO2 · [CO2]_0 · t / ([CH] + 3[CSH] + 3[C3S] + 2[C2S]) )
 *
 * x_c (m), D_e,CO2 effective CO2 diffusivity of the carbonated material (m²/s), [CO2]_0 the CO2 concentration of
 * the air at the surface (mol/m³ of air), t (s), and the denominator the CO2-binding capacity (mol/m³ of concrete),
 * with CSH written as C3S2H3 (3 CaO per mole) as Papadakis et al. do. The engine will supply the binding
 * capacity from the computed assemblage; `co2BindingCapacityFromOxidesMolPerM3` is the Papadakis-type estimate.
 */

/**
 * D_e,CO2 = 1.64·10⁻⁶ · ε_p^1.8 · (1 − RH/100)^2.2 m²/s, ε_p the porosity of the carbonated hardened cement paste
 * (volume fraction), RH in % (Papadakis, Vayenas & Fardis 1991, ACI Mater. J. 88(4), 363; the coefficient and
 * exponents are recalled from memory and agree with later restatements, e.g. Papadakis 2000, Cem. Concr. Res. 30, 291).
 * Papadakis et al. apply it to concrete with ε_p of the paste.
 */
export const PAPADAKIS_DIFFUSIVITY_PREFACTOR_M2_PER_S = 1.64e-6;
export const PAPADAKIS_POROSITY_EXPONENT = 1.8;
export const PAPADAKIS_HUMIDITY_EXPONENT = 2.2;

/**
 * Molar volume changes on carbonation used by Papadakis et al. (1991) for the porosity reduction of carbonated
 * paste, Δε_c = [CH]·ΔV_CH + [CSH]·ΔV_CSH: ΔV_CH = 3.85 cm³/mol (portlandite → calcite), ΔV_CSH = 15.39 cm³/mol
 * (C3S2H3 → 3 CaCO3 + 2 SiO2·nH2O). Recalled from memory. The CH value agrees with the molar volumes of
 * portlandite (33.06 cm³/mol) and calcite (36.93 cm³/mol) in Robie & Hemingway (1995, USGS Bull. 2131).
 */
export const CARBONATION_VOLUME_CHANGE_CH_M3_PER_MOL = 3.85e-6;
export const CARBONATION_VOLUME_CHANGE_CSH_M3_PER_MOL = 15.39e-6;

/** Molar gas constant, J/(mol·K) (CODATA 2018, exact). */
export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;
/** Standard atmosphere, Pa (definition). */
export const STANDARD_ATMOSPHERE_PA = 101_325;
/** Julian year, s (365.25 d × 86 400 s; IAU). */
export const SECONDS_PER_YEAR = 365.25 * 86_400;
/** 0 °C in K (definition). */
const KELVIN_OFFSET = 273.15;

/**
 * Times beyond this are reported as "more than" it, years: design working lives are at most 100 years (EN 1990
 * Table 2.1, category 5) and the Papadakis model was fitted to decades of exposure, so a figure of thousands of
 * years says only that the front does not arrive within any working life (common practice).
 */
export const CARBONATION_TIME_REPORTING_LIMIT_YEARS = 1000;

/** A time for the carbonation front as reported: rounded years, "more than 1000 years", or "never" (no front progress). */
export function describeCarbonationTime(years: number): string {
  if (!Number.isFinite(years)) return "never (no progress in water-saturated pores)";
  if (years > CARBONATION_TIME_REPORTING_LIMIT_YEARS) return `more than ${CARBONATION_TIME_REPORTING_LIMIT_YEARS} years`;
  return `about ${years.toFixed(0)} years`;
}

/** Relative humidity below which the carbonation reaction, not diffusion, is limiting and the model overestimates (about 50 %, Papadakis et al. 1991; from memory). */
export const REACTION_LIMITED_BELOW_RH_PERCENT = 50;

/** CO2 in air as mol/m³ of air: c = (φ/100)·P/(R·T), ideal gas; φ in % by volume. */
export function co2ConcentrationMolPerM3(co2Percent: number, temperatureC = 20, pressurePa = STANDARD_ATMOSPHERE_PA): number {
  return ((co2Percent / 100) * pressurePa) / (GAS_CONSTANT_J_PER_MOL_K * (temperatureC + KELVIN_OFFSET));
}

/** Effective CO2 diffusivity of carbonated concrete, m²/s (Papadakis et al. 1991; see the constants above). */
export function papadakisEffectiveDiffusivityM2PerS(pastePorosity: number, relativeHumidityPercent: number): number {
  return (
    PAPADAKIS_DIFFUSIVITY_PREFACTOR_M2_PER_S *
    pastePorosity ** PAPADAKIS_POROSITY_EXPONENT *
    Math.max(0, 1 - relativeHumidityPercent / 100) ** PAPADAKIS_HUMIDITY_EXPONENT
  );
}

/** Porosity reduction by carbonation, Δε_c = [CH]·ΔV_CH + [CSH]·ΔV_CSH (volume fraction), amounts in mol/m³ of the material. */
export function carbonationPorosityReduction(portlanditeMolPerM3: number, cshMolPerM3: number): number {
  return portlanditeMolPerM3 * CARBONATION_VOLUME_CHANGE_CH_M3_PER_MOL + cshMolPerM3 * CARBONATION_VOLUME_CHANGE_CSH_M3_PER_MOL;
}

/** Carbonatable constituents in mol/m³ (of concrete, or of paste when used for paste). CSH as C3S2H3. */
export type CarbonatableConstituentsMolPerM3 = {
  portlandite: number;
  csh: number;
  unhydratedC3S: number;
  unhydratedC2S: number;
};

/** CO2-binding capacity [CH] + 3[CSH] + 3[C3S] + 2[C2S], mol CO2 per m³ (Papadakis et al. 1991). */
export function co2BindingCapacityFromPhasesMolPerM3(c: CarbonatableConstituentsMolPerM3): number {
  return c.portlandite + 3 * c.csh + 3 * c.unhydratedC3S + 2 * c.unhydratedC2S;
}

const CLINKER_FORMULAS = {
  C3S: { Ca: 3, Si: 1, O: 5 },
  C2S: { Ca: 2, Si: 1, O: 4 },
  C3A: { Ca: 3, Al: 2, O: 6 },
  C4AF: { Ca: 4, Al: 2, Fe: 2, O: 10 },
} as const;
const molarMass = (phase: keyof typeof CLINKER_FORMULAS) => molarMassGPerMol(CLINKER_FORMULAS[phase]);
const SO3_G_PER_MOL = molarMassGPerMol({ S: 1, O: 3 });

/**
 * Carbonatable constituents of a Portland cement concrete from its oxide analysis, by the hydration scheme of
 * Papadakis, Vayenas & Fardis (1991, ACI Mater. J. 88(2), 186; recalled from memory):
 *   2 C3S + 6 H → C3S2H3 + 3 CH;  2 C2S + 4 H → C3S2H3 + CH;
 *   C3A + CS̄H2 + 10 H → C4AS̄H12;  C3A + CH + 12 H → C4AH13 (C3A beyond the sulfate);  C4AF + 2 CH + 10 H → C6AFH12.
 * Silicates hydrate to degree α; the aluminate and ferrite reactions are taken at the same degree.
 * Potential phases by the ASTM C150 Bogue equations (`bogueAstmC150`). Amounts in mol per m³ of concrete.
 */
export function papadakisConstituentsFromOxidesMolPerM3(
  oxidesMassPercent: OxideAnalysisMassPercent,
  cementKgPerM3: number,
  degreeOfHydration = 1,
): CarbonatableConstituentsMolPerM3 {
  const bogue = bogueAstmC150(oxidesMassPercent);
  const molPerM3 = (massPercent: number, molarMassGPerMol_: number) => ((massPercent / 100) * cementKgPerM3 * 1000) / molarMassGPerMol_;
  const c3s = molPerM3(bogue.phasesMassPercent.C3S, molarMass("C3S"));
  const c2s = molPerM3(bogue.phasesMassPercent.C2S, molarMass("C2S"));
  const c3a = molPerM3(bogue.phasesMassPercent.C3A, molarMass("C3A"));
  const c4af = molPerM3(bogue.phasesMassPercent.C4AF, molarMass("C4AF"));
  const gypsum = molPerM3(bogue.calciumSulfateSO3MassPercent, SO3_G_PER_MOL);
  const a = degreeOfHydration;
  const portlandite = a * (1.5 * c3s + 0.5 * c2s - Math.max(0, c3a - gypsum) - 2 * c4af);
  return {
    portlandite: Math.max(0, portlandite),
    csh: a * 0.5 * (c3s + c2s),
    unhydratedC3S: (1 - a) * c3s,
    unhydratedC2S: (1 - a) * c2s,
  };
}

/** The Papadakis CO2-binding capacity of a Portland cement concrete from its oxide analysis, mol/m³ of concrete. */
export function co2BindingCapacityFromOxidesMolPerM3(
  oxidesMassPercent: OxideAnalysisMassPercent,
  cementKgPerM3: number,
  degreeOfHydration = 1,
): number {
  return co2BindingCapacityFromPhasesMolPerM3(papadakisConstituentsFromOxidesMolPerM3(oxidesMassPercent, cementKgPerM3, degreeOfHydration));
}

/** x_c = sqrt(2 D [CO2] t / B), in mm, for t in years. */
export function carbonationDepthMm(effectiveDiffusivityM2PerS: number, co2MolPerM3: number, bindingCapacityMolPerM3: number, timeYears: number): number {
  return 1000 * Math.sqrt((2 * effectiveDiffusivityM2PerS * co2MolPerM3 * timeYears * SECONDS_PER_YEAR) / bindingCapacityMolPerM3);
}

/** Carbonation coefficient k = x_c/√t, mm/√year (the depth after one year). */
export function carbonationCoefficientMmPerSqrtYear(effectiveDiffusivityM2PerS: number, co2MolPerM3: number, bindingCapacityMolPerM3: number): number {
  return carbonationDepthMm(effectiveDiffusivityM2PerS, co2MolPerM3, bindingCapacityMolPerM3, 1);
}

/** Time for the front to reach a depth, t = (x/k)², years; Infinity where k = 0. */
export function timeToReachDepthYears(depthMm: number, coefficientMmPerSqrtYear: number): number {
  return coefficientMmPerSqrtYear > 0 ? (depthMm / coefficientMmPerSqrtYear) ** 2 : Number.POSITIVE_INFINITY;
}

export type CarbonationInput = {
  /** Porosity of the carbonated hardened cement paste, volume fraction (0, 1). */
  pastePorosity: number;
  relativeHumidityPercent: number;
  /** CO2 in air, % by volume (default 0.04). */
  co2Percent?: number;
  /** Air temperature for the CO2 concentration, °C (default 20). */
  temperatureC?: number;
  bindingCapacityMolPerM3: number;
  coverMm?: number;
  /** Times for the depth curve, years (default 1, 2, 5, 10, 20, 50, 100). */
  timesYears?: number[];
};

export type CarbonationEstimate = {
  effectiveDiffusivityM2PerS: number;
  co2MolPerM3: number;
  bindingCapacityMolPerM3: number;
  coefficientMmPerSqrtYear: number;
  depthCurve: Array<{ timeYears: number; depthMm: number }>;
  /** Years for the front to reach the cover; Infinity where the model gives no progress (RH 100 %). */
  timeToCoverYears?: number;
  notes: string[];
  basis: string;
  /** The advisory layer attaches `cautionsFor("carbonation-depth")` (lib/advisory/cautions) to this result; scenarios sit below it. */
  cautionKind: "carbonation-depth";
};

export type CarbonationError = { code: "invalid-input"; field: string; message: string };

const within = (field: string, value: number | undefined, min: number, max: number, unit: string, exclusive = false): CarbonationError | undefined => {
  if (value === undefined) return undefined;
  const ok = Number.isFinite(value) && (exclusive ? value > min && value < max : value >= min && value <= max);
  return ok ? undefined : { code: "invalid-input", field, message: `${field} must be ${exclusive ? "strictly " : ""}within ${min}–${max}${unit}, got ${value}` };
};

/** Carbonation depth against time and the time to reach the cover, with notes and cautions; typed error on bad input. */
export function estimateCarbonation(input: CarbonationInput): { ok: true; value: CarbonationEstimate } | { ok: false; error: CarbonationError } {
  const { pastePorosity, relativeHumidityPercent, bindingCapacityMolPerM3, coverMm } = input;
  const co2Percent = input.co2Percent ?? 0.04;
  const temperatureC = input.temperatureC ?? 20;
  const timesYears = input.timesYears ?? [1, 2, 5, 10, 20, 50, 100];
  const error =
    within("pastePorosity", pastePorosity, 0, 1, "", true) ??
    within("relativeHumidityPercent", relativeHumidityPercent, 0, 100, " %") ??
    within("co2Percent", co2Percent, 0, 100, " % by volume") ??
    within("temperatureC", temperatureC, -40, 60, " °C") ??
    within("bindingCapacityMolPerM3", bindingCapacityMolPerM3, 0, 50_000, " mol/m³", true) ??
    within("coverMm", coverMm, 0, 500, " mm", true) ??
    (timesYears.length > 1000 ? { code: "invalid-input" as const, field: "timesYears", message: "timesYears may hold at most 1000 values" } : undefined) ??
    timesYears.map((t, i) => within(`timesYears.${i}`, t, 0, 10_000, " years")).find((e) => e !== undefined);
  if (error) return { ok: false, error };

  const notes: string[] = [];
  const effectiveDiffusivityM2PerS = papadakisEffectiveDiffusivityM2PerS(pastePorosity, relativeHumidityPercent);
  const co2MolPerM3 = co2ConcentrationMolPerM3(co2Percent, temperatureC);
  const k = carbonationCoefficientMmPerSqrtYear(effectiveDiffusivityM2PerS, co2MolPerM3, bindingCapacityMolPerM3);
  if (relativeHumidityPercent < REACTION_LIMITED_BELOW_RH_PERCENT)
    notes.push(`Below about ${REACTION_LIMITED_BELOW_RH_PERCENT} % RH too little pore water is left for the reaction: the diffusion model overestimates the depth.`);
  if (relativeHumidityPercent >= 100) notes.push("At 100 % RH the pores are water-filled and the model gives no gas diffusion: carbonation is negligible.");
  return {
    ok: true,
    value: {
      effectiveDiffusivityM2PerS,
      co2MolPerM3,
      bindingCapacityMolPerM3,
      coefficientMmPerSqrtYear: k,
      depthCurve: timesYears.map((t) => ({ timeYears: t, depthMm: k * Math.sqrt(t) })),
      timeToCoverYears: coverMm === undefined ? undefined : timeToReachDepthYears(coverMm, k),
      notes,
      basis:
        "Papadakis, Vayenas & Fardis (1989, AIChE J. 35, 1639; 1991, ACI Mater. J. 88, 363): x = sqrt(2·De·[CO2]·t/B), " +
        "De = 1.64e-6·εp^1.8·(1 − RH)^2.2 m²/s.",
      cautionKind: "carbonation-depth",
    },
  };
}
