import { surfaceCoverData, type SurfaceCover } from "./curing-data";

const kelvinOffsetK = 273.15; // definition of the Celsius scale

/**
 * Outer air-film coefficient of an external surface, W/(m²·K) (EN ISO 6946:2017 Annex C):
 *   h = hc + hr,  hc = 4 + 4 v  (v wind speed, m/s),  hr = ε · 4 σ Tm³  (Tm mean of surface and air, K).
 */
export function airFilmCoefficientWPerM2K(windSpeedMPerS: number, meanTemperatureC: number): number {
  const film = surfaceCoverData.outerFilm;
  const meanK = meanTemperatureC + kelvinOffsetK;
  const convective = film.convectiveBaseWPerM2K + film.convectivePerWindWsPerM3K * Math.max(0, windSpeedMPerS);
  const radiative = film.emissivity * 4 * film.stefanBoltzmannWPerM2K4 * meanK ** 3;
  return convective + radiative;
}

/** Looks up a cover (formwork or insulation) by id from the data file. */
export function surfaceCover(id: string): SurfaceCover | undefined {
  return surfaceCoverData.covers.find((c) => c.id === id);
}

export const surfaceCoverIds: readonly string[] = surfaceCoverData.covers.map((c) => c.id);

/**
 * Overall surface coefficient of a cover in series with the air film, W/(m²·K):
 *   h_eff = 1 / (1/h_film + Σ d_i/λ_i)   (thermal resistances in series; ACI 207.2R treats forms and
 *   insulation the same way). An adiabatic cover gives 0.
 */
export function coverCoefficientWPerM2K(cover: SurfaceCover, windSpeedMPerS: number, meanTemperatureC: number): number {
  if (cover.layers === "adiabatic") return 0;
  const layerResistanceM2KPerW = cover.layers.reduce((sum, l) => sum + l.thicknessM / l.conductivityWPerMK, 0);
  return 1 / (1 / airFilmCoefficientWPerM2K(windSpeedMPerS, meanTemperatureC) + layerResistanceM2KPerW);
}
