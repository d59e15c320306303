import cementPresets from "../../lib/data/binders/cement-presets.json";
import scmPresets from "../../lib/data/binders/scm-presets.json";
import { bogueAstmC150 } from "../../lib/cement/bogue";
import type { OxideAnalysisMassPercent } from "../../lib/schema/binder-input";

/**
 * The form values completed for the schema: the thermal model's copies of the element thickness, binder
 * content, w/b, cement phases and supplementary materials are taken from the fields the engineer filled above
 * (so nothing is typed twice), and the cover goes to the exposure for the carbonation check.
 * Cement phases: the phase analysis when given, else the ASTM C150 Bogue potential composition of the
 * oxide analysis (entered or from the preset).
 */
type Loose = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

const curingScmTypes = new Set(["slag", "siliceous-fly-ash", "calcareous-fly-ash", "silica-fume", "metakaolin", "limestone", "natural-pozzolan"]);

export function cementPhasesForThermalModel(cement: Loose | undefined): { C3S: number; C2S: number; C3A: number; C4AF: number; SO3?: number; MgO?: number } | undefined {
  if (!cement) return undefined;
  if (cement.kind === "phases" && cement.phasesMassPercent) {
    const p = cement.phasesMassPercent;
    return { C3S: p.alite, C2S: p.belite, C3A: p.aluminate, C4AF: p.ferrite };
  }
  let oxides: OxideAnalysisMassPercent | undefined;
  if (cement.kind === "oxides") oxides = cement.oxidesMassPercent;
  if (cement.kind === "preset") oxides = cementPresets.presets.find((p) => p.id === cement.presetId)?.cement.oxidesMassPercent;
  if (!oxides || typeof oxides.CaO !== "number" || typeof oxides.SiO2 !== "number") return undefined;
  const bogue = bogueAstmC150(oxides).phasesMassPercent;
  const round1 = (x: number) => Math.round(Math.max(0, x) * 10) / 10;
  return {
    C3S: round1(bogue.C3S),
    C2S: round1(bogue.C2S),
    C3A: round1(bogue.C3A),
    C4AF: round1(bogue.C4AF + bogue.ssFerrite),
    ...(typeof oxides.SO3 === "number" ? { SO3: Math.min(10, oxides.SO3) } : {}),
    ...(typeof oxides.MgO === "number" ? { MgO: Math.min(10, oxides.MgO) } : {}),
  };
}

function scmsForThermalModel(binder: Loose | undefined): { type: string; massPercentOfBinder: number }[] {
  const list: { type: string; massPercentOfBinder: number }[] = [];
  const cement = binder?.cement;
  if (cement?.kind === "preset") {
    const preset = cementPresets.presets.find((p) => p.id === cement.presetId);
    for (const scm of preset?.supplementaryMaterials ?? []) list.push({ type: scm.type, massPercentOfBinder: scm.massPercentOfBinder });
  }
  for (const scm of (binder?.supplementaryMaterials ?? []) as Loose[]) {
    if (curingScmTypes.has(scm?.type) && typeof scm?.massPercentOfBinder === "number") list.push({ type: scm.type, massPercentOfBinder: scm.massPercentOfBinder });
  }
  return list;
}

export function prepareAssessInput(values: Loose): Loose {
  const out: Loose = structuredClone(values ?? {});
  for (const key of ["aggregateVolume", "airVolume"]) {
    if (out.mix?.[key] && out.mix[key].value === undefined) delete out.mix[key];
  }
  // A typical composition is the one preset of the material's type (one per type in scm-presets.json).
  for (const scm of (out.binder?.supplementaryMaterials ?? []) as Loose[]) {
    if (scm?.composition?.kind === "preset") {
      const preset = scmPresets.presets.find((p) => p.type === scm.type);
      scm.composition = { kind: "preset", presetId: preset?.id ?? scm.composition.presetId };
    }
  }
  // A range with neither bound typed is a service temperature not given.
  const service = out.exposure?.serviceTemperatureC;
  if (service !== null && typeof service === "object" && service.minC === undefined && service.maxC === undefined) delete out.exposure.serviceTemperatureC;
  const cover = out.project?.element?.coverMm;
  if (out.exposure && typeof cover === "number" && out.exposure.coverMm === undefined) out.exposure.coverMm = cover;
  const thermal = out.curing?.thermal;
  if (thermal) {
    // Rows left wholly empty are dropped; a half-filled row stays, so the schema names the missing value.
    if (Array.isArray(thermal.ambient?.points)) thermal.ambient.points = (thermal.ambient.points as Loose[]).filter((p) => p && !(p.timeH === undefined && p.temperatureC === undefined));
    if (Array.isArray(thermal.heatCurve?.points)) thermal.heatCurve.points = (thermal.heatCurve.points as Loose[]).filter((p) => p && !(p.equivalentAgeH === undefined && p.cumulativeHeatJPerG === undefined));
    if (Array.isArray(thermal.strengthTargets)) thermal.strengthTargets = (thermal.strengthTargets as Loose[]).filter((t) => t && !(t.label === undefined && t.strengthMPa === undefined));
    thermal.element = { ...(thermal.element ?? {}), thicknessM: out.project?.element?.thicknessM };
    thermal.concrete = {
      ...(thermal.concrete ?? {}),
      binderKgPerM3: out.mix?.binderContentKgPerM3,
      waterBinderRatio: out.mix?.waterBinderRatio,
    };
    const phases = cementPhasesForThermalModel(out.binder?.cement);
    thermal.cement = { phasesMassPercent: phases ?? {}, ...(typeof out.binder?.cement?.blaineM2PerKg === "number" ? { blaineM2PerKg: out.binder.cement.blaineM2PerKg } : {}) };
    thermal.supplementaryMaterials = scmsForThermalModel(out.binder);
  }
  return out;
}
