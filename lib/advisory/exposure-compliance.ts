import type { Flag } from "./flag";
import type { ExposureClassification } from "./exposure-classes";
import { CAUTIONS } from "./cautions";
import { ACI318, EN206, type Aci318Requirement } from "./standards-data";

/**
 * Compares a mix against the limiting values of each assigned exposure class:
 * EN 206:2013+A2:2021 Annex F Table F.1 (recommended; national annexes govern) and
 * ACI 318-19 Table 19.3.2.1. Each requirement reports its limit, the mix's value and pass/fail;
 * `pass: null` means the input does not allow the check (the item says what is missing).
 */

export type MixForCompliance = {
  /** Mass ratio of free water to binder (EN 206 w/c with additions counted by the k-value concept; ACI w/cm). */
  waterBinderRatio: number;
  binderContentKgPerM3: number;
  /** EN 206 strength class, e.g. "C30/37" (Table 12). */
  strengthClass?: string;
  /** Specified (characteristic) cylinder compressive strength, MPa; used where no strengthClass is given. */
  fckMPa?: number;
  /** A sulfate-resisting binder (e.g. EN 197-1 CEM I-SR, ASTM C150 Type V). */
  sulfateResisting?: boolean;
  /** ASTM designation of sulfate resistance: MS (Type II, C595 (MS), C1157 MS) or HS (Type V, (HS), HS). */
  sulfateResistanceDesignation?: "none" | "MS" | "HS";
  /** Binder includes pozzolan or slag cement (ACI 318 S3 option 1). */
  withPozzolanOrSlag?: boolean;
  airEntrained?: boolean;
  airContentPercent?: number;
  calciumChlorideAdmixture?: boolean;
  /** Water-soluble chloride ion, % by mass of cementitious material. */
  chlorideIonPercentOfBinder?: number;
  prestressed?: boolean;
  /** Free label of the binder, echoed in the results. */
  binderType?: string;
};

export type ComplianceItem = {
  exposureClass: string;
  requirement:
    | "max-water-binder-ratio"
    | "min-strength"
    | "min-binder-content"
    | "sulfate-resisting-binder"
    | "min-air-content"
    | "air-entrainment"
    | "freeze-thaw-resistant-aggregate"
    | "calcium-chloride-admixture"
    | "max-chloride-ion";
  description: string;
  limit: number | string;
  actual: number | string | boolean | null;
  unit?: string;
  /** null: not assessed (input missing or not checkable by calculation). */
  pass: boolean | null;
  source: string;
};

export type ComplianceResult = {
  en206: ComplianceItem[];
  aci318: ComplianceItem[];
  flags: Flag[];
  jurisdictionStatement: string;
};

export type MixError = { code: "invalid-mix"; field: string; message: string };

/** Checks the mix numbers; returns the first problem, naming the field and its limit. */
export function validateMixForCompliance(mix: MixForCompliance): MixError | undefined {
  const check = (field: keyof MixForCompliance, value: number | undefined, min: number, max: number, unit: string) =>
    value !== undefined && !(Number.isFinite(value) && value >= min && value <= max)
      ? { code: "invalid-mix" as const, field: `mix.${field}`, message: `mix.${field} must be within ${min}–${max}${unit}` }
      : undefined;
  return (
    check("waterBinderRatio", mix.waterBinderRatio, 0.15, 1.5, "") ??
    check("binderContentKgPerM3", mix.binderContentKgPerM3, 50, 1200, " kg/m³") ??
    check("fckMPa", mix.fckMPa, 5, 200, " MPa") ??
    check("airContentPercent", mix.airContentPercent, 0, 20, " %") ??
    check("chlorideIonPercentOfBinder", mix.chlorideIonPercentOfBinder, 0, 10, " %") ??
    (mix.strengthClass !== undefined && !EN206.strengthClasses.classes.some((c) => c.strengthClass === mix.strengthClass)
      ? {
          code: "invalid-mix",
          field: "mix.strengthClass",
          message: `mix.strengthClass must be one of ${EN206.strengthClasses.classes.map((c) => c.strengthClass).join(", ")} (${EN206.strengthClasses.table})`,
        }
      : undefined)
  );
}

