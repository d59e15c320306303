import { requireInRange } from "./thermo-error";

/**
 * Temperature range of the liquid-water property functions, K.
 *
 * The project works at 1 bar from 0 to 100 °C. At 0.1 MPa water melts at 273.1526 K and boils at
 * 372.76 K (IAPWS-95, Wagner & Pruss 2002), so the ends of this range are very slightly metastable
 * liquid (2.6 mK supercooled at 0 °C, 0.39 K superheated at 100 °C). The correlations used are smooth
 * across both ends; tests compare them with IAPWS-95 from 0.01 °C to 99 °C.
 */
export const liquidWaterMinimumTemperatureK = 273.15;
export const liquidWaterMaximumTemperatureK = 373.15;

/** Throws a ThermoInputError naming `temperatureK` unless 273.15 K ≤ T ≤ 373.15 K. */
export function requireLiquidWaterTemperature(temperatureK: number): void {
  requireInRange("temperatureK", temperatureK, liquidWaterMinimumTemperatureK, liquidWaterMaximumTemperatureK, "K");
}
