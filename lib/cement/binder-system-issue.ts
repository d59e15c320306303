import cementPresets from "../data/binders/cement-presets.json";
import { blendedPresetMessage } from "../schema/binder-input";
import type { FieldIssue } from "../schema/format-issues";
import type { BinderSystemError } from "./binder-system";

/**
 * A binder the schema accepts but the binder model cannot build, told as a field issue (path relative to the binder
 * input: `cement...`, `supplementaryMaterials`) in words an engineer can act on. The callers prefix the path with where
 * the binder sits in their input.
 */
export function binderSystemIssue(error: Exclude<BinderSystemError, { code: "invalid_input" }>): FieldIssue {
  switch (error.code) {
    case "preset_already_blended": {
      const preset = cementPresets.presets.find((entry) => entry.id === error.presetId);
      return { path: "supplementaryMaterials", message: preset ? blendedPresetMessage(preset) : `supplementaryMaterials must be empty with the blended cement ${error.presetId}` };
    }
    case "scm_total_exceeds_limit":
      return { path: "supplementaryMaterials", message: `supplementaryMaterials: massPercentOfBinder must sum to at most ${error.maxMassPercent} (got ${error.totalMassPercent})` };
    case "clinker_phase_negative": {
      const g = `${Math.abs(error.massG).toFixed(2)} g per 100 g`;
      // The partition takes CaO for the other phases first, then shares the rest between C3S and C2S (Bogue-type order).
      const why =
        error.phase === "alite"
          ? "has too little CaO for its SiO2: after the CaO of the aluminate, ferrite, calcium sulfate and free lime, less than 2 CaO per SiO2 is left"
          : error.phase === "belite"
            ? "has more CaO than the clinker phases can hold (more than 3 CaO per SiO2 after the other phases): give the excess as freeLime"
            : "does not partition into clinker phases";
      return { path: "cement.oxidesMassPercent", message: `cement.oxidesMassPercent: the analysis ${why} (the ${error.phase} would be −${g}); check the analysis or give a phase analysis instead` };
    }
  }
}
