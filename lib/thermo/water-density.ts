import { requireLiquidWaterTemperature } from "./liquid-water-range";

/**
 * Density of liquid water at 1 atm from Kell's correlation (Kell 1975, J. Chem. Eng. Data 20, 97, eq. 16):
 *
 *   ρ = (a0 + a1 t + a2 t² + a3 t³ + a4 t⁴ + a5 t⁵) / (1 + b t),   ρ in kg/m³, t in °C.
 *
 * Kell fitted t on IPTS-68 and 1 atm (0.101325 MPa); the t68 − t90 difference (< 0.01 K here) and the
 * 1.3 kPa pressure difference from 0.1 MPa (about 6·10⁻⁷ in ρ) are far below the 0.1 % target. Against
 * IAPWS-95 at 0.1 MPa (python3-iapws) the largest deviation from 0.01 to 99 °C is 1.6·10⁻⁵ (relative).
 * Coefficients as printed by Kell 1975 (recalled from memory; confirmed only through the IAPWS-95 test).
 */
const kellCoefficientsKgPerM3 = {
  a0KgPerM3: 999.83952,
  a1KgPerM3PerC: 16.945176,
  a2KgPerM3PerC2: -7.9870401e-3,
  a3KgPerM3PerC3: -46.170461e-6,
  a4KgPerM3PerC4: 105.56302e-9,
  a5KgPerM3PerC5: -280.54253e-12,
  bPerC: 16.87985e-3,
} as const;

const kelvinAtZeroCelsiusK = 273.15;

function kellNumeratorKgPerM3(temperatureC: number): number {
  const k = kellCoefficientsKgPerM3;
  const t = temperatureC;
  return k.a0KgPerM3 + t * (k.a1KgPerM3PerC + t * (k.a2KgPerM3PerC2 + t * (k.a3KgPerM3PerC3 + t * (k.a4KgPerM3PerC4 + t * k.a5KgPerM3PerC5))));
}

function kellNumeratorDerivativeKgPerM3PerK(temperatureC: number): number {
  const k = kellCoefficientsKgPerM3;
  const t = temperatureC;
  return k.a1KgPerM3PerC + t * (2 * k.a2KgPerM3PerC2 + t * (3 * k.a3KgPerM3PerC3 + t * (4 * k.a4KgPerM3PerC4 + t * 5 * k.a5KgPerM3PerC5)));
}

/** Density of liquid water at 1 bar, kg/m³, for 273.15 K ≤ T ≤ 373.15 K (Kell 1975). */
export function waterDensityKgPerM3(temperatureK: number): number {
  requireLiquidWaterTemperature(temperatureK);
  return waterDensityAndDerivativeUnchecked(temperatureK).densityKgPerM3;
}

/**
 * (∂ρ/∂T) at 1 bar, kg/(m³·K): the analytic derivative of Kell's quotient,
 * dρ/dt = (N′ − ρ b) / (1 + b t).
 */
export function waterDensityDerivativeKgPerM3PerK(temperatureK: number): number {
  requireLiquidWaterTemperature(temperatureK);
  return waterDensityAndDerivativeUnchecked(temperatureK).derivativeKgPerM3PerK;
}

/**
 * ρ and dρ/dT without the range check, for finite differences that straddle the ends of the range by a
 * fraction of a kelvin (at most 0.05 K here). Kell's rational function is smooth there; his fit spans 0–150 °C.
 */
export function waterDensityAndDerivativeUnchecked(temperatureK: number): { densityKgPerM3: number; derivativeKgPerM3PerK: number } {
  const temperatureC = temperatureK - kelvinAtZeroCelsiusK;
  const denominator = 1 + kellCoefficientsKgPerM3.bPerC * temperatureC;
  const densityKgPerM3 = kellNumeratorKgPerM3(temperatureC) / denominator;
  const derivativeKgPerM3PerK = (kellNumeratorDerivativeKgPerM3PerK(temperatureC) - densityKgPerM3 * kellCoefficientsKgPerM3.bPerC) / denominator;
  return { densityKgPerM3, derivativeKgPerM3PerK };
}
