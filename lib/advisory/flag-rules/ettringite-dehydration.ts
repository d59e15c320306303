import type { DryingScenario } from "../../scenarios/drying";
import type { ExposureInput } from "../../schema/exposure-input";
import type { Flag } from "../flag";

export type FlagContext = { exposure: ExposureInput; curingMaxTemperatureC?: number; waterBinderRatio: number };

/**
 * A service humidity below this multiple of the computed collapse humidity counts as close to it: the collapse
 * humidity rests on a recalled transition with low confidence (lib/data/hydration-states.json; this module's choice).
 */
export const NEAR_COLLAPSE_HUMIDITY_FACTOR = 2;

/** Wetting regimes with repeated drying and re-wetting, in which collapse and rehydration would alternate (common practice). */
const CYCLIC_WETTING = new Set(["wet-dry", "unsheltered"]);

const BASIS =
  "Ettringite ⇄ metaettringite on drying: Baquerizo, Matschei & Scrivener 2016, Cem. Concr. Res. 79, 31; decomposition of " +
  "ettringite at low water-vapour pressure and elevated temperature: Zhou & Glasser 2001, Cem. Concr. Res. 31, 1333 (from memory). " +
  "The transition humidities of the data set were recalled from these studies and the data derived from them, so the computed " +
  "collapse humidity reproduces the recalled value rather than checking it. Re-wetting may restore ettringite, with hysteresis; the " +
  "volume changes and possible microcracking are common practice cautions. This is a thermodynamic guide; local codes, standards " +
  "and testing govern.";

const f1 = (x: number) => x.toFixed(1);
const f2 = (x: number) => x.toFixed(2);

/**
 * `ettringite-dehydration`: the service humidity and temperature put ettringite in its collapsed low-water form
 * (metaettringite). Warning where wetting is cyclic (collapse and rehydration alternate), caution otherwise; info when
 * the service humidity is within a factor of the collapse humidity; nothing when ettringite is absent, the paste stays
 * saturated or no service humidity is known.
 */
export function ettringiteDehydrationFlag(result: DryingScenario, context: FlagContext): Flag | undefined {
  const s = result.summary;
  if (!s.ettringitePresent || s.serviceRelativeHumidityPercent === null) return undefined;
  const states = result.service.filter((x) => x.waterVapourPressureBar !== null);
  if (states.length === 0) return undefined;
  const worst = states.reduce((w, x) => ((x.ettringiteDehydrationGibbsKJPerMol ?? Infinity) < (w.ettringiteDehydrationGibbsKJPerMol ?? Infinity) ? x : w));
  const gibbs = worst.ettringiteDehydrationGibbsKJPerMol;
  const n = worst.ettringiteDehydrationWaterPerFormula;
  if (gibbs === null || n === null) return undefined;
  const collapseRh = s.ettringiteCollapseBelowRhPercent;
  const near = !s.ettringiteCollapsed && collapseRh !== null && worst.relativeHumidityPercent < NEAR_COLLAPSE_HUMIDITY_FACTOR * collapseRh;
  if (!s.ettringiteCollapsed && !near) return undefined;

  const cyclic = context.exposure.wetting !== undefined && CYCLIC_WETTING.has(context.exposure.wetting);
  const severity = s.ettringiteCollapsed ? (cyclic ? "warning" : "caution") : "info";
  const reaction = `Ca6Al2(SO4)3(OH)12·26H2O (ettringite) → Ca6Al2(SO4)3(OH)12·${26 - n}H2O (metaettringite) + ${n} H2O(g)`;
  const where = `at ${f1(worst.relativeHumidityPercent)} % relative humidity and ${f1(worst.temperatureC)} °C (water-vapour pressure ${(1000 * worst.waterVapourPressureBar!).toFixed(2)} mbar)`;
  const gibbsText =
    gibbs < 0
      ? `has ΔrG = ${f1(gibbs)} kJ per mol of ettringite ${where}: the collapse is favoured`
      : `has ΔrG = +${f1(gibbs)} kJ per mol of ettringite ${where}: ettringite is still stable, but close to its collapse`;
  const collapseText =
    collapseRh === null ? "" : ` At ${f1(Math.max(...s.serviceTemperaturesC))} °C the computed collapse humidity is ${f1(collapseRh)} % RH; it rises with temperature.`;
  const volumeText = s.ettringiteCollapsed
    ? ` The solid volume of the ettringite changes by ${f2(s.ettringiteVolumeChangeCm3)} cm³ per 100 g binder (${f1(s.ettringiteVolumeChangeLitresPerM3)} L/m³ of concrete) and the solids give off ${f2(worst.waterReleasedMol)} mol water per 100 g binder.`
    : "";
  const others = Object.entries(s.stableMembers).filter(([family]) => family !== "ettringite").map(([family, member]) => `${family}: ${member}`);
  const otherText = others.length > 0 ? ` Other hydration states there: ${others.join("; ")}.` : "";
  const limits =
    " Equilibrium gives the drying branch only: re-wetting may restore ettringite, at a much higher humidity (hysteresis), and the repeated volume change can cause microcracking." +
    (cyclic && s.ettringiteCollapsed ? " The wetting regime is cyclic, so collapse and rehydration would alternate." : "");
  return {
    id: "ettringite-dehydration",
    severity,
    title: s.ettringiteCollapsed ? "Ettringite collapses to metaettringite at the service humidity" : "Service humidity close to the collapse of ettringite",
    explanation: `The dehydration ${reaction} ${gibbsText}.${collapseText}${volumeText}${otherText}${limits}`,
    basis: BASIS,
    actions: [
      "Check the service humidity and temperature at the concrete surface and within the cover (e.g. in-situ relative-humidity probes in drilled holes, ASTM F2170); heat sources and sealed hot rooms dry concrete the most.",
      "Keep the concrete moist during curing and avoid early drying at elevated temperature.",
      "Confirm ettringite on samples by X-ray diffraction or thermogravimetry, prepared without oven drying (oven drying at 105 °C itself destroys ettringite; use solvent exchange; common practice).",
      "Inspect for microcracking (e.g. thin-section or SEM microscopy) where drying and re-wetting alternate.",
    ],
  };
}
