/**
 * Fundamental constants, SI 2019 exact values (CODATA 2018: Tiesinga, Mohr, Newell & Taylor 2021,
 * Rev. Mod. Phys. 93, 025010), and derived constants used across lib/thermo.
 */
export const elementaryChargeC = 1.602176634e-19;
export const avogadroPerMol = 6.02214076e23;
export const boltzmannJPerK = 1.380649e-23;
/** ε₀, F/m (CODATA 2018 recommended value; no longer exact in the 2019 SI). */
export const vacuumPermittivityFPerM = 8.8541878128e-12;
/** R = N_A k, J/(mol·K), exact in the 2019 SI: 8.314462618… */
export const gasConstantJPerMolK = avogadroPerMol * boltzmannJPerK;
/** Thermochemical calorie, J (exact by definition; the unit of the HKF data of Shock & Helgeson 1988). */
export const joulesPerCalorie = 4.184;
/** Reference temperature of the standard-state data, K (common practice: 25 °C). */
export const referenceTemperatureK = 298.15;
/**
 * Molar mass of water for molality ↔ mole-fraction conversions, kg/mol: 2 × 1.00794 + 15.9994 g/mol
 * (IUPAC 1997 standard atomic weights, Coplen 2001, Pure Appl. Chem. 73, 667). The IAPWS releases use
 * their own 18.015268 g/mol internally; the 7·10⁻⁷ relative difference is immaterial.
 */
export const waterMolarMassKgPerMol = 0.01801528;
/** Standard atmosphere, bar: 101.325 kPa exactly (10th CGPM 1954, Resolution 4). */
export const standardAtmosphereBar = 1.01325;
