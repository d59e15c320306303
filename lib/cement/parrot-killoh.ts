import constants from "../data/binders/parrot-killoh-constants.json";
import { gasConstantJPerMolK } from "../thermo/physical-constants";

/**
 * Parrot & Killoh (1984, Br. Ceram. Proc. 35, 41) hydration of the four clinker phases, in the form used by
 * Lothenbach & Winnefeld (2006, Cem. Concr. Res. 36, 209) and Lothenbach et al. (2008, Cem. Concr. Res. 38, 1).
 * For each phase, with α the degree of reaction (0–1) and t in days, the rate is the smallest of
 *   nucleation and growth  R_NG = K1/N1 · (1 − α) · (−ln(1 − α))^(1 − N1)
 *   diffusion              R_D  = K2 · (1 − α)^(2/3) / (1 − (1 − α)^(1/3))
 *   formation of shell     R_S  = K3 · (1 − α)^N3
 * multiplied by
 *   the water/cement factor  f(w/c) = (1 + 3.333 · (H · w/c − α))^4 when α > H · w/c, else 1 (zero once the
 *                            bracket is negative: no space left),
 *   the fineness factor      A / A0, A the Blaine fineness, A0 = 385 m²/kg,
 *   the Arrhenius factor     exp(−Ea/R · (1/T − 1/T0)), T0 = 293.15 K (20 °C), Ea per phase (Lothenbach et al. 2008,
 *                            citing Schindler 2004, ACI Mater. J. 101, 72).
 * Constants: `lib/data/binders/parrot-killoh-constants.json` (recalled, see its provenance).
 */
export type ClinkerReactingPhase = "alite" | "belite" | "aluminate" | "ferrite";
export const clinkerReactingPhases: readonly ClinkerReactingPhase[] = ["alite", "belite", "aluminate", "ferrite"];

export type ParrotKillohPhaseConstants = {
  K1PerDay: number;
  N1: number;
  K2PerDay: number;
  K3PerDay: number;
  N3: number;
  H: number;
  activationEnergyJPerMol: number;
};

export type ParrotKillohConditions = {
  /** Water/cement mass ratio (for a blended binder, the caller decides which ratio to pass; see the report). */
  waterCementRatio: number;
  blaineM2PerKg: number;
  curingTemperatureC: number;
};

export const parrotKillohConstants: Record<ClinkerReactingPhase, ParrotKillohPhaseConstants> = constants.phases;
const referenceBlaineM2PerKg = constants.referenceBlaineM2PerKg;
const referenceTemperatureK = constants.referenceTemperatureC + 273.15;
const waterFactorSlope = constants.waterCementFactorSlope;
const waterFactorExponent = constants.waterCementFactorExponent;

/** Degree of reaction is kept below 1 by this margin so ln(1 − α) stays finite (numerical guard). */
const maxDegree = 1 - 1e-12;

/** The three Parrot–Killoh rates (1/day) at degree α, without the w/c, fineness and temperature factors. */
export function parrotKillohStageRates(c: ParrotKillohPhaseConstants, degree: number) {
  const remaining = 1 - degree;
  const nucleationGrowth = (c.K1PerDay / c.N1) * remaining * Math.pow(-Math.log(remaining), 1 - c.N1);
  const cubeRoot = Math.cbrt(remaining);
  const diffusion = (c.K2PerDay * Math.pow(remaining, 2 / 3)) / (1 - cubeRoot);
  const shell = c.K3PerDay * Math.pow(remaining, c.N3);
  return { nucleationGrowth, diffusion, shell };
}

/** f(w/c) of Parrot & Killoh (1984): 1 while α ≤ H·w/c, then (1 + 3.333 (H·w/c − α))^4, never below 0. */
export function waterCementFactor(c: ParrotKillohPhaseConstants, degree: number, waterCementRatio: number): number {
  const critical = c.H * waterCementRatio;
  if (degree <= critical) return 1;
  const base = 1 + waterFactorSlope * (critical - degree);
  return base <= 0 ? 0 : Math.pow(base, waterFactorExponent);
}

/** Product of the fineness factor A/A0 and the Arrhenius factor, dimensionless. */
export function conditionFactor(c: ParrotKillohPhaseConstants, conditions: ParrotKillohConditions): number {
  const temperatureK = conditions.curingTemperatureC + 273.15;
  const arrhenius = Math.exp((-c.activationEnergyJPerMol / gasConstantJPerMolK) * (1 / temperatureK - 1 / referenceTemperatureK));
  return (conditions.blaineM2PerKg / referenceBlaineM2PerKg) * arrhenius;
}

