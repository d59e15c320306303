import { hydrationModelData } from "./curing-data";
import { scmFraction, type CuringBinder } from "./binder-description";
import { flyAshTerms } from "./hydration-degree";

/**
 * Apparent activation energy of hydration, J/mol (Schindler 2004, ACI Mater. J. 101, 72; recalled):
 *   E = 22100 · f_E · pC3A^0.30 · pC4AF^0.25 · Blaine^0.35,
 *   f_E = 1 − 1.05 p_FA (1 − p_FA-CaO / 0.40) + 0.40 p_slag.
 * Used with the hydration model, whose τ and β were fitted with it.
 */
export function hydrationActivationEnergyJPerMol(binder: CuringBinder): number {
  const e = hydrationModelData.activationEnergy;
  const floor = hydrationModelData.defaults.minimumPhaseFraction.value;
  const blaine = binder.blaineM2PerKg ?? hydrationModelData.defaults.blaineM2PerKg.value;
  const ash = flyAshTerms(binder);
  const factor = 1 - e.flyAshFactor * ash.fraction * (1 - ash.caoMassFraction / e.flyAshCaOReference) + e.slagFactor * scmFraction(binder, "slag");
  return (
    e.coefficientJPerMol *
    factor *
    Math.max(floor, binder.cementPhases.C3A) ** e.exponentC3A *
    Math.max(floor, binder.cementPhases.C4AF) ** e.exponentC4AF *
    blaine ** e.exponentBlaine
  );
}
