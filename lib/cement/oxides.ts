import { molarMassGPerMol } from "../chem/atomic-weights";

/**
 * Oxides (and CO2, Cl) of a chemical analysis as reported for cements and SCMs (EN 196-2, ASTM C114 report
 * the same list). Stoichiometry is definitional; molar masses follow from the IUPAC 2021 atomic weights.
 */
export const oxideElements = {
  CaO: { Ca: 1, O: 1 },
  SiO2: { Si: 1, O: 2 },
  Al2O3: { Al: 2, O: 3 },
  Fe2O3: { Fe: 2, O: 3 },
  MgO: { Mg: 1, O: 1 },
  SO3: { S: 1, O: 3 },
  Na2O: { Na: 2, O: 1 },
  K2O: { K: 2, O: 1 },
  TiO2: { Ti: 1, O: 2 },
  P2O5: { P: 2, O: 5 },
  Mn2O3: { Mn: 2, O: 3 },
  CO2: { C: 1, O: 2 },
  H2O: { H: 2, O: 1 },
} as const satisfies Record<string, Record<string, number>>;

export type OxideId = keyof typeof oxideElements;

export const oxideIds = Object.keys(oxideElements) as OxideId[];

const molarMasses = Object.fromEntries(oxideIds.map((id) => [id, molarMassGPerMol(oxideElements[id])])) as Record<OxideId, number>;

/** Molar mass of an oxide, g/mol. */
export function oxideMolarMassGPerMol(oxide: OxideId): number {
  return molarMasses[oxide];
}

/** Oxide masses (g) keyed by oxide; missing keys are zero. */
export type OxideMassesG = Partial<Record<OxideId, number>>;

/** Adds Σ (m_i / M_i) ν_ie to the element-mole record `into` (mol), for oxide masses in g. */
export function addOxideElementMoles(into: Record<string, number>, oxideMassesG: OxideMassesG): Record<string, number> {
  for (const id of oxideIds) {
    const massG = oxideMassesG[id] ?? 0;
    if (massG === 0) continue;
    const moles = massG / molarMasses[id];
    for (const [element, count] of Object.entries(oxideElements[id])) into[element] = (into[element] ?? 0) + moles * count;
  }
  return into;
}
