import { phaseLabel } from "../charts/phase-labels";
import { valueAt } from "./key-figures";

/**
 * The headline figures of each durability scenario (issue 5: what each scenario reports), read from a saved result
 * (`AssessmentResult.scenarios`) for the results page and the reports: present whether or not a flag fired, so that an
 * engineer sees, for example, the ettringite stability temperature of a mix cured cold. Read defensively: a result
 * from an older engine, or a scenario that was not run, gives fewer rows, never a guessed value.
 */
export type ScenarioFinding = { scenario: string; quantity: string; value: number | string; unit: string };

type Loose = Record<string, unknown>;
const isObject = (v: unknown): v is Loose => v !== null && typeof v === "object" && !Array.isArray(v);
const isNumber = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);

/** Said of a dose or temperature the sweep did not reach (null in the result). */
const NOT_REACHED = "not reached in the sweep";

const SCENARIO_TITLES = {
  sulfate: "Sulfate ingress",
  carbonation: "Carbonation",
  temperature: "Temperature history (delayed ettringite formation)",
  thaumasite: "Thaumasite",
  chloride: "Chloride binding",
  drying: "Drying",
} as const;

type Row = [quantity: string, value: unknown, unit: string, whenNull?: string];

function rowsOf(scenario: keyof typeof SCENARIO_TITLES, rows: Row[]): ScenarioFinding[] {
  const out: ScenarioFinding[] = [];
  for (const [quantity, value, unit, whenNull] of rows) {
    if (isNumber(value) || (typeof value === "string" && value !== "")) out.push({ scenario: SCENARIO_TITLES[scenario], quantity, value, unit });
    else if (value === null && whenNull) out.push({ scenario: SCENARIO_TITLES[scenario], quantity, value: whenNull, unit: "" });
  }
  return out;
}

/** A stability limit (`StabilityLimit` of the temperature scenarios) in words or as a temperature. */
function stabilityLimitValue(limit: unknown): { value: number | string; unit: string } | null {
  if (!isObject(limit)) return null;
  if (limit.kind === "found" && isNumber(limit.temperatureC)) return { value: limit.temperatureC, unit: "°C" };
  if (limit.kind === "stable-throughout" && isNumber(limit.upToC)) return { value: `stable throughout (up to ${limit.upToC} °C)`, unit: "" };
  if (limit.kind === "absent-throughout") return { value: "absent at every temperature computed", unit: "" };
  if ((limit.kind === "bracketed" || limit.kind === "decided") && Array.isArray(limit.bracketC) && limit.bracketC.every(isNumber))
    return { value: `between ${limit.bracketC[0]} and ${limit.bracketC[1]} °C`, unit: "" };
  return null;
}

function sulfate(s: Loose): ScenarioFinding[] {
  const m = isObject(s.summary) ? s.summary : {};
  return rowsOf("sulfate", [
    ["Largest solid-volume gain, of the initial capillary pores", m.maximumSolidVolumeIncreasePercentOfPores, "%"],
    ["Sulfate dose at which the solids fill the initial pores", m.poresFilledAtDoseMmolPer100g, "mmol SO4/100 g binder", NOT_REACHED],
    ["Sulfate dose at which gypsum appears", m.gypsumOnsetDoseMmolPer100g, "mmol SO4/100 g binder", NOT_REACHED],
    ["Sulfate dose at which portlandite is exhausted", m.portlanditeExhaustedDoseMmolPer100g, "mmol SO4/100 g binder", NOT_REACHED],
    ...(m.cation === "Mg" ? ([["Sulfate dose at which brucite or M-S-H appears", m.magnesiumPhasesOnsetDoseMmolPer100g, "mmol SO4/100 g binder", NOT_REACHED]] as Row[]) : []),
    ["Ettringite formed over the sweep", isNumber(m.ettringiteIncreaseMolPer100g) ? m.ettringiteIncreaseMolPer100g * 1000 : undefined, "mmol/100 g binder"],
  ]);
}

function carbonation(s: Loose): ScenarioFinding[] {
  const m = isObject(s.summary) ? s.summary : {};
  const depth = isObject(s.depth) ? s.depth : {};
  const threshold = isNumber(m.depassivationPH) ? ` (pH ${m.depassivationPH})` : "";
  return rowsOf("carbonation", [
    ["CO2 binding capacity", m.co2BindingCapacityMolPerM3, "mol/m³ concrete"],
    [`CO2 uptake at which the pore solution falls below the depassivation pH${threshold}`, m.depassivationUptakeMolPerM3, "mol/m³ concrete", NOT_REACHED],
    ["pH at full carbonation", m.finalPH, ""],
    // The gas phase of the CO2 added is not a solid of the paste.
    ["Solids at full carbonation", Array.isArray(m.finalPhases) ? m.finalPhases.filter((p): p is string => typeof p === "string" && p !== "gas").map(phaseLabel).join(", ") : undefined, ""],
    ["Peak dissolved sulfate released from AFm/AFt", m.peakDissolvedSulfateMmolPerKg, "mmol/kg water"],
    ["Peak dissolved chloride released", m.peakDissolvedChlorideMmolPerKg, "mmol/kg water"],
    ["Carbonation coefficient (Papadakis et al. 1991)", depth.coefficientMmPerSqrtYear, "mm/√year"],
  ]);
}

