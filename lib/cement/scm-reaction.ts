import data from "../data/binders/scm-reaction.json";
import { gasConstantJPerMolK } from "../thermo/physical-constants";
import type { ScmType } from "./clinker-phases";

/**
 * Degree of reaction of the reactive (glassy) part of a supplementary cementitious material versus age and
 * curing temperature. Representative curves at 20 °C (data: `lib/data/binders/scm-reaction.json`, after
 * Kocaba et al. 2012, Deschner et al. 2012, Lothenbach et al. 2011 and 2012, Avet & Scrivener 2018; values
 * recalled) are read at the equivalent age
 *   t_e = t · exp(−Ea/R · (1/T − 1/T_ref)),  T_ref = 293.15 K
 * (equivalent-age concept of Freiesleben Hansen & Pedersen 1977, Nordisk Betong 1, 19), interpolated linearly
 * in ln t_e. Limestone is not kinetic: the whole calcite enters the equilibrium calculation (Lothenbach et al.
 * 2008, Cem. Concr. Res. 38, 848), so its degree is 1 and the engine leaves unreacted calcite as a solid.
 */
export type ScmReactionWarning =
  | { code: "scm_model_extrapolated"; type: ScmType; reason: "age_beyond_data"; equivalentAgeDays: number; lastDataAgeDays: number }
  | { code: "scm_model_extrapolated"; type: ScmType; reason: "temperature_outside_data"; curingTemperatureC: number; minC: number; maxC: number };

export type ScmReactionDegree = {
  type: ScmType;
  model: "table" | "equilibrium";
  /** Fraction (0–1) of the reactive part that has reacted. */
  degree: number;
  /** About one standard deviation, absolute fraction, covering the spread between materials and methods. */
  uncertaintyAbsolute: number;
  equivalentAgeDays: number;
  warnings: ScmReactionWarning[];
};

type TableModel = {
  model: "table";
  agesDays: number[];
  degrees: number[];
  uncertaintyAbsolute: number;
  maxDegree: number;
  activationEnergyJPerMol: number;
  validTemperatureRangeC: number[];
};
type EquilibriumModel = { model: "equilibrium"; uncertaintyAbsolute: number };

const models = data.materials as Record<ScmType, TableModel | EquilibriumModel>;
const referenceTemperatureK = data.referenceTemperatureC + 273.15;

/** Equivalent age at 20 °C (days) of `ageDays` at `curingTemperatureC` for an apparent activation energy (J/mol). */
export function equivalentAgeDays(ageDays: number, curingTemperatureC: number, activationEnergyJPerMol: number): number {
  const temperatureK = curingTemperatureC + 273.15;
  return ageDays * Math.exp((-activationEnergyJPerMol / gasConstantJPerMolK) * (1 / temperatureK - 1 / referenceTemperatureK));
}

function interpolate(model: TableModel, ageDays: number): { degree: number; beyond: boolean } {
  const { agesDays: ages, degrees } = model;
  if (ageDays <= ages[0]) return { degree: (degrees[0] * ageDays) / ages[0], beyond: false };
  const last = ages.length - 1;
  for (let i = 1; i <= last; i++) {
    if (ageDays <= ages[i]) {
      const weight = Math.log(ageDays / ages[i - 1]) / Math.log(ages[i] / ages[i - 1]);
      return { degree: degrees[i - 1] + weight * (degrees[i] - degrees[i - 1]), beyond: false };
    }
  }
  const slopePerLn = (degrees[last] - degrees[last - 1]) / Math.log(ages[last] / ages[last - 1]);
  return { degree: Math.min(model.maxDegree, degrees[last] + slopePerLn * Math.log(ageDays / ages[last])), beyond: true };
}

/** Degree of reaction of one SCM at one age (days) and curing temperature (°C), with extrapolation warnings. */
export function scmReactionDegree(type: ScmType, ageDays: number, curingTemperatureC: number): ScmReactionDegree {
  const model = models[type];
  if (!model) throw new Error(`scmReactionDegree: no model for ${type} in scm-reaction.json`);
  if (model.model === "equilibrium") {
    return { type, model: "equilibrium", degree: 1, uncertaintyAbsolute: model.uncertaintyAbsolute, equivalentAgeDays: ageDays, warnings: [] };
  }
  const warnings: ScmReactionWarning[] = [];
  const [minC, maxC] = model.validTemperatureRangeC;
  if (curingTemperatureC < minC || curingTemperatureC > maxC) {
    warnings.push({ code: "scm_model_extrapolated", type, reason: "temperature_outside_data", curingTemperatureC, minC, maxC });
  }
  const equivalent = equivalentAgeDays(ageDays, curingTemperatureC, model.activationEnergyJPerMol);
  const { degree, beyond } = interpolate(model, equivalent);
  if (beyond) {
    warnings.push({ code: "scm_model_extrapolated", type, reason: "age_beyond_data", equivalentAgeDays: equivalent, lastDataAgeDays: model.agesDays[model.agesDays.length - 1] });
  }
  return { type, model: "table", degree, uncertaintyAbsolute: model.uncertaintyAbsolute, equivalentAgeDays: equivalent, warnings };
}
