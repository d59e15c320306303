import { requireInRange } from "./thermo-error";

/**
 * Saturation (vapour) pressure of water, IAPWS-IF97 region 4 "saturation-pressure equation"
 * (Wagner et al. 2000, J. Eng. Gas Turbines Power 122, 150; IAPWS R7-97, eqs. 29–30):
 *
 *   θ = T/T* + n₉ / (T/T* − n₁₀),   A = θ² + n₁θ + n₂,   B = n₃θ² + n₄θ + n₅,   C = n₆θ² + n₇θ + n₈
 *   p/p* = [2C / (−B + √(B² − 4AC))]⁴,   T* = 1 K, p* = 1 MPa.
 *
 * Valid 273.15 K ≤ T ≤ 647.096 K; here restricted to the project's range, 273.15–373.15 K.
 *
 * The inverse, the saturation temperature at a pressure, is the region 4 "saturation-temperature equation" of the same
 * release (IAPWS R7-97, eq. 31), with the same coefficients:
 *
 *   β = (p/p*)^¼,   E = β² + n₃β + n₆,   F = n₁β² + n₄β + n₇,   G = n₂β² + n₅β + n₈,   D = 2G / (−F − √(F² − 4EG))
 *   T/T* = [n₁₀ + D − √((n₁₀ + D)² − 4(n₉ + n₁₀D))] / 2.
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

/** Saturation pressures of the project's 0–100 °C range, bar (IAPWS-IF97 region 4 at 273.15 and 373.15 K). */
const saturationPressureRangeBar = { minimum: 0.0061, maximum: 1.02 } as const;

/**
 * Saturation (boiling) temperature of water at a pressure, K (IAPWS-IF97 region 4 backward equation), for the
 * pressures of the project's range, 0.0061–1.02 bar.
 */
export function saturationTemperatureK(pressureBar: number): number {
  requireInRange("pressureBar", pressureBar, saturationPressureRangeBar.minimum, saturationPressureRangeBar.maximum, "bar");
  const n = region4Coefficients;
  const beta = (pressureBar / barPerMPa) ** 0.25;
  const e = beta * beta + n[2] * beta + n[5];
  const f = n[0] * beta * beta + n[3] * beta + n[6];
  const g = n[1] * beta * beta + n[4] * beta + n[7];
  const d = (2 * g) / (-f - Math.sqrt(f * f - 4 * e * g));
  return (n[9] + d - Math.sqrt((n[9] + d) ** 2 - 4 * (n[8] + n[9] * d))) / 2;
}
