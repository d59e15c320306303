import type { ChlorideBindingScenario } from "../../scenarios/chloride-binding";
import type { ExposureInput } from "../../schema/exposure-input";
import type { Flag } from "../flag";

/**
 * Chloride threshold for depassivation of reinforcing steel, % Cl by binder mass: 0.4 % is the value most often
 * quoted (common practice); published thresholds scatter widely, about 0.04–8 % (Angst, Elsener, Larsen & Vennesland
 * 2009, Cem. Concr. Res. 39, 1122; from memory).
 */
export const DEPASSIVATION_THRESHOLD_CHLORIDE_MASS_PERCENT_OF_BINDER = 0.4;

export type FlagContext = { exposure: ExposureInput; curingMaxTemperatureC?: number; waterBinderRatio: number };

const BASIS =
  "Chloride threshold 0.4 % Cl by binder mass, the value most often quoted for depassivation of steel (common practice; published " +
  "thresholds scatter from about 0.04 to 8 %: Angst, Elsener, Larsen & Vennesland 2009, Cem. Concr. Res. 39, 1122, from memory). " +
  "EN 206 Table 15 limits the chloride content of reinforced concrete to 0.20–0.40 % of cement mass (classes Cl 0,20 and Cl 0,40; " +
  "0.10–0.20 % with prestressing steel; from memory). Chemical binding of chloride by AFm phases as Friedel's and Kuzel's salt: " +
  "Birnin-Yauri & Glasser 1998, Cem. Concr. Res. 28, 1713; thermodynamic data: Balonis, Lothenbach, Le Saout & Glasser 2010, " +
  "Cem. Concr. Res. 40, 1009. National annexes and local codes govern.";

const f2 = (x: number) => x.toFixed(2);

/**
 * `chloride-binding-limit`: the exposure's chloride, at equilibrium with the paste, uses up the AFm phases' capacity to
 * bind chloride (free chloride then rises with every further increment) and/or the total chloride exceeds the commonly
 * quoted depassivation threshold. Warning when both hold, caution when one does, info for de-icing salts without a
 * concentration; nothing for unreinforced concrete or when neither holds.
 */
export function chlorideBindingLimitFlag(result: ChlorideBindingScenario, context: FlagContext): Flag | undefined {
  if (context.exposure.reinforced === false) return undefined;
  const s = result.summary;
  const e = s.exposure;
  const threshold = DEPASSIVATION_THRESHOLD_CHLORIDE_MASS_PERCENT_OF_BINDER;
  const freeAfter = s.freeFractionOfIncrementAfterExhaustion;
  const freeAfterText = freeAfter === null || freeAfter >= 0.95 ? "nearly all" : `about ${Math.round(100 * freeAfter)} %`;
  const capacityText =
    s.capacityExhaustedAtTotalChlorideMassPercent === null
      ? `The AFm phases were not used up within the computed range (up to ${f2(s.maximumAddedChlorideMassPercent)} % added chloride); they bound at most ${f2(s.boundChlorideMaxMassPercent)} % of binder mass.`
      : `The AFm phases' capacity is used up at ${f2(s.capacityExhaustedAtTotalChlorideMassPercent)} % total chloride by binder mass (${f2(s.capacityExhaustedAtTotalChlorideKgPerM3!)} kg/m³), with ${f2(s.capacityExhaustedAtFreeChlorideMolPerKgWater!)} mol/L free chloride; beyond it ${freeAfterText} of any further chloride stays free.`;
  const precursor = e?.precursorAfm ?? s.precursorAfm ?? "the AFm phase";
  const reaction = `The binding reaction is the exchange of the AFm interlayer anion for chloride, ${precursor} + chloride → Friedel's salt Ca4Al2Cl2(OH)12·4H2O (Kuzel's salt Ca4Al2Cl(SO4)0.5(OH)12·6H2O at low chloride where sulfate AFm is present).`;
  const unexposedText = `Without chloride ingress Friedel's salt is undersaturated (saturation index ${f2(s.friedelSaltSaturationIndexUnexposed)}${s.friedelFormationGibbsKJPerMolUnexposed !== null ? `; its formation from ${s.precursorAfm} has ΔrG = +${f2(s.friedelFormationGibbsKJPerMolUnexposed)} kJ/mol` : ""}).`;
  const limits =
    "This is the long-term equilibrium state where chloride has reached the steel at the exposure's concentration: transport through the cover is not modelled, and chloride sorbed on C-S-H is not in the data, so bound chloride is a lower and free chloride an upper estimate.";
  const actions = [
    "Measure chloride resistance by test, e.g. the rapid chloride migration coefficient (NT BUILD 492) or bulk diffusion (EN 12390-11), and chloride profiles of existing structures (EN 14629).",
    "Consider a binder with more reactive alumina (ground granulated blast-furnace slag, metakaolin, fly ash): it binds more chloride and refines the pores.",
    `Review the water/binder ratio (${context.waterBinderRatio.toFixed(2)}) and the cover against EN 206 / EN 1992-1-1 or the local code for the exposure class.`,
    "Check the initial chloride content of the constituents against EN 206 Table 15 (class Cl 0,20 or Cl 0,40).",
  ];

  if (!e) {
    if (!context.exposure.deIcingSalts) return undefined;
    return {
      id: "chloride-binding-limit",
      severity: "info",
      title: "De-icing salts: chloride binding capacity of the paste",
      explanation: `De-icing salts are expected but no chloride concentration was given, so the state at the steel cannot be located. ${capacityText} ${reaction} ${unexposedText} ${limits}`,
      basis: BASIS,
      actions: ["Enter the chloride concentration of the run-off or brine (chlorideMgPerL) to locate the exposure on the binding isotherm.", ...actions],
    };
  }

  const exhausted = e.afmCapacityExhausted;
  const overThreshold = e.totalChlorideMassPercent >= threshold;
  if (!exhausted && !overThreshold) return undefined;
  const severity = exhausted && overThreshold ? "warning" : "caution";
  const reachedText = e.reachedInSweep ? "" : " (the pore solution did not reach this concentration within the computed range; figures are at its end and are lower bounds)";
  const stateText =
    `At the exposure's free chloride of ${f2(e.freeChlorideMolPerKgWater)} mol/L${reachedText}, the paste holds ${f2(e.totalChlorideMassPercent)} % chloride by binder mass ` +
    `(${f2(e.totalChlorideKgPerM3)} kg/m³): ${f2(e.boundChlorideMassPercent)} % bound in solids and ${f2(e.freeChlorideMassPercent)} % free in the pore solution, ` +
    `${overThreshold ? "above" : "below"} the commonly quoted threshold of ${threshold} %.`;
  const gibbsText = exhausted
    ? `No chloride-free AFm is left there: Friedel's salt is saturated (SI ${f2(e.friedelSaltSaturationIndex)}) and the conversion of ${precursor} has ΔrG = ${f2(e.friedelFormationGibbsKJPerMol)} kJ/mol, i.e. it has run to completion and cannot buffer more chloride.`
    : `Friedel's salt and ${precursor} coexist there (saturation indices ${f2(e.friedelSaltSaturationIndex)} and ${f2(e.precursorSaturationIndex)}; ΔrG of the conversion ${f2(e.friedelFormationGibbsKJPerMol)} kJ/mol): binding still buffers the free chloride.`;
  return {
    id: "chloride-binding-limit",
    severity,
    title: exhausted ? "Chloride exceeds the paste's binding capacity" : "Chloride above the depassivation threshold",
    explanation: `${stateText} ${gibbsText} ${capacityText} ${reaction} ${unexposedText} ${limits}`,
    basis: BASIS,
    actions,
  };
}
