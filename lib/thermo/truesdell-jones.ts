import type { AqueousActivityModel, SoluteActivityTerms } from "../equilibrium/types";
import { debyeHuckelParameters } from "./debye-huckel";
import { waterMolarMassKgPerMol } from "./physical-constants";
import { ThermoInputError, requireInRange } from "./thermo-error";

/**
 * Extended Debye–Hückel ("b-dot") activity model (Helgeson 1969, Am. J. Sci. 267, 729; Helgeson, Kirkham &
 * Flowers 1981, Am. J. Sci. 281, 1249) with one common ion size å and b-dot ḃ, and optionally, for the ions
 * that have them, the individual å and ḃ of Truesdell & Jones (1974, J. Res. U.S. Geol. Surv. 2, 233):
 *
 *   charged solute i:  log₁₀ γᵢ = −A zᵢ² √I / (1 + B åᵢ √I) + ḃᵢ I
 *   neutral solute:    log₁₀ γ = 0 ("unity") or ḃ I ("salting-out", common ḃ), as chosen
 *
 * A, B from `debye-huckel.ts` at the temperature of the model; I in mol/kg; å in Å; ḃ in kg/mol.
 *
 * Water activity from the Gibbs–Duhem relation. Per kilogram of water,
 *   (1/M_w) d ln a_w = −Σᵢ mᵢ d ln(mᵢ γᵢ).
 * Integrate along the dilution path mᵢ = λ mᵢ⁰ (λ from 0 to 1), on which I = λ I⁰ and every mᵢ / I stays
 * fixed:
 *   Σ mᵢ d ln mᵢ = d m_T                                                        → m_T
 *   mᵢ d(−A zᵢ² x/(1 + aᵢ x)), x = √I, aᵢ = B åᵢ, mᵢ = (mᵢ⁰/I⁰) x²              → −A zᵢ² mᵢ F(x, aᵢ)/I
 *   mᵢ d(ḃᵢ I) with mᵢ ∝ I on the path                                         → ḃᵢ mᵢ I / 2
 * where F(x, a) = ∫₀ˣ t²/(1 + a t)² dt = [(1 + a x) − 2 ln(1 + a x) − 1/(1 + a x)] / a³. Hence
 *
 *   ln a_w = −M_w Σᵢ mᵢ cᵢ(I),   cᵢ = 1 − ln10 · A zᵢ² F(√I, aᵢ)/I + ln10 · ḃᵢ I / 2,   M_w = 0.01801528 kg/mol,
 *
 * (ḃᵢ = 0 for neutral solutes under "unity"), and the osmotic coefficient is φ = −ln a_w / (M_w m_T). With one
 * common å, Σ mᵢ zᵢ² = 2I turns the Debye–Hückel part into −2 ln10 · A F(√I, a).
 *
 * Consistency: with one å the Debye–Hückel part satisfies Gibbs–Duhem for any change of composition. The
 * ḃ I terms, and Debye–Hückel terms with different åᵢ, are not an exact differential (∂ ln γᵢ/∂mⱼ ≠
 * ∂ ln γⱼ/∂mᵢ), a known property of this model family, so Gibbs–Duhem then holds exactly only along paths
 * that keep the proportions mᵢ / I fixed (dilution or concentration, e.g. evaporation). The tests check both.
 *
 * No cap on I is applied: the expressions are finite and smooth for every I ≥ 0. The model is meant for
 * I up to about 1 mol/kg (`truesdellJonesValidIonicStrengthMolPerKg`, common practice; Helgeson 1969
 * fitted NaCl solutions to about 3 mol/kg); callers should flag results beyond it.
 */
/** å and ḃ of one ion. */
export type IonParameters = {
  /** Ion-size parameter å, Å. */
  ionSizeAngstrom: number;
  /** b-dot ḃ, kg/mol. */
  bDotKgPerMol: number;
};

export type TruesdellJonesParameters = IonParameters & {
  /** Neutral solutes: γ = 1 ("unity") or log₁₀ γ = ḃ I ("salting-out"), with the common ḃ. */
  neutral: "unity" | "salting-out";
  /**
   * Ions with their own published å and ḃ (Truesdell & Jones 1974), by species id; every other ion
   * takes the common pair above.
   */
  individual?: Record<string, IonParameters>;
};

/** NaCl-dominated solutions: å = 3.72 Å, ḃ = 0.064 kg/mol at 25 °C (Helgeson, Kirkham & Flowers 1981). Neutral γ = 1. */
export const sodiumChlorideDominatedParameters: TruesdellJonesParameters = {
  ionSizeAngstrom: 3.72,
  bDotKgPerMol: 0.064,
  neutral: "unity",
};

/**
 * KOH-dominated solutions, as used for cement pore solutions: å = 3.67 Å, ḃ = 0.123 kg/mol
 * (Helgeson, Kirkham & Flowers 1981, via Lothenbach & Winnefeld 2006, Cem. Concr. Res. 36, 209). Neutral γ = 1.
 */