const fckOfClass = (strengthClass: string): number | undefined =>
  EN206.strengthClasses.classes.find((c) => c.strengthClass === strengthClass)?.fckCylinderMPa;

function mixFckMPa(mix: MixForCompliance): number | undefined {
  return mix.strengthClass !== undefined ? fckOfClass(mix.strengthClass) : mix.fckMPa;
}

const atMost = (actual: number, limit: number) => actual <= limit + 1e-12;
const atLeast = (actual: number, limit: number) => actual >= limit - 1e-12;

/** EN 206 Annex F Table F.1 requirements of each EN 206 class. */
export function checkEn206(mix: MixForCompliance, classification: ExposureClassification["en206"]): ComplianceItem[] {
  const source = EN206.limitingValues.table;
  const items: ComplianceItem[] = [];
  const fck = mixFckMPa(mix);
  for (const { exposureClass } of classification.classes) {
    const limits = EN206.limitingValues.classes[exposureClass];
    if (!limits) continue;
    if (limits.maxWaterCementRatio !== null)
      items.push({
        exposureClass, requirement: "max-water-binder-ratio", description: "maximum w/c", limit: limits.maxWaterCementRatio,
        actual: mix.waterBinderRatio, pass: atMost(mix.waterBinderRatio, limits.maxWaterCementRatio), source,
      });
    const minFck = fckOfClass(limits.minStrengthClass);
    items.push({
      exposureClass, requirement: "min-strength", description: `minimum strength class ${limits.minStrengthClass} (fck,cyl)`, limit: minFck ?? limits.minStrengthClass,
      actual: fck ?? null, unit: "MPa", pass: fck === undefined || minFck === undefined ? null : atLeast(fck, minFck), source,
    });
    if (limits.minCementContentKgPerM3 !== null)
      items.push({
        exposureClass, requirement: "min-binder-content", description: "minimum cement content", limit: limits.minCementContentKgPerM3,
        actual: mix.binderContentKgPerM3, unit: "kg/m³", pass: atLeast(mix.binderContentKgPerM3, limits.minCementContentKgPerM3), source,
      });
    if (limits.sulfateResistingCement && classification.chemical.sulfateGoverns) {
      const actual = mix.sulfateResisting ?? (mix.sulfateResistanceDesignation ? mix.sulfateResistanceDesignation === "HS" : undefined);
      items.push({
        exposureClass, requirement: "sulfate-resisting-binder", description: EN206.limitingValues.sulfateResistingNote, limit: "sulfate-resisting cement",
        actual: actual ?? null, pass: actual ?? null, source,
      });
    }
    if (limits.minAirContentPercent !== null)
      items.push({
        exposureClass, requirement: "min-air-content", description: "minimum air content (or freeze–thaw performance tested)", limit: limits.minAirContentPercent,
        actual: mix.airContentPercent ?? null, unit: "%", pass: mix.airContentPercent === undefined ? null : atLeast(mix.airContentPercent, limits.minAirContentPercent), source,
      });
    if (limits.freezeThawResistantAggregate)
      items.push({
        exposureClass, requirement: "freeze-thaw-resistant-aggregate", description: "aggregates with sufficient freeze–thaw resistance (EN 12620): check by test",
        limit: "EN 12620", actual: null, pass: null, source,
      });
  }
  return items;
}

/** The mix's ASTM sulfate-resistance designation; a sulfate-resisting binder without designation is read as HS. */
function designationOf(mix: MixForCompliance): "none" | "MS" | "HS" | undefined {
  if (mix.sulfateResistanceDesignation) return mix.sulfateResistanceDesignation;
  if (mix.sulfateResisting === true) return "HS";
  if (mix.sulfateResisting === false) return "none";
  return undefined;
}
const designationRank = { none: 0, MS: 1, HS: 2 } as const;

