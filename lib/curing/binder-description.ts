/**
 * The binder as the curing model needs it: simple typed inputs, kept apart from the binder model of
 * `lib/cement/` so either can change without the other. All fractions are mass fractions (0–1).
 */

/** Bogue (or measured) phase mass fractions of the Portland cement (clinker + sulfate), not of the whole binder. */
export type ClinkerPhaseFractions = {
  C3S: number;
  C2S: number;
  C3A: number;
  C4AF: number;
  /** Sulfate as SO3, mass fraction of the cement. */
  SO3?: number;
  freeCaO?: number;
  MgO?: number;
};

export type ClinkerPhase = keyof Required<ClinkerPhaseFractions>;
export const clinkerPhases: readonly ClinkerPhase[] = ["C3S", "C2S", "C3A", "C4AF", "SO3", "freeCaO", "MgO"];

/** "pozzolan": metakaolin, natural pozzolan and others the heat model treats as heat-free diluents. */
export type ScmKind = "slag" | "fly-ash" | "silica-fume" | "limestone" | "pozzolan";

export type ScmFraction = {
  kind: ScmKind;
  /** Mass fraction of the total binder (cement + all SCMs). */
  massFractionOfBinder: number;
  /** CaO mass fraction of a fly ash (Schindler & Folliard 2005 use it for the fly-ash heat and rate terms). */
  caoMassFraction?: number;
};

export type CuringBinder = {
  cementPhases: ClinkerPhaseFractions;
  /** Blaine fineness of the cement, m²/kg. */
  blaineM2PerKg?: number;
  scms: ScmFraction[];
  /** Total binder (cement + SCMs) per m³ of concrete. */
  binderKgPerM3: number;
  /** Water / total binder mass ratio. */
  waterBinderRatio: number;
};

/** Mass fraction of the binder that is Portland cement. */
export function cementFractionOfBinder(binder: CuringBinder): number {
  const scm = binder.scms.reduce((sum, s) => sum + s.massFractionOfBinder, 0);
  return Math.max(0, 1 - scm);
}

/** Total mass fraction of the binder that is an SCM of the given kind. */
export function scmFraction(binder: CuringBinder, kind: ScmKind): number {
  return binder.scms.filter((s) => s.kind === kind).reduce((sum, s) => sum + s.massFractionOfBinder, 0);
}
