"use client";

import { useState } from "react";
import { get, useFieldArray, useFormContext } from "react-hook-form";
import { NumberField } from "./fields";
import { fieldId } from "./form-errors";
import { parseTwoColumnRows } from "./two-column-paste";

/** The schema's cap on `ambient.points` (lib/schema/curing-input.ts); the schema checks it again on submit. */
const MAX_AMBIENT_POINTS = 10000;

/**
 * An entered ambient temperature series: rows of hour after placement and air temperature (°C), typed or
 * pasted as two spreadsheet columns. The schema requires 2–10000 points with increasing hours.
 */
export function AmbientSeriesFields({ name = "curing.thermal.ambient.points" }: { name?: string }) {
  const { control, formState } = useFormContext();
  const { fields, append, remove, replace } = useFieldArray({ control, name });
  const [pasteText, setPasteText] = useState("");
  const [pasteMessage, setPasteMessage] = useState<string | null>(null);
  const id = fieldId(name);
  const listError = get(formState.errors, name) as { message?: string; root?: { message?: string } } | undefined;
  const listMessage = listError?.message ?? listError?.root?.message;

  const applyPaste = () => {
    const parsed = parseTwoColumnRows(pasteText, ["hour", "°C"], MAX_AMBIENT_POINTS);
    if (!parsed.ok) {
      setPasteMessage(parsed.message);
      return;
    }
    replace(parsed.rows.map(([timeH, temperatureC]) => ({ timeH, temperatureC })));
    setPasteMessage(`Filled ${parsed.rows.length} points from the pasted columns.`);
  };

  return (
    <div className="ambient-series" id={id} tabIndex={-1} aria-describedby={`${id}-hint${listMessage ? ` ${id}-error` : ""}`}>
      <p className="hint" id={`${id}-hint`}>
        Hours after placement (0–2160 h, increasing) and air temperature (−40 to 60 °C); 2 to {MAX_AMBIENT_POINTS} points, linear between them.
      </p>
      {listMessage ? (
        <p className="field-error" id={`${id}-error`}>
          <span aria-hidden="true">⚠ </span>
          {listMessage}
        </p>
      ) : null}
      {fields.length === 0 ? <p className="hint">No points yet. Add rows or paste two columns from a spreadsheet.</p> : null}
      {fields.map((field, index) => (
        <div className="row series-row" key={field.id}>
          <NumberField name={`${name}.${index}.timeH`} label={`Point ${index + 1}: time`} unit="h" required />
          <NumberField name={`${name}.${index}.temperatureC`} label={`Point ${index + 1}: air temperature`} unit="°C" required />
          <button type="button" className="link-button" onClick={() => remove(index)}>
            Remove point {index + 1}
          </button>
        </div>
      ))}
      <button
        type="button"
        className="secondary"
        disabled={fields.length >= MAX_AMBIENT_POINTS}
        onClick={() => append({ timeH: undefined, temperatureC: undefined })}
      >
        Add a point
      </button>
      <details className="paste-row">
        <summary>Paste two columns from a spreadsheet</summary>
        <label htmlFor={`${id}-paste`}>Rows of hour and °C (tab, semicolon or comma separated; a header row is skipped)</label>
        <textarea id={`${id}-paste`} rows={4} value={pasteText} onChange={(e) => setPasteText(e.target.value)} />
        <button type="button" className="secondary" onClick={applyPaste}>
          Fill the series
        </button>
        {pasteMessage ? (
          <p role="status" className="hint">
            {pasteMessage}
          </p>
        ) : null}
      </details>
    </div>
  );
}
