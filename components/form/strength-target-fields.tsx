"use client";

import { get, useFieldArray, useFormContext } from "react-hook-form";
import { NumberField, TextField } from "./fields";
import { fieldId } from "./form-errors";

/** The schema's cap on `strengthTargets` (lib/schema/curing-input.ts); the schema checks it again on submit. */
export const MAX_STRENGTH_TARGETS = 10;

/**
 * Strengths the engineer wants the time to (stripping, prestress transfer, loading): up to 10 rows of a label
 * and a strength in MPa (0.5–150 MPa). The thermal model reports when each is reached in the element.
 */
export function StrengthTargetFields({ name = "curing.thermal.strengthTargets" }: { name?: string }) {
  const { control, formState } = useFormContext();
  const { fields, append, remove } = useFieldArray({ control, name });
  const id = fieldId(name);
  const listError = get(formState.errors, name) as { message?: string; root?: { message?: string } } | undefined;
  const listMessage = listError?.message ?? listError?.root?.message;
  const full = fields.length >= MAX_STRENGTH_TARGETS;
  return (
    <fieldset className="subsection" id={id} tabIndex={-1} aria-describedby={`${id}-hint${listMessage ? ` ${id}-error` : ""}`}>
      <legend>Strength targets</legend>
      <p className="hint" id={`${id}-hint`}>
        Up to {MAX_STRENGTH_TARGETS} strengths to reach, e.g. stripping 10 MPa or prestress transfer 25 MPa (your specification governs).
      </p>
      {listMessage ? (
        <p className="field-error" id={`${id}-error`}>
          <span aria-hidden="true">⚠ </span>
          {listMessage}
        </p>
      ) : null}
      {fields.map((field, index) => (
        <div className="row" key={field.id}>
          <TextField name={`${name}.${index}.label`} label={`Target ${index + 1}: purpose`} required hint="1–80 characters." />
          <NumberField name={`${name}.${index}.strengthMPa`} label={`Target ${index + 1}: strength`} unit="MPa" required hint="0.5–150 MPa; compared with the estimated strength at the core and the surface." />
          <button type="button" className="link-button" onClick={() => remove(index)}>
            Remove target {index + 1}
          </button>
        </div>
      ))}
      <button type="button" className="secondary" disabled={full} onClick={() => append({ label: "", strengthMPa: undefined })}>
        Add a strength target
      </button>
      {full ? <p className="hint">The limit of {MAX_STRENGTH_TARGETS} targets is reached.</p> : null}
    </fieldset>
  );
}