export const potassiumHydroxideDominatedParameters: TruesdellJonesParameters = {
  ionSizeAngstrom: 3.67,
  bDotKgPerMol: 0.123,
  neutral: "unity",
};

/** Ionic strength up to which the model is considered adequate, mol/kg (common practice). */
export const truesdellJonesValidIonicStrengthMolPerKg = 1;

/** Below this a·√I the closed form of F loses digits to cancellation; use its power series instead. */
const seriesThreshold = 0.1;
const maximumSeriesTerms = 60;

/**
 * F(x) = ∫₀ˣ t²/(1 + a t)² dt. Closed form, or for a x < 0.1 the series
 * F = x³ Σₙ (−1)ⁿ (n + 1)(a x)ⁿ / (n + 3), which converges geometrically (ratio < 0.1).
 */
export function debyeHuckelOsmoticIntegral(x: number, a: number): number {
  const ax = a * x;
  if (ax < seriesThreshold) {
    let sum = 0;
    let power = 1;
    for (let n = 0; n < maximumSeriesTerms; n++) {
      const term = ((n % 2 === 0 ? 1 : -1) * (n + 1) * power) / (n + 3);
      sum += term;
      if (Math.abs(term) < 1e-17 * Math.abs(sum)) break;
      power *= ax;
    }
    return x ** 3 * sum;
  }
  const onePlusAx = 1 + ax;
  return (onePlusAx - 2 * Math.log1p(ax) - 1 / onePlusAx) / a ** 3;
}

function requireMolality(field: string, valueMolPerKg: number): void {
  if (!Number.isFinite(valueMolPerKg)) {
    throw new ThermoInputError("not-finite", field, valueMolPerKg, undefined, `${field} must be a finite number (got ${valueMolPerKg})`);
  }
  if (valueMolPerKg < 0) {
    throw new ThermoInputError("below-minimum", field, valueMolPerKg, 0, `${field} = ${valueMolPerKg} mol/kg is below the minimum 0 mol/kg`);
  }
}

/** One solute in a solution: id (for individual parameters), charge and molality, mol/kg. */
export type SoluteMolality = { speciesId: string; charge: number; molalityMolPerKg: number };

/**
 * ln a(H2O) = −M_w Σᵢ mᵢ cᵢ(I) of a solution, I = ½ Σ mᵢ zᵢ² (mol/kg). A convenience over
 * `waterCoefficient` for checks and callers outside the engine.
 */
export function lnWaterActivityOf(model: AqueousActivityModel, solutes: SoluteMolality[]): number {
  let ionicStrength = 0;
  for (const s of solutes) {
    requireMolality("molalityMolPerKg", s.molalityMolPerKg);
    ionicStrength += 0.5 * s.molalityMolPerKg * s.charge * s.charge;
  }
  let sum = 0;
  for (const s of solutes) sum += s.molalityMolPerKg * model.waterCoefficient(s.speciesId, s.charge, ionicStrength);
  return -waterMolarMassKgPerMol * sum;
}

/**
 * d(F/x²)/dx = 1/(1 + a x)² − 2F/x³, finite (→ 1/3) as x → 0; F/x³ from the series where a x is small,
 * so no digits are lost to cancellation.
 */
function osmoticRatioSlope(x: number, a: number): number {
  const ax = a * x;
  const fOverX3 = ax < seriesThreshold ? debyeHuckelOsmoticIntegral(1, ax) : debyeHuckelOsmoticIntegral(x, a) / (x * x * x);
  return 1 / ((1 + ax) * (1 + ax)) - 2 * fOverX3;
}

/** F(x, a)/x² (x = √I), the ratio the water coefficient needs; finite (→ 0) as x → 0. */
function osmoticIntegralOverIonicStrength(x: number, a: number): number {
  if (x === 0) return 0;
  return debyeHuckelOsmoticIntegral(x, a) / (x * x);
}

function requireIonParameters(field: string, ionSizeAngstrom: number, bDotKgPerMol: number): void {
  // Ion sizes in the literature lie between about 2 and 11 Å (Kielland 1937); 0 < å ≤ 20 Å is accepted.
  requireInRange(`${field}.ionSizeAngstrom`, ionSizeAngstrom, 0, 20, "Å");
  if (ionSizeAngstrom === 0) {
    throw new ThermoInputError("below-minimum", `${field}.ionSizeAngstrom`, 0, 0, `${field}.ionSizeAngstrom must be greater than 0 Å`);
  }
  // Published b-dot values are of order −0.05 to 0.2 kg/mol; |ḃ| ≤ 1 kg/mol is accepted.
  requireInRange(`${field}.bDotKgPerMol`, bDotKgPerMol, -1, 1, "kg/mol");
}