function aciBasic(exposureClass: string, r: { maxWaterCementitiousRatio: number | null; minFcMPa: number }, mix: MixForCompliance, source: string): ComplianceItem[] {
  const items: ComplianceItem[] = [];
  const fck = mixFckMPa(mix);
  if (r.maxWaterCementitiousRatio !== null)
    items.push({
      exposureClass, requirement: "max-water-binder-ratio", description: "maximum w/cm", limit: r.maxWaterCementitiousRatio,
      actual: mix.waterBinderRatio, pass: atMost(mix.waterBinderRatio, r.maxWaterCementitiousRatio), source,
    });
  items.push({
    exposureClass, requirement: "min-strength", description: "minimum f'c", limit: r.minFcMPa, actual: fck ?? null, unit: "MPa",
    pass: fck === undefined ? null : atLeast(fck, r.minFcMPa), source,
  });
  return items;
}

function aciSulfateBinder(exposureClass: string, required: "MS" | "HS", pozzolanOrSlag: boolean, types: string[], mix: MixForCompliance, source: string): ComplianceItem[] {
  const d = designationOf(mix);
  const items: ComplianceItem[] = [
    {
      exposureClass, requirement: "sulfate-resisting-binder", description: `cementitious materials: ${types.join("; ")}`, limit: required,
      actual: d ?? null, pass: d === undefined ? null : designationRank[d] >= designationRank[required], source,
    },
  ];
  if (pozzolanOrSlag)
    items.push({
      exposureClass, requirement: "sulfate-resisting-binder", description: "plus pozzolan or slag cement", limit: "pozzolan or slag cement",
      actual: mix.withPozzolanOrSlag ?? null, pass: mix.withPozzolanOrSlag ?? null, source,
    });
  return items;
}

/** ACI 318-19 Table 19.3.2.1 requirements of each ACI class. */
export function checkAci318(mix: MixForCompliance, classification: ExposureClassification["aci318"]): ComplianceItem[] {
  const source = ACI318.requirements.table;
  const items: ComplianceItem[] = [];
  for (const { exposureClass } of classification.classes) {
    const r: Aci318Requirement | undefined = ACI318.requirements.classes[exposureClass];
    if (!r) continue;
    let classItems = aciBasic(exposureClass, r, mix, source);
    if (r.sulfateResistance && r.sulfateResistance !== "none") {
      classItems.push(...aciSulfateBinder(exposureClass, r.sulfateResistance, r.requiresPozzolanOrSlag === true, r.cementitiousTypes ?? [], mix, source));
      if (r.alternative && classItems.some((i) => i.pass === false)) {
        const alt = [
          ...aciBasic(exposureClass, r.alternative, mix, `${source} (option 2)`),
          ...aciSulfateBinder(exposureClass, r.sulfateResistance, r.alternative.requiresPozzolanOrSlag, r.alternative.cementitiousTypes, mix, `${source} (option 2)`),
        ];
        if (alt.every((i) => i.pass !== false)) classItems = alt;
      }
    }
    if (r.calciumChlorideAdmixture === "not permitted")
      classItems.push({
        exposureClass, requirement: "calcium-chloride-admixture", description: "calcium chloride as an admixture not permitted", limit: "not permitted",
        actual: mix.calciumChlorideAdmixture ?? null, pass: mix.calciumChlorideAdmixture === undefined ? null : !mix.calciumChlorideAdmixture, source,
      });
    if (r.airEntrainmentRequired)
      classItems.push({
        exposureClass, requirement: "air-entrainment", description: "air-entrained concrete, air content per Table 19.3.3.1 for the aggregate size", limit: "air-entrained",
        actual: mix.airEntrained ?? mix.airContentPercent ?? null, pass: mix.airEntrained === false ? false : null, source,
      });
    if (r.maxChlorideIonPercentOfCementitious) {
      const limit = mix.prestressed ? r.maxChlorideIonPercentOfCementitious.prestressed : r.maxChlorideIonPercentOfCementitious.nonprestressed;
      classItems.push({
        exposureClass, requirement: "max-chloride-ion", description: `maximum water-soluble Cl− (${mix.prestressed ? "prestressed" : "nonprestressed"}), % by mass of cementitious materials`,
        limit, actual: mix.chlorideIonPercentOfBinder ?? null, unit: "%",
        pass: mix.chlorideIonPercentOfBinder === undefined ? null : atMost(mix.chlorideIonPercentOfBinder, limit), source,
      });
    }
    items.push(...classItems);
  }
  return items;
}

