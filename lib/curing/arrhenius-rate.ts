import { maturityStrengthData } from "./curing-data";

const gasConstantJPerMolK = maturityStrengthData.gasConstantJPerMolK.value;
const kelvinOffsetK = 273.15; // definition of the Celsius scale

/**
 * Arrhenius age-conversion factor of ASTM C1074 (equivalent-age form):
 *   f(T) = exp[−(E/R)(1/T − 1/T_ref)],  T and T_ref absolute (K), E activation energy J/mol, R = 8.314 J/(mol·K).
 * One hour at T counts as f(T) hours at T_ref.
 */
export function arrheniusAgeFactor(temperatureC: number, activationEnergyJPerMol: number, referenceTemperatureC: number): number {
  const temperatureK = temperatureC + kelvinOffsetK;
  const referenceK = referenceTemperatureC + kelvinOffsetK;
  return Math.exp((-activationEnergyJPerMol / gasConstantJPerMolK) * (1 / temperatureK - 1 / referenceK));
}
