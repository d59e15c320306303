import cementPresets from "../data/binders/cement-presets.json";
import scmPresets from "../data/binders/scm-presets.json";
import pkConstants from "../data/binders/parrot-killoh-constants.json";
import type { BinderInput, OxideAnalysisMassPercent, PhaseAnalysisMassPercent, ScmTypeInput } from "../schema/binder-input";

/**
 * A validated binder input with every preset expanded: the Portland part as an oxide or phase analysis,
 * and each supplementary material with its oxide analysis and reactive fraction.
 */
export type ResolvedCement =
  | { kind: "oxides"; oxidesMassPercent: OxideAnalysisMassPercent; blaineM2PerKg: number }
  | { kind: "phases"; phasesMassPercent: PhaseAnalysisMassPercent; blaineM2PerKg: number };

export type ResolvedScm = {
  type: ScmTypeInput;
  massPercentOfBinder: number;
  oxidesMassPercent: OxideAnalysisMassPercent;
  reactiveFraction: number;
  /** Set when the composition came from a preset ("typical, replace with your certificate"). */
  presetLabel?: string;
};

export type ResolvedBinder = {
  cement: ResolvedCement;
  /** Mass % of the binder that is the Portland part (100 − Σ SCM). */
  cementMassPercentOfBinder: number;
  supplementaryMaterials: ResolvedScm[];
  mix: BinderInput["mix"];
  age: BinderInput["age"];
  /** Labels of the presets used, e.g. "typical, replace with your certificate". */
  presetLabels: string[];
};

export type ResolveBinderError =
  | { code: "preset_already_blended"; presetId: string; field: "supplementaryMaterials" }
  | { code: "scm_total_exceeds_limit"; totalMassPercent: number; maxMassPercent: number };

export type ResolveBinderResult = { ok: true; value: ResolvedBinder } | { ok: false; error: ResolveBinderError };

function scmPreset(presetId: string) {
  const preset = scmPresets.presets.find((entry) => entry.id === presetId);
  if (!preset) throw new Error(`resolveBinder: scm preset ${presetId} missing although the schema accepted it`);
  return preset;
}

/** Expands presets. A blended cement preset carries its own SCMs and cannot take further ones. */
export function resolveBinder(input: BinderInput): ResolveBinderResult {
  const presetLabels: string[] = [];
  let cement: ResolvedCement;
  let scmInputs = input.supplementaryMaterials;
  const defaultBlaine = input.cement.blaineM2PerKg ?? pkConstants.referenceBlaineM2PerKg;
  if (input.cement.kind === "preset") {
    const presetId = input.cement.presetId;
    const preset = cementPresets.presets.find((entry) => entry.id === presetId);
    if (!preset) throw new Error(`resolveBinder: cement preset ${presetId} missing although the schema accepted it`);
    presetLabels.push(`${preset.name} (${preset.standard}): ${preset.label}`);
    cement = { kind: "oxides", oxidesMassPercent: preset.cement.oxidesMassPercent, blaineM2PerKg: input.cement.blaineM2PerKg ?? preset.cement.blaineM2PerKg };
    if (preset.supplementaryMaterials.length > 0) {
      if (scmInputs.length > 0) return { ok: false, error: { code: "preset_already_blended", presetId, field: "supplementaryMaterials" } };
      scmInputs = preset.supplementaryMaterials.map((scm) => ({
        type: scm.type as ScmTypeInput,
        massPercentOfBinder: scm.massPercentOfBinder,
        composition: { kind: "preset" as const, presetId: scm.presetId },
      }));
    }
  } else if (input.cement.kind === "oxides") {
    cement = { kind: "oxides", oxidesMassPercent: input.cement.oxidesMassPercent, blaineM2PerKg: defaultBlaine };
  } else {
    cement = { kind: "phases", phasesMassPercent: input.cement.phasesMassPercent, blaineM2PerKg: defaultBlaine };
  }
  const supplementaryMaterials: ResolvedScm[] = scmInputs.map((scm) => {
    if (scm.composition.kind === "preset") {
      const preset = scmPreset(scm.composition.presetId);
      presetLabels.push(`${preset.name}: ${preset.label}`);
      return {
        type: scm.type,
        massPercentOfBinder: scm.massPercentOfBinder,
        oxidesMassPercent: preset.oxidesMassPercent,
        reactiveFraction: scm.reactiveFraction ?? preset.reactiveFraction,
        presetLabel: preset.label,
      };
    }
    // The schema requires reactiveFraction with an oxide analysis.
    return { type: scm.type, massPercentOfBinder: scm.massPercentOfBinder, oxidesMassPercent: scm.composition.oxidesMassPercent, reactiveFraction: scm.reactiveFraction ?? 1 };
  });
  const totalScm = supplementaryMaterials.reduce((sum, scm) => sum + scm.massPercentOfBinder, 0);
  // 95 %: the upper limit of slag in EN 197-1 CEM III/C and ASTM C595 type IS, the same limit as the schema.
  if (totalScm > 95) return { ok: false, error: { code: "scm_total_exceeds_limit", totalMassPercent: totalScm, maxMassPercent: 95 } };
  return {
    ok: true,
    value: { cement, cementMassPercentOfBinder: 100 - totalScm, supplementaryMaterials, mix: input.mix, age: input.age, presetLabels },
  };
}
