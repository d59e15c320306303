"use client";

import curingLimits from "../../lib/data/curing/curing-limits.json";
import { NumberField, SelectField } from "./fields";

/** "" → undefined (the rule decides), "true"/"false" → the boolean the schema takes. */
export const booleanChoiceOrUndefined = (value: unknown): boolean | undefined => {
  if (value === true || value === "true") return true;
  if (value === false || value === "false") return false;
  return undefined;
};

const defLimit = curingLimits.defPeakTemperatureC;
const differenceLimit = curingLimits.coreSurfaceDifferenceC;
const freezingLimit = curingLimits.freezingRequiredStrengthMPa;
const evaporationLimit = curingLimits.evaporationCautionKgPerM2H;
const lowEvaporationLimit = curingLimits.evaporationLowWcmKgPerM2H;

/**
 * Overrides of the thresholds the curing flags use (`curing.thermal.limits` of the schema). Each field left
 * empty keeps the default of lib/data/curing/curing-limits.json, shown in the hint with its source; a value
 * typed here is the engineer's (e.g. the project specification's) and the flag says so.
 */
export function LimitOverrideFields({ name = "curing.thermal.limits" }: { name?: string }) {
  return (
    <fieldset className="subsection">
      <legend>Advisory limits (optional overrides)</legend>
      <p className="hint">Leave a field empty to keep the default shown beside it. Use the limits of your project specification where it sets them.</p>
      <div className="row">
        <NumberField
          name={`${name}.ettringiteStabilityTemperatureC`}
          label="Peak temperature limit (delayed ettringite)"
          unit="°C"
          hint={`40–100 °C. Default ${defLimit.value} °C, caution from ${defLimit.value - defLimit.cautionMarginC} °C: ${defLimit.source}.`}
        />
        <NumberField
          name={`${name}.maxDifferenceC`}
          label="Core–surface difference limit"
          unit="°C"
          hint={`5–50 °C. Default ${differenceLimit.value} °C: ${differenceLimit.source}.`}
        />
        <NumberField
          name={`${name}.freezingStrengthMPa`}
          label="Strength before first freezing"
          unit="MPa"
          hint={`1–20 MPa. Default ${freezingLimit.value} MPa: ${freezingLimit.source}. ${freezingLimit.alternatives.map((a) => `Alternative ${a.valueMPa} MPa: ${a.source}.`).join(" ")}`}
        />
      </div>
      <SelectField
        name={`${name}.lowWaterBinderOrSilicaFume`}
        label="Evaporation threshold"
        choices={[
          { value: "true", label: `low (${lowEvaporationLimit.value} kg/m² h): low w/b or silica fume` },
          { value: "false", label: `normal (${evaporationLimit.value} kg/m² h)` },
        ]}
        emptyLabel={`from the mix (low when silica fume or w/b below ${lowEvaporationLimit.lowWaterBinderBelow})`}
        setValueAs={booleanChoiceOrUndefined}
        hint={`Plastic-shrinkage caution rate. Normal: ${evaporationLimit.source}. Low: ${lowEvaporationLimit.source}.`}
      />
    </fieldset>
  );
}
