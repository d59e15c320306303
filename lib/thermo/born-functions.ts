import { waterRelativePermittivity, waterRelativePermittivityDerivativePerK, waterRelativePermittivitySecondDerivativePerK2 } from "./water-permittivity";

/**
 * Born functions of the solvent at 1 bar (Helgeson & Kirkham 1974, Am. J. Sci. 274, 1089; Tanger &
 * Helgeson 1988, Am. J. Sci. 288, 19), from the IAPWS R8-97 permittivity of `water-permittivity.ts`:
 *
 *   Y = (∂(−1/ε)/∂T)_P = (1/ε²)(∂ε/∂T)_P                       1/K
 *   X = (∂Y/∂T)_P = (1/ε²)(∂²ε/∂T²)_P − (2/ε³)(∂ε/∂T)_P²       1/K²
 *
 * Valid for 273.15–373.15 K (the range of the permittivity module).
 */
export function bornYPerK(temperatureK: number): number {
  const epsilon = waterRelativePermittivity(temperatureK);
  return waterRelativePermittivityDerivativePerK(temperatureK) / (epsilon * epsilon);
}

export function bornXPerK2(temperatureK: number): number {
  const epsilon = waterRelativePermittivity(temperatureK);
  const first = waterRelativePermittivityDerivativePerK(temperatureK);
  const second = waterRelativePermittivitySecondDerivativePerK2(temperatureK);
  return second / (epsilon * epsilon) - (2 * first * first) / epsilon ** 3;
}
