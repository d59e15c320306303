import { binderSystemFromInput } from "../cement/binder-system";
import { binderSystemIssue } from "../cement/binder-system-issue";
import { clinkerPhase, type ClinkerPhaseId } from "../cement/clinker-phases";
import { partitionCementOxides } from "../cement/clinker-partition";
import { oxideMolarMassGPerMol } from "../cement/oxides";
import type { ResolvedBinder } from "../cement/resolve-binder";
import { curingBinderFormSchema, firstCuringBinderFormIssue } from "../schema/curing-binder-form";
import { thermodynamicHeatCurve, type ThermodynamicHeatCurve } from "./thermodynamic-heat";

/**
 * The curing input in the assessment's binder form: instead of `cement.phasesMassPercent` (and curing-form
 * `supplementaryMaterials`), a `binder: { cement, supplementaryMaterials, heatCalculation? }` as in the binder input
 * schema (`lib/schema/binder-input.ts`), with the mix taken from `concrete.waterBinderRatio` and
 * `concrete.binderKgPerM3`. It is turned into the ordinary curing input, with the thermodynamic heat curve
 * (`thermodynamic-heat.ts`) as its `heatCurve` and the cement's phase composition (exact partition of the analysis,
 * `clinker-partition.ts`) as `cement.phasesMassPercent` for the per-phase check and the curing flags.
 */
export type BinderFormError = { code: "invalid-input"; field: string; message: string };

export type BinderFormConversion = {
  /** The raw curing input with `cement`, `supplementaryMaterials` and `heatCurve` filled in; validate it with `parseCuringInput`. */
  curingInput: Record<string, unknown>;
  binder: ResolvedBinder;
  heat: ThermodynamicHeatCurve;
};

/** True when the raw input uses the binder form. */
export function isBinderForm(raw: unknown): raw is Record<string, unknown> & { binder: unknown } {
  return typeof raw === "object" && raw !== null && !Array.isArray(raw) && "binder" in raw;
}

const fail = (field: string, message: string): { ok: false; error: BinderFormError } => ({ ok: false, error: { code: "invalid-input", field, message } });

/** Binder-schema issue paths in the curing input's terms. */
function curingField(path: string): string {
  if (path === "mix.waterBinderRatio") return "concrete.waterBinderRatio";
  if (path === "mix.binderContentKgPerM3") return "concrete.binderKgPerM3";
  if (path.startsWith("mix")) return "concrete";
  return path ? `binder.${path}` : "binder";
}

const percent = 100;

/** Cement phases in the curing form (mass % of the cement), from the resolved binder's Portland part. */
function curingCementPhases(binder: ResolvedBinder): { ok: true; value: Record<string, number> } | { ok: false; error: string } {
  const so3PerMol = (id: ClinkerPhaseId) => oxideMolarMassGPerMol("SO3") * (clinkerPhase(id).elements.S ?? 0) / clinkerPhase(id).molarMassGPerMol;
  let g: Partial<Record<ClinkerPhaseId, number>>;
  if (binder.cement.kind === "oxides") {
    const partition = partitionCementOxides(binder.cement.oxidesMassPercent);
    if (!partition.ok) return { ok: false, error: `the cement analysis gives a negative ${partition.error.phase} (${partition.error.massG.toFixed(2)} g per 100 g)` };
    g = { ...partition.value.phasesG };
    // MgO in clinker solid solution counts with periclase for the classic MgO heat.
    g.periclase = (g.periclase ?? 0) + (partition.value.clinkerSolidSolutionG.MgO ?? 0);
  } else {
    const p = binder.cement.phasesMassPercent;
    const total = Object.values(p).reduce((s: number, v) => s + (v ?? 0), 0);
    const n = (v: number | undefined) => ((v ?? 0) / total) * percent;
    g = { alite: n(p.alite), belite: n(p.belite), aluminate: n(p.aluminate), ferrite: n(p.ferrite), periclase: n(p.periclase), "free-lime": n(p.freeLime), calcite: n(p.calcite), gypsum: n(p.gypsum), bassanite: n(p.bassanite), anhydrite: n(p.anhydrite), arcanite: n(p.arcanite), aphthitalite: n(p.aphthitalite) };
  }
  const so3 = (["gypsum", "bassanite", "anhydrite", "arcanite", "thenardite", "aphthitalite"] as const).reduce((s, id) => s + (g[id] ?? 0) * so3PerMol(id), 0);
  return { ok: true, value: {
    C3S: g.alite ?? 0,
    C2S: g.belite ?? 0,
    C3A: g.aluminate ?? 0,
    // Dicalcium ferrite (A/F < 0.64) is counted with the ferrite phase: the classic sets have no C2F heat.
    C4AF: (g.ferrite ?? 0) + (g["ferrite-c2f"] ?? 0),
    SO3: so3,
    freeCaO: g["free-lime"] ?? 0,
    MgO: g.periclase ?? 0,
  } };
}

