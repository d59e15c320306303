"use client";

import { get, useFormContext } from "react-hook-form";
import { NumberField } from "./fields";
import { fieldId } from "./form-errors";

export type ServiceTemperatureMode = "single" | "range";

/** Which form a saved or loaded service temperature has: `{ minC, maxC }` is a range, anything else a single value. */
export function serviceTemperatureModeOf(value: unknown): ServiceTemperatureMode {
  return value !== null && typeof value === "object" ? "range" : "single";
}

/**
 * The service temperature as one mean value or as a range (min/max), −60 to 80 °C. The schema takes a number or
 * `{ minC, maxC }` with minC ≤ maxC; the radio only chooses which of the two inputs is shown.
 */
export function ServiceTemperatureFields({ name = "exposure.serviceTemperatureC", mode, onModeChange }: { name?: string; mode: ServiceTemperatureMode; onModeChange: (mode: ServiceTemperatureMode) => void }) {
  const { formState, setValue } = useFormContext();
  const id = fieldId(name);
  // The value of the other form is cleared, so a range never shows as text in the single input (or vice versa).
  // The mode is the parent's state, so that a loaded input (demo, saved file) sets it before its values arrive.
  const switchTo = (next: ServiceTemperatureMode) => {
    if (next === mode) return;
    setValue(name, undefined);
    onModeChange(next);
  };
  const error = get(formState.errors, name) as { message?: string } | undefined;
  const groupMessage = mode === "range" ? error?.message : undefined;
  return (
    <fieldset className="service-temperature" id={mode === "range" ? id : undefined} tabIndex={mode === "range" ? -1 : undefined} aria-describedby={groupMessage ? `${id}-group-error` : undefined}>
      <legend>Service temperature given as</legend>
      <div className="mode-radios">
        <label className="radio">
          <input type="radio" name={`${id}-mode`} checked={mode === "single"} onChange={() => switchTo("single")} /> one mean value
        </label>
        <label className="radio">
          <input type="radio" name={`${id}-mode`} checked={mode === "range"} onChange={() => switchTo("range")} /> a range (min/max)
        </label>
      </div>
      {mode === "single" ? (
        <NumberField name={name} label="Service temperature" unit="°C" hint="−60 to 80 °C; mean temperature in service." />
      ) : (
        <div className="row">
          <NumberField name={`${name}.minC`} label="Lowest service temperature" unit="°C" required hint="−60 to 80 °C; not above the highest." />
          <NumberField name={`${name}.maxC`} label="Highest service temperature" unit="°C" required hint="−60 to 80 °C." />
        </div>
      )}
      {groupMessage ? (
        <p className="field-error" id={`${id}-group-error`}>
          <span aria-hidden="true">⚠ </span>
          {groupMessage}
        </p>
      ) : null}
    </fieldset>
  );
}
