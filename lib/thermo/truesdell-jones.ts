import type { AqueousActivityModel } from "../equilibrium/types";
import { debyeHuckelParameters } from "./debye-huckel";
import { waterMolarMassKgPerMol } from "./physical-constants";
import { ThermoInputError, requireInRange } from "./thermo-error";

/**
 * Extended Debye–Hückel ("b-dot") activity model with one ion size and one b-dot for all ions
 * (Helgeson 1969, Am. J. Sci. 267, 729; Helgeson, Kirkham & Flowers 1981, Am. J. Sci. 281, 1249),
 * the form with an added linear term that Truesdell & Jones (1974, J. Res. USGS 2, 233) also used:
 *
 *   charged solute i:  log₁₀ γᵢ = −A zᵢ² √I / (1 + B å √I) + ḃ I
 *   neutral solute:    log₁₀ γ = 0 ("unity") or ḃ I ("salting-out"), as chosen
 *
 * A, B from `debye-huckel.ts` at the temperature of the model; I in mol/kg; å in Å; ḃ in kg/mol.
 *
 * Water activity from the Gibbs–Duhem relation. Per kilogram of water,
 *   (1/M_w) d ln a_w = −Σᵢ mᵢ d ln(mᵢ γᵢ).
 * Integrate along the dilution path mᵢ = λ mᵢ⁰ (λ from 0 to 1), on which I = λ I⁰ and the ratios
 * m_charged / I and m_neutral / I stay fixed:
 *   Σ mᵢ d ln mᵢ = d m_T                                          → m_T
 *   Σ_charged mᵢ d(−A zᵢ² x/(1 + a x)), x = √I, a = B å, Σ mᵢ zᵢ² = 2I = 2x²
 *       = −2A x² dx / (1 + a x)²                                   → −2A F(x)
 *   Σ_γ mᵢ d(ḃ I) = ḃ m_γ dI, with m_γ ∝ I on the path           → ḃ m_γ I / 2
 * where F(x) = ∫₀ˣ t²/(1 + a t)² dt = [(1 + a x) − 2 ln(1 + a x) − 1/(1 + a x)] / a³ and m_γ is the
 * molality of the solutes carrying the ḃ I term (charged, plus neutral for "salting-out"). Hence
 *
 *   ln a_w = −M_w [ m_T − 2 ln10 · A · F(√I) + ln10 · ḃ · m_γ · I / 2 ],   M_w = 0.01801528 kg/mol,
 *
 * and the osmotic coefficient is φ = −ln a_w / (M_w m_T).
 *
 * Consistency: the Debye–Hückel part satisfies Gibbs–Duhem for any change of composition. The ḃ I term
 * with one ḃ for ions of different charge is not an exact differential (∂ ln γᵢ/∂mⱼ ≠ ∂ ln γⱼ/∂mᵢ when
 * zᵢ² ≠ zⱼ²), a known property of this model, so Gibbs–Duhem holds exactly only along paths that keep
 * m_γ / I fixed (dilution or concentration at fixed proportions, e.g. evaporation). The tests check both.
 *
 * No cap on I is applied: the expressions are finite and smooth for every I ≥ 0. The model is meant for
 * I up to about 1 mol/kg (`truesdellJonesValidIonicStrengthMolPerKg`, common practice; Helgeson 1969
 * fitted NaCl solutions to about 3 mol/kg); callers should flag results beyond it.
 */
export type TruesdellJonesParameters = {
  /** Common ion-size parameter å, Å. */
  ionSizeAngstrom: number;
  /** Common b-dot ḃ, kg/mol. */
  bDotKgPerMol: number;
  /** Neutral solutes: γ = 1 ("unity") or log₁₀ γ = ḃ I ("salting-out"). */
  neutral: "unity" | "salting-out";
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

/**
 * The b-dot activity model at `temperatureK` (273.15–373.15 K, 1 bar). `params` defaults to the
 * NaCl-dominated set. Throws ThermoInputError for a temperature out of range or invalid parameters;
 * the returned functions throw it for negative or non-finite molalities.
 */
export function truesdellJonesModel(temperatureK: number, params: TruesdellJonesParameters = sodiumChlorideDominatedParameters): AqueousActivityModel {
  // Ion sizes in the literature lie between about 2 and 11 Å (Kielland 1937); 0 < å ≤ 20 Å is accepted.
  requireInRange("params.ionSizeAngstrom", params.ionSizeAngstrom, 0, 20, "Å");
  if (params.ionSizeAngstrom === 0) {
    throw new ThermoInputError("below-minimum", "params.ionSizeAngstrom", 0, 0, "params.ionSizeAngstrom must be greater than 0 Å");
  }
  // Published b-dot values are of order 0.01–0.2 kg/mol; |ḃ| ≤ 1 kg/mol is accepted.
  requireInRange("params.bDotKgPerMol", params.bDotKgPerMol, -1, 1, "kg/mol");
  if (params.neutral !== "unity" && params.neutral !== "salting-out") {
    throw new ThermoInputError("missing-field", "params.neutral", undefined, undefined, `params.neutral must be "unity" or "salting-out"`);
  }
  const { aKgHalfPerMolHalf: a, bKgHalfPerMolHalfPerAngstrom: b } = debyeHuckelParameters(temperatureK);
  const ionSizeTerm = b * params.ionSizeAngstrom;
  const bDot = params.bDotKgPerMol;
  const neutralCarriesBDot = params.neutral === "salting-out";

  return {
    log10Gamma(charge: number, ionicStrengthMolPerKg: number): number {
      requireMolality("ionicStrengthMolPerKg", ionicStrengthMolPerKg);
      if (!Number.isFinite(charge)) {
        throw new ThermoInputError("not-finite", "charge", charge, undefined, `charge must be a finite number (got ${charge})`);
      }
      if (charge === 0) return neutralCarriesBDot ? bDot * ionicStrengthMolPerKg : 0;
      const rootI = Math.sqrt(ionicStrengthMolPerKg);
      return (-a * charge * charge * rootI) / (1 + ionSizeTerm * rootI) + bDot * ionicStrengthMolPerKg;
    },

    lnWaterActivity(totalSoluteMolPerKg: number, chargedSoluteMolPerKg: number, ionicStrengthMolPerKg: number): number {
      requireMolality("totalSoluteMolPerKg", totalSoluteMolPerKg);
      requireMolality("chargedSoluteMolPerKg", chargedSoluteMolPerKg);
      requireMolality("ionicStrengthMolPerKg", ionicStrengthMolPerKg);
      const bDotMolality = neutralCarriesBDot ? totalSoluteMolPerKg : chargedSoluteMolPerKg;
      const debyeHuckelTerm = 2 * Math.LN10 * a * debyeHuckelOsmoticIntegral(Math.sqrt(ionicStrengthMolPerKg), ionSizeTerm);
      const bDotTerm = (Math.LN10 * bDot * bDotMolality * ionicStrengthMolPerKg) / 2;
      return -waterMolarMassKgPerMol * (totalSoluteMolPerKg - debyeHuckelTerm + bDotTerm);
    },
  };
}