/**
 * Converts the binder form (validated by `curingBinderFormSchema`, `lib/schema/curing-binder-form.ts`) to the curing
 * input and computes its thermodynamic heat curve. Errors name the field
 * in the input's own terms (`binder.cement.presetId`, `concrete.waterBinderRatio`, `binder.supplementaryMaterials`).
 */
export function curingInputFromBinderForm(raw: Record<string, unknown>): { ok: true; value: BinderFormConversion } | { ok: false; error: BinderFormError } {
  // Which form the input is in comes first: the schema would drop a stray phase-form field without a word.
  if ("cement" in raw) return fail("cement", "give either cement (phase form) or binder (binder form), not both");
  if ("supplementaryMaterials" in raw) return fail("supplementaryMaterials", "with the binder form, give supplementaryMaterials inside binder");
  if ("heatCurve" in raw) return fail("heatCurve", "give either heatCurve or binder: the binder form computes the heat curve");
  const parsed = curingBinderFormSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = firstCuringBinderFormIssue(parsed.error);
    return fail(issue.field, issue.message);
  }
  const { cement, supplementaryMaterials, heatCalculation = {} } = parsed.data.binder;
  const concrete = parsed.data.concrete;
  const system = binderSystemFromInput({
    cement,
    supplementaryMaterials,
    mix: { waterBinderRatio: concrete.waterBinderRatio, binderContentKgPerM3: concrete.binderKgPerM3 },
    // The age is not used: the heat curve sets its own ages. A valid placeholder lets the binder schema run.
    age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  });
  if (!system.ok) {
    const error = system.error;
    if (error.code === "invalid_input") {
      const issue = error.issues[0];
      const field = curingField(issue.path);
      return fail(field, issue.message.startsWith(field) ? issue.message : `${field}: ${issue.message}`);
    }
    const issue = binderSystemIssue(error);
    return fail(`binder.${issue.path}`, issue.message);
  }
  const binder = system.value.binder;
  const phases = curingCementPhases(binder);
  if (!phases.ok) return fail("binder.cement", phases.error);
  const curve = thermodynamicHeatCurve(binder, {
    ...(heatCalculation.temperatureC !== undefined ? { temperatureC: heatCalculation.temperatureC } : {}),
    ...(heatCalculation.activationEnergyJPerMol !== undefined ? { activationEnergyJPerMol: heatCalculation.activationEnergyJPerMol } : {}),
    ...(heatCalculation.points !== undefined ? { points: heatCalculation.points } : {}),
  });
  if (!curve.ok) {
    const e = curve.error;
    if (e.code === "enthalpy_unavailable")
      return fail("binder.supplementaryMaterials", `${e.message}; use the phase form (cement.phasesMassPercent) for ${e.uncovered.map((u) => u.scmType).join(", ")}`);
    return fail("binder", `the thermodynamic heat could not be computed: ${"message" in e ? e.message : e.code}`);
  }
  const curingScms = binder.supplementaryMaterials.map((m) => ({
    type: m.type,
    massPercentOfBinder: m.massPercentOfBinder,
    ...(m.oxidesMassPercent.CaO !== undefined ? { caoMassPercent: m.oxidesMassPercent.CaO } : {}),
  }));
  const { binder: _form, ...curingRest } = raw;
  return {
    ok: true,
    value: {
      curingInput: {
        ...curingRest,
        cement: { phasesMassPercent: phases.value, blaineM2PerKg: binder.cement.blaineM2PerKg },
        supplementaryMaterials: curingScms,
        heatCurve: curve.value.heatCurveInput,
      },
      binder,
      heat: curve.value,
    },
  };
}

const roundTo = (x: number, digits: number) => Math.round(x * 10 ** digits) / 10 ** digits;

/** The `thermodynamicHeat` section of the curing output for the binder form: the curve against age and its basis. */
export function thermodynamicHeatSection(conversion: BinderFormConversion) {
  const heat = conversion.heat;
  return {
    method: "heat released = enthalpy of the reacted anhydrous binder and water − enthalpy of the equilibrium assemblage and pore solution, at the calculation temperature",
    temperatureC: heat.temperatureC,
    activationEnergyJPerMol: heat.activationEnergyJPerMol,
    curve: heat.points.map((p) => ({ ageDays: roundTo(p.ageDays, 4), equivalentAgeH: roundTo(p.equivalentAgeH, 3), heatJPerGBinder: roundTo(p.heatJPerGBinder, 1), cumulativeHeatJPerG: roundTo(p.cumulativeHeatJPerG, 1) })),
    largestDecreaseJPerG: roundTo(heat.largestDecreaseJPerG, 2),
    presetLabels: conversion.binder.presetLabels,
    note: "enthalpies of the anhydrous reactants and of the hydrates are recalled values (lib/data/binders/anhydrous-enthalpies.json and the cement data set); a fully hydrated ordinary Portland cement comes out above the published 450-520 J/g (about 537 J/g for the CEM I preset, most of the excess from the ferrite), and the Parrot-Killoh degrees release it early (no dormant period)",
  };
}
