import gelPores from "../data/binders/gel-pores.json";
import type { EquilibriumResult } from "../equilibrium/result";

/** Points of the solid particle's water against Ca/Si (`gel-pores.json`, `solidParticleWaterPerSilicon`). */
const PARTICLE_WATER = gelPores.solidParticleWaterPerSilicon.value;

/** H2O per Si of the gel-pore-free C-S-H particle at a molar Ca/Si: linear between the data points, constant outside. */
export function particleWaterPerSilicon(caToSi: number): number {
  const [low, high] = PARTICLE_WATER;
  if (caToSi <= low.caToSi) return low.h2oPerSi;
  if (caToSi >= high.caToSi) return high.h2oPerSi;
  return low.h2oPerSi + ((high.h2oPerSi - low.h2oPerSi) * (caToSi - low.caToSi)) / (high.caToSi - low.caToSi);
}

/**
 * Moles of gel water the gel-pore carriers (the C-S-H) hold inside their own molar volume: for each end-member,
 * its H2O less the particle water at its Ca/Si (never negative), times its moles. Zero for end-members that hold the
 * particle's water only.
 */
export function gelWaterInCarriersMol(assemblage: Pick<EquilibriumResult, "phases">, elementsOf: (id: string) => Record<string, number>): number {
  let water = 0;
  for (const phase of assemblage.phases) {
    if (!gelPores.carrierPhaseIds.value.includes(phase.id)) continue;
    for (const member of phase.members ?? [{ id: phase.id, moles: phase.moles }]) {
      const e = elementsOf(member.id);
      const silicon = e.Si ?? 0;
      if (!(silicon > 0)) continue;
      // Every H of a C-S-H end-member formula (CaO)x(SiO2)y(H2O)z is in its water.
      const excess = (e.H ?? 0) / 2 - particleWaterPerSilicon((e.Ca ?? 0) / silicon) * silicon;
      if (excess > 0) water += excess * member.moles;
    }
  }
  return water;
}
