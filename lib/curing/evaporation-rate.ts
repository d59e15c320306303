export type EvaporationConditions = {
  concreteTemperatureC: number;
  airTemperatureC: number;
  relativeHumidityPercent: number;
  /** Wind speed about 0.5 m above the surface, km/h. */
  windSpeedKmH: number;
};

/**
 * Rate of evaporation from a fresh concrete surface, kg/(m²·h), by Uno (1998), ACI Mater. J. 95, 365,
 * the closed form of the ACI 305R nomograph:
 *   E = 5 [ (Tc + 18)^2.5 − r (Ta + 18)^2.5 ] (V + 4) × 10⁻⁶
 * Tc concrete and Ta air temperature in °C, r = RH/100, V wind speed in km/h. The constants 5, 18, 2.5, 4
 * and 10⁻⁶ belong to the published equation. Negative values (condensation) are reported as 0.
 */
export function unoEvaporationKgPerM2H(conditions: EvaporationConditions): number {
  const r = conditions.relativeHumidityPercent / 100;
  const rate =
    5 *
    ((conditions.concreteTemperatureC + 18) ** 2.5 - r * (conditions.airTemperatureC + 18) ** 2.5) *
    (conditions.windSpeedKmH + 4) *
    1e-6;
  return Math.max(0, rate);
}
