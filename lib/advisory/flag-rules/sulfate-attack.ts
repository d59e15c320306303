import type { Flag } from "../flag";
import { severeSulfateExposure } from "../sulfate-exposure";
import { advisoryThresholds } from "../thresholds";
import type { ExposureInput } from "../../schema/exposure-input";
import type { SulfateScenario } from "../../scenarios/sulfate-ingress";

const t = advisoryThresholds.sulfateAttack;

/**
 * `sulfate-attack`: the solids formed by sulfate taken up from the exposure (ettringite from AFm and
 * gypsum) against the paste's pore space, with the exposure class as the severity context.
 */
export function sulfateAttackFlag(result: SulfateScenario, context: { exposure: ExposureInput }): Flag | undefined {
  const exposure = severeSulfateExposure(context.exposure);
  if (!exposure.any) return undefined;
  const s = result.summary;
  const increase = s.maximumSolidVolumeIncreasePercentOfPores;
  const severity = exposure.severe && increase >= t.warningSolidVolumeIncreasePercentOfPores.value ? "warning" : increase >= t.cautionSolidVolumeIncreasePercentOfPores.value ? "caution" : "info";
  return {
    id: "sulfate-attack",
    severity,
    title: severity === "info" ? "Sulfate exposure: limited expansive solids computed" : "Sulfate exposure: expansive ettringite and gypsum can fill the pore space",
    explanation:
      `With ${s.sulfateMgPerL} mg/L sulfate (${exposure.label}), AFm phases take up sulfate and turn into ettringite ` +
      `(monosulfate + 2 Ca²⁺ + 2 SO4²⁻ + 20 H2O → ettringite); the computed ettringite gain is ${(s.ettringiteIncreaseMolPer100g * 1000).toFixed(1)} mmol per 100 g binder. ` +
      `The solid volume grows by up to ${increase.toFixed(0)} % of the paste's initial capillary pore volume (${s.initialPoreVolumeCm3.toFixed(1)} cm³ per 100 g binder) over the sweep. ` +
      (s.gypsumOnsetDoseMmolPer100g !== null ? `Gypsum appears from ${s.gypsumOnsetDoseMmolPer100g.toFixed(0)} mmol SO4 per 100 g binder. ` : `Gypsum stays undersaturated (largest saturation index ${s.gypsumSaturationIndexMax.toFixed(2)}). `),
    basis: `Solid volume increase against porosity as an expansion indicator: Kunther, Lothenbach & Scrivener 2013 (Cem. Concr. Res. 44, 77); screening thresholds ${t.cautionSolidVolumeIncreasePercentOfPores.value} % / ${t.warningSolidVolumeIncreasePercentOfPores.value} % of pores (this tool). Exposure classes EN 206 Table 2, ACI 318-19 Table 19.3.1.1.`,
    actions: [
      "Use a sulfate-resisting binder (EN 197-1 SR cement, ASTM C150 Type V, or a slag/fly-ash blend per ACI 318 Table 19.3.2.1 / EN 206 national annex).",
      "Lower the w/cm to the limit of the exposure class or below to slow sulfate ingress.",
      "Test the binder for sulfate resistance (ASTM C1012 mortar-bar expansion) before use in this exposure.",
    ],
  };
}