function temperature(s: Loose): ScenarioFinding[] {
  const m = isObject(s.summary) ? s.summary : {};
  const limit = stabilityLimitValue(m.stabilityLimit);
  const atCuring = isObject(m.atCuring) ? m.atCuring : {};
  const sulfateAtCuring = isObject(atCuring.sulfate) ? atCuring.sulfate : {};
  return [
    ...(limit ? [{ scenario: SCENARIO_TITLES.temperature, quantity: "Temperature above which ettringite is not stable in this mix", ...limit }] : []),
    ...rowsOf("temperature", [
      ["Curing temperature evaluated", m.curingTemperatureC, "°C"],
      ["Sulfate held outside ettringite at the curing temperature", sulfateAtCuring.outsideAftMolSO3PerM3, "mol SO3/m³ concrete"],
      ["Sulfate that goes into ettringite on cooling to service", m.sulfateToEttringiteOnCoolingMolSO3PerM3, "mol SO3/m³ concrete"],
      ["Ettringite formed on cooling to service", m.ettringiteVolumeGainOnCoolingLitresPerM3, "L/m³ concrete"],
    ]),
  ];
}

function thaumasite(s: Loose): ScenarioFinding[] {
  const m = isObject(s.summary) ? s.summary : {};
  const service = isObject(m.atService) ? m.atService : {};
  const limit = stabilityLimitValue(m.stabilityLimit);
  return [
    ...rowsOf("thaumasite", [
      ["Service temperature evaluated (the coldest)", m.serviceTemperatureC, "°C"],
      ["Thaumasite saturation index at service, without it (> 0: stable)", service.saturationIndexWithoutIt, ""],
      ["Thaumasite formed at service", service.thaumasiteLitresPerM3, "L/m³ concrete"],
      ["Share of the binder's silicon taken from C-S-H into thaumasite", service.siliconInThaumasitePercent, "%"],
    ]),
    ...(limit ? [{ scenario: SCENARIO_TITLES.thaumasite, quantity: "Temperature above which thaumasite is not stable", ...limit }] : []),
  ];
}

function chloride(s: Loose): ScenarioFinding[] {
  const m = isObject(s.summary) ? s.summary : {};
  const exposure = isObject(m.exposure) ? m.exposure : {};
  return rowsOf("chloride", [
    ["Largest bound chloride in the sweep", m.boundChlorideMaxKgPerM3, "kg/m³ concrete"],
    ["Total chloride at which the AFm binding capacity is used up", m.capacityExhaustedAtTotalChlorideKgPerM3, "kg/m³ concrete", NOT_REACHED],
    ["Bound chloride at the exposure's concentration", exposure.boundChlorideKgPerM3, "kg/m³ concrete"],
    ["Free chloride at the exposure's concentration", exposure.freeChlorideKgPerM3, "kg/m³ concrete"],
  ]);
}

function drying(s: Loose): ScenarioFinding[] {
  const m = isObject(s.summary) ? s.summary : {};
  const members = isObject(m.stableMembers) ? Object.entries(m.stableMembers).filter(([, v]) => typeof v === "string").map(([family, member]) => `${phaseLabel(family)}: ${phaseLabel(member as string)}`).join("; ") : undefined;
  return rowsOf("drying", [
    ["Service relative humidity", m.serviceRelativeHumidityPercent, "%"],
    ["Ettringite collapses at the service conditions", typeof m.ettringiteCollapsed === "boolean" && m.ettringitePresent === true ? (m.ettringiteCollapsed ? "yes" : "no") : undefined, ""],
    ["Relative humidity below which ettringite collapses (highest service temperature)", m.ettringiteCollapseBelowRhPercent, "%"],
    ["Stable hydration state per family at the service conditions", members, ""],
  ]);
}

const READERS: Record<keyof typeof SCENARIO_TITLES, (scenario: Loose) => ScenarioFinding[]> = { sulfate, carbonation, temperature, thaumasite, chloride, drying };

/** The findings of every scenario the result holds, in the order of `SCENARIO_TITLES`. */
export function scenarioFindings(result: unknown): ScenarioFinding[] {
  const scenarios = valueAt(result, ["scenarios"]);
  if (!isObject(scenarios)) return [];
  const out: ScenarioFinding[] = [];
  for (const key of Object.keys(SCENARIO_TITLES) as (keyof typeof SCENARIO_TITLES)[]) {
    const scenario = scenarios[key];
    if (isObject(scenario)) out.push(...READERS[key](scenario));
  }
  return out;
}