function describeFailure(standard: string, i: ComplianceItem): string {
  const unit = i.unit ? ` ${i.unit}` : "";
  return `${standard} ${i.exposureClass}: ${i.description} — limit ${i.limit}${unit}, mix ${i.actual ?? "not given"}`;
}

/** The governing (tightest) numeric limit of the failed items of one requirement: the smallest maximum or the largest minimum. */
function governing(failed: readonly ComplianceItem[], requirement: ComplianceItem["requirement"], pick: (a: number, b: number) => number): number | undefined {
  const limits = failed.filter((i) => i.requirement === requirement && typeof i.limit === "number").map((i) => i.limit as number);
  return limits.length > 0 ? limits.reduce((a, b) => pick(a, b)) : undefined;
}

/** What to change, one action per kind of limit not met, with the governing value. */
function actionsFor(failed: readonly ComplianceItem[]): string[] {
  const actions: string[] = [];
  const maxRatio = governing(failed, "max-water-binder-ratio", Math.min);
  if (maxRatio !== undefined) actions.push(`Lower the water/binder ratio to ${maxRatio} or below (the governing limit of the classes not met).`);
  const minStrength = governing(failed, "min-strength", Math.max);
  if (minStrength !== undefined) actions.push(`Specify a strength of at least ${minStrength} MPa (cylinder; EN 206 class or ACI 318 f'c).`);
  const minBinder = governing(failed, "min-binder-content", Math.max);
  if (minBinder !== undefined) actions.push(`Raise the binder content to at least ${minBinder} kg/m³.`);
  if (failed.some((i) => i.requirement === "sulfate-resisting-binder"))
    actions.push("Use a binder the standard accepts for the sulfate class (EN 197-1 SR cement; ASTM C150 Type V or C595/C1157 HS, with pozzolan or slag where S3 asks for it).");
  if (failed.some((i) => i.requirement === "min-air-content" || i.requirement === "air-entrainment"))
    actions.push("Entrain air to the content the freeze–thaw class requires (EN 206 Table F.1; ACI 318 Table 19.3.3.1 for the aggregate size), or prove freeze–thaw resistance by test.");
  if (failed.some((i) => i.requirement === "calcium-chloride-admixture")) actions.push("Do not use calcium chloride as an admixture in this exposure.");
  if (failed.some((i) => i.requirement === "max-chloride-ion")) actions.push("Lower the chloride content of the constituents to the class limit (EN 206 Table 15; ACI 318 Table 19.3.2.1).");
  return actions;
}

/** The compliance check of a mix against the classes of both standards, with a warning flag where a limit fails. */
export function checkCompliance(mix: MixForCompliance, classification: ExposureClassification): ComplianceResult {
  const en206 = checkEn206(mix, classification.en206);
  const aci318 = checkAci318(mix, classification.aci318);
  const failures = [...en206.filter((i) => i.pass === false).map((i) => describeFailure("EN 206", i)), ...aci318.filter((i) => i.pass === false).map((i) => describeFailure("ACI 318", i))];
  const flags: Flag[] = [];
  if (failures.length > 0) {
    flags.push({
      id: "exposure-class-noncompliance",
      severity: "warning",
      title: "The mix does not meet the limiting values of its exposure classes",
      explanation: `Limits not met: ${failures.join("; ")}.`,
      basis: `${EN206.limitingValues.table} (recommended values; national annex governs); ${ACI318.requirements.table}.`,
      actions: [...actionsFor([...en206, ...aci318].filter((i) => i.pass === false)), "Check the limits of the national annex or local code that applies to the project."],
    });
  }
  return { en206, aci318, flags, jurisdictionStatement: CAUTIONS["national-annexes-govern"].text };
}
