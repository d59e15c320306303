import { requireInRange } from "./thermo-error";

/**
 * Saturation (vapour) pressure of water, IAPWS-IF97 region 4 "saturation-pressure equation"
 * (Wagner et al. 2000, J. Eng. Gas Turbines Power 122, 150; IAPWS R7-97, eqs. 29–30):
 *
 *   θ = T/T* + n₉ / (T/T* − n₁₀),   A = θ² + n₁θ + n₂,   B = n₃θ² + n₄θ + n₅,   C = n₆θ² + n₇θ + n₈
 *   p/p* = [2C / (−B + √(B² − 4AC))]⁴,   T* = 1 K, p* = 1 MPa.
 *
 * Valid 273.15 K ≤ T ≤ 647.096 K; here restricted to the project's range, 273.15–373.15 K.
 */
const region4Coefficients = [
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5, -0.32325550322333e7,
  0.1491510861353e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
] as const;

const barPerMPa = 10;

/** Saturation pressure of water, bar, for 273.15 K ≤ T ≤ 373.15 K (IAPWS-IF97 region 4). */
export function saturationPressureBar(temperatureK: number): number {
  requireInRange("temperatureK", temperatureK, 273.15, 373.15, "K");
  const n = region4Coefficients;
  const theta = temperatureK + n[8] / (temperatureK - n[9]);
  const a = theta * theta + n[0] * theta + n[1];
  const b = n[2] * theta * theta + n[3] * theta + n[4];
  const c = n[5] * theta * theta + n[6] * theta + n[7];
  const pressureMPa = ((2 * c) / (-b + Math.sqrt(b * b - 4 * a * c))) ** 4;
  return pressureMPa * barPerMPa;
}
