import { hydrationModelData } from "./curing-data";
import { cementFractionOfBinder, scmFraction, type CuringBinder } from "./binder-description";

export type HydrationParameters = {
  /** Hydration time parameter τ, h of equivalent age at the model's reference temperature. */
  tauH: number;
  /** Hydration shape parameter β (dimensionless). */
  beta: number;
  /** Ultimate degree of hydration αu (0–1). */
  ultimateDegree: number;
};

const model = hydrationModelData;
const floor = model.defaults.minimumPhaseFraction.value;

/** Fly-ash fraction of the binder and its CaO mass fraction (default: typical class F). */
export function flyAshTerms(binder: CuringBinder): { fraction: number; caoMassFraction: number } {
  const ashes = binder.scms.filter((s) => s.kind === "fly-ash");
  const fraction = ashes.reduce((sum, s) => sum + s.massFractionOfBinder, 0);
  if (fraction === 0) return { fraction: 0, caoMassFraction: 0 };
  const cao =
    ashes.reduce((sum, s) => sum + s.massFractionOfBinder * (s.caoMassFraction ?? model.defaults.flyAshCaOMassFraction.value), 0) /
    fraction;
  return { fraction, caoMassFraction: cao };
}

/**
 * Regressions of Schindler & Folliard (2005), ACI Mater. J. 102, 24 (recalled; see the data file):
 *   τ  = 66.78 pC3A^−0.154 pC3S^−0.401 Blaine^−0.804 pSO3^−0.758 exp(2.187 p_slag + 9.5 p_FA p_FA-CaO)   [h]
 *   β  = 181.4 pC3A^0.146 pC3S^0.227 Blaine^−0.535 pSO3^0.558 exp(−0.647 p_slag)
 *   αu = 1.031 w/cm / (0.194 + w/cm) + 0.50 p_FA + 0.30 p_slag  (≤ 1)
 * Phase fractions are of the cement, SCM fractions of the binder, Blaine in m²/kg.
 */
export function hydrationParameters(binder: CuringBinder): HydrationParameters {
  const phases = binder.cementPhases;
  const c3a = Math.max(floor, phases.C3A);
  const c3s = Math.max(floor, phases.C3S);
  const so3 = Math.max(floor, phases.SO3 ?? model.defaults.so3MassFraction.value);
  const blaine = binder.blaineM2PerKg ?? model.defaults.blaineM2PerKg.value;
  const slag = scmFraction(binder, "slag");
  const ash = flyAshTerms(binder);
  const t = model.tau;
  const tauH =
    t.coefficientH *
    c3a ** t.exponentC3A *
    c3s ** t.exponentC3S *
    blaine ** t.exponentBlaine *
    so3 ** t.exponentSO3 *
    Math.exp(t.slagExpFactor * slag + t.flyAshCaOExpFactor * ash.fraction * ash.caoMassFraction);
  const b = model.beta;
  const beta =
    b.coefficient * c3a ** b.exponentC3A * c3s ** b.exponentC3S * blaine ** b.exponentBlaine * so3 ** b.exponentSO3 * Math.exp(b.slagExpFactor * slag);
  const u = model.ultimateDegree;
  const wcm = binder.waterBinderRatio;
  const ultimateDegree = Math.min(
    u.maximum,
    (u.coefficient * wcm) / (u.offsetWaterBinder + wcm) + u.flyAshTerm * ash.fraction + u.slagTerm * slag,
  );
  return { tauH, beta, ultimateDegree };
}

/**
 * Degree of hydration at equivalent age te (h), three-parameter exponential model
 * (Schindler & Folliard 2005, after Freiesleben Hansen & Pedersen 1985):
 *   α(te) = αu · exp[−(τ/te)^β],  α(0) = 0.
 */
export function degreeOfHydration(equivalentAgeH: number, parameters: HydrationParameters): number {
  if (equivalentAgeH <= 0) return 0;
  return parameters.ultimateDegree * Math.exp(-((parameters.tauH / equivalentAgeH) ** parameters.beta));
}

/** Mass fraction of cement in the binder, re-exported for callers that build the heat source. */
export { cementFractionOfBinder };