/** dα/dt (1/day) of one phase at degree α under the given conditions. */
export function parrotKillohRatePerDay(c: ParrotKillohPhaseConstants, degree: number, conditions: ParrotKillohConditions): number {
  return rateWithFactor(c, degree, conditions.waterCementRatio, conditionFactor(c, conditions));
}

function rateWithFactor(c: ParrotKillohPhaseConstants, degree: number, waterCementRatio: number, factor: number): number {
  if (degree >= maxDegree) return 0;
  // Same equations as parrotKillohStageRates, inlined without allocation (the integrator calls this ~4000 times).
  const remaining = 1 - degree;
  const cubeRoot = Math.cbrt(remaining);
  const nucleationGrowth = (c.K1PerDay / c.N1) * remaining * Math.pow(-Math.log(remaining), 1 - c.N1);
  const diffusion = (c.K2PerDay * cubeRoot * cubeRoot) / (1 - cubeRoot);
  const shell = c.K3PerDay * Math.pow(remaining, c.N3);
  const controlling = Math.min(nucleationGrowth, diffusion, shell);
  return controlling * waterCementFactor(c, degree, waterCementRatio) * factor;
}

/** Start of the integration, days: early enough that nucleation and growth alone control (checked in the tests). */
const startAgeDays = 1e-6;
/** RK4 steps per decade of age (logarithmic stepping): 1e-6 d to 10 years is under 1000 steps; 100 and 200 per decade agree to 1e-3 in α. */
const stepsPerDecade = 100;

/**
 * Degree of reaction of one phase at each of the requested ages (days, any order), by fourth-order
 * Runge–Kutta in s = ln t (dα/ds = t · dα/dt), starting from the closed-form nucleation-and-growth solution
 * α = 1 − exp(−(F·K1·t)^(1/N1)) at t = 1e-6 d, F the condition factor.
 */
export function parrotKillohDegreeSeries(
  c: ParrotKillohPhaseConstants,
  agesDays: readonly number[],
  conditions: ParrotKillohConditions,
): number[] {
  const order = agesDays.map((age, index) => ({ age, index })).sort((a, b) => a.age - b.age);
  const result = new Array<number>(agesDays.length).fill(0);
  const factor = conditionFactor(c, conditions);
  const derivative = (s: number, degree: number) =>
    Math.exp(s) * rateWithFactor(c, Math.min(Math.max(degree, 0), maxDegree), conditions.waterCementRatio, factor);
  let s = Math.log(startAgeDays);
  let degree = 1 - Math.exp(-Math.pow(factor * c.K1PerDay * startAgeDays, 1 / c.N1));
  const stepS = Math.log(10) / stepsPerDecade;
  for (const { age, index } of order) {
    if (!(age > 0)) {
      result[index] = 0;
      continue;
    }
    if (age <= startAgeDays) {
      result[index] = 1 - Math.exp(-Math.pow(factor * c.K1PerDay * age, 1 / c.N1));
      continue;
    }
    const targetS = Math.log(age);
    while (s < targetS) {
      const h = Math.min(stepS, targetS - s);
      const k1 = derivative(s, degree);
      const k2 = derivative(s + h / 2, degree + (h / 2) * k1);
      const k3 = derivative(s + h / 2, degree + (h / 2) * k2);
      const k4 = derivative(s + h, degree + h * k3);
      degree = Math.min(maxDegree, degree + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4));
      s += h;
    }
    result[index] = degree;
  }
  return result;
}

/** Degrees of reaction of alite, belite, aluminate and ferrite at each requested age (days). */
export function parrotKillohDegrees(agesDays: readonly number[], conditions: ParrotKillohConditions): Record<ClinkerReactingPhase, number[]> {
  return {
    alite: parrotKillohDegreeSeries(parrotKillohConstants.alite, agesDays, conditions),
    belite: parrotKillohDegreeSeries(parrotKillohConstants.belite, agesDays, conditions),
    aluminate: parrotKillohDegreeSeries(parrotKillohConstants.aluminate, agesDays, conditions),
    ferrite: parrotKillohDegreeSeries(parrotKillohConstants.ferrite, agesDays, conditions),
  };
}