/**
 * The b-dot activity model at `temperatureK` (273.15–373.15 K, 1 bar). `params` defaults to the
 * NaCl-dominated set. Solutes listed in `params.individual` use their own å and ḃ (the Truesdell–Jones
 * form); the others use the common pair. Throws ThermoInputError for a temperature out of range or invalid
 * parameters; the returned functions throw it for negative or non-finite ionic strength.
 *
 * Water coefficient (derivation in the header): cᵢ(I) = 1 − ln10 · A zᵢ² F(√I, B åᵢ)/I + ln10 · ḃᵢ I / 2,
 * with ḃᵢ = 0 for neutral solutes under "unity". For one common å, Σ mᵢ zᵢ² = 2I gives back the
 * closed form ln a_w = −M_w [m_T − 2 ln10 A F + ln10 ḃ m_γ I / 2].
 */
export function truesdellJonesModel(temperatureK: number, params: TruesdellJonesParameters = sodiumChlorideDominatedParameters): AqueousActivityModel {
  requireIonParameters("params", params.ionSizeAngstrom, params.bDotKgPerMol);
  if (params.neutral !== "unity" && params.neutral !== "salting-out") {
    throw new ThermoInputError("missing-field", "params.neutral", undefined, undefined, `params.neutral must be "unity" or "salting-out"`);
  }
  const individual = params.individual ?? {};
  for (const [id, ion] of Object.entries(individual)) requireIonParameters(`params.individual.${id}`, ion.ionSizeAngstrom, ion.bDotKgPerMol);
  const { aKgHalfPerMolHalf: a, bKgHalfPerMolHalfPerAngstrom: b } = debyeHuckelParameters(temperatureK);
  const neutralCarriesBDot = params.neutral === "salting-out";
  const parametersOf = (speciesId: string, charge: number): IonParameters | undefined =>
    charge !== 0 ? (individual[speciesId] ?? params) : undefined;
  const requireCharge = (charge: number) => {
    if (!Number.isFinite(charge)) throw new ThermoInputError("not-finite", "charge", charge, undefined, `charge must be a finite number (got ${charge})`);
  };

  return {
    parameterKey(speciesId: string, charge: number): string {
      return charge !== 0 && individual[speciesId] ? `id:${speciesId}` : `z:${charge}`;
    },

    log10Gamma(speciesId: string, charge: number, ionicStrengthMolPerKg: number): number {
      requireMolality("ionicStrengthMolPerKg", ionicStrengthMolPerKg);
      requireCharge(charge);
      const ion = parametersOf(speciesId, charge);
      if (!ion) return neutralCarriesBDot ? params.bDotKgPerMol * ionicStrengthMolPerKg : 0;
      const rootI = Math.sqrt(ionicStrengthMolPerKg);
      return (-a * charge * charge * rootI) / (1 + b * ion.ionSizeAngstrom * rootI) + ion.bDotKgPerMol * ionicStrengthMolPerKg;
    },

    soluteTerms(speciesId: string, charge: number): (ionicStrengthMolPerKg: number) => SoluteActivityTerms {
      requireCharge(charge);
      const ion = parametersOf(speciesId, charge);
      if (!ion) {
        const bDot = neutralCarriesBDot ? params.bDotKgPerMol : 0;
        return (ionicStrength) => [Math.LN10 * bDot * ionicStrength, Math.LN10 * bDot, 1 + (Math.LN10 * bDot * ionicStrength) / 2, (Math.LN10 * bDot) / 2];
      }
      const az2 = a * charge * charge;
      const sizeTerm = b * ion.ionSizeAngstrom;
      const bDot = ion.bDotKgPerMol;
      return (ionicStrength) => {
        const x = Math.sqrt(ionicStrength);
        const denominator = 1 + sizeTerm * x;
        const lnGamma = Math.LN10 * ((-az2 * x) / denominator + bDot * ionicStrength);
        const c = 1 - Math.LN10 * az2 * osmoticIntegralOverIonicStrength(x, sizeTerm) + (Math.LN10 * bDot * ionicStrength) / 2;
        if (x === 0) return [lnGamma, 0, c, 0];
        const dLnGamma = Math.LN10 * (-az2 / (2 * x * denominator * denominator) + bDot);
        const dc = -Math.LN10 * az2 * (osmoticRatioSlope(x, sizeTerm) / (2 * x)) + (Math.LN10 * bDot) / 2;
        return [lnGamma, dLnGamma, c, dc];
      };
    },

    waterCoefficient(speciesId: string, charge: number, ionicStrengthMolPerKg: number): number {
      requireMolality("ionicStrengthMolPerKg", ionicStrengthMolPerKg);
      requireCharge(charge);
      const ion = parametersOf(speciesId, charge);
      if (!ion) return 1 + (neutralCarriesBDot ? (Math.LN10 * params.bDotKgPerMol * ionicStrengthMolPerKg) / 2 : 0);
      const rootI = Math.sqrt(ionicStrengthMolPerKg);
      const debyeHuckel = Math.LN10 * a * charge * charge * osmoticIntegralOverIonicStrength(rootI, b * ion.ionSizeAngstrom);
      return 1 - debyeHuckel + (Math.LN10 * ion.bDotKgPerMol * ionicStrengthMolPerKg) / 2;
    },
  };
}
