import { requireLiquidWaterTemperature } from "./liquid-water-range";
import { waterDensityKgPerM3 } from "./water-density";

/**
 * Ionisation constant of water, IAPWS R11-07 (Bandura & Lvov 2006, J. Phys. Chem. Ref. Data 35, 15),
 * on the 1 bar density of `water-density.ts`:
 *
 *   pKw = −2n [log₁₀(1 + Q) − Q/(Q + 1) · ρ (β₀ + β₁ T⁻¹ + β₂ ρ)] + pKw^G + 2 log₁₀(M_w / 1000 g)
 *   Q = ρ exp(α₀ + α₁ T⁻¹ + α₂ T⁻² ρ^(2/3)),   pKw^G = γ₀ + γ₁ T⁻¹ + γ₂ T⁻² + γ₃ T⁻³
 *
 * with ρ in g/cm³, T in K, n = 6, M_w = 18.015268 g/mol. Kw on the molality scale, (mol/kg)².
 */
const r11 = {
  coordinationNumber: 6,
  alpha0: -0.864671,
  alpha1K: 8659.19,
  alpha2K2: -22786.2,
  beta0Cm3PerG: 0.642044,
  beta1KCm3PerG: -56.8534,
  beta2Cm6PerG2: -0.375754,
  gamma0: 0.61415,
  gamma1K: 48251.33,
  gamma2K2: -67707.93,
  gamma3K3: 10102100,
  molarMassGPerMol: 18.015268,
} as const;

const gPerCm3PerKgPerM3 = 1e-3;

/** log₁₀ Kw of liquid water at 1 bar (Kw in mol²/kg²), 273.15–373.15 K, IAPWS R11-07. */
export function log10Kw(temperatureK: number): number {
  requireLiquidWaterTemperature(temperatureK);
  const rhoGPerCm3 = waterDensityKgPerM3(temperatureK) * gPerCm3PerKgPerM3;
  const t = temperatureK;
  const q = rhoGPerCm3 * Math.exp(r11.alpha0 + r11.alpha1K / t + (r11.alpha2K2 / (t * t)) * rhoGPerCm3 ** (2 / 3));
  const pKwIdealGas = r11.gamma0 + r11.gamma1K / t + r11.gamma2K2 / t ** 2 + r11.gamma3K3 / t ** 3;
  const pKw =
    -2 * r11.coordinationNumber * (Math.log10(1 + q) - (q / (q + 1)) * rhoGPerCm3 * (r11.beta0Cm3PerG + r11.beta1KCm3PerG / t + r11.beta2Cm6PerG2 * rhoGPerCm3)) +
    pKwIdealGas +
    2 * Math.log10(r11.molarMassGPerMol / 1000);
  return -pKw;
}
