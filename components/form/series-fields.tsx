"use client";

import { useState, type ReactNode } from "react";
import { get, useFieldArray, useFormContext } from "react-hook-form";
import { NumberField } from "./fields";
import { fieldId } from "./form-errors";
import { parseTwoColumnRows } from "./two-column-paste";

/** One column of an entered series: the key in each point, how a row labels it and its unit. */
export type SeriesColumn = { key: string; label: string; unit: string; pasteName: string };

export type SeriesFieldsProps = {
  /** Form path of the list of points (e.g. `curing.thermal.ambient.points`). */
  name: string;
  columns: readonly [SeriesColumn, SeriesColumn];
  /** Most points accepted; the schema checks it again on submit. */
  maxPoints: number;
  className: string;
  hint: ReactNode;
  /** Row labels read "<rowLabel> 1: <column label>". */
  rowLabel: string;
  addLabel: string;
  pasteSummary: string;
  pasteLabel: string;
  fillLabel: string;
};

/**
 * A list of two-number points, typed row by row or pasted as two spreadsheet columns (`parseTwoColumnRows`),
 * with each column's unit beside every input and the schema's list-level message (order, count) linked to the list.
 */
export function SeriesFields({ name, columns, maxPoints, className, hint, rowLabel, addLabel, pasteSummary, pasteLabel, fillLabel }: SeriesFieldsProps) {
  const { control, formState } = useFormContext();
  const { fields, append, remove, replace } = useFieldArray({ control, name });
  const [pasteText, setPasteText] = useState("");
  const [pasteMessage, setPasteMessage] = useState<string | null>(null);
  const id = fieldId(name);
  const listError = get(formState.errors, name) as { message?: string; root?: { message?: string } } | undefined;
  const listMessage = listError?.message ?? listError?.root?.message;
  const [first, second] = columns;

  const applyPaste = () => {
    const parsed = parseTwoColumnRows(pasteText, [first.pasteName, second.pasteName], maxPoints);
    if (!parsed.ok) {
      setPasteMessage(parsed.message);
      return;
    }
    replace(parsed.rows.map(([a, b]) => ({ [first.key]: a, [second.key]: b })));
    setPasteMessage(`Filled ${parsed.rows.length} points from the pasted columns.`);
  };

  return (
    <div className={className} id={id} tabIndex={-1} aria-describedby={`${id}-hint${listMessage ? ` ${id}-error` : ""}`}>
      <p className="hint" id={`${id}-hint`}>
        {hint}
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
          <NumberField name={`${name}.${index}.${first.key}`} label={`${rowLabel} ${index + 1}: ${first.label}`} unit={first.unit} required />
          <NumberField name={`${name}.${index}.${second.key}`} label={`${rowLabel} ${index + 1}: ${second.label}`} unit={second.unit} required />
          <button type="button" className="link-button" onClick={() => remove(index)}>
            Remove {rowLabel.toLowerCase()} {index + 1}
          </button>
        </div>
      ))}
      <button type="button" className="secondary" disabled={fields.length >= maxPoints} onClick={() => append({ [first.key]: undefined, [second.key]: undefined })}>
        {addLabel}
      </button>
      <details className="paste-row">
        <summary>{pasteSummary}</summary>
        <label htmlFor={`${id}-paste`}>{pasteLabel}</label>
        <textarea id={`${id}-paste`} rows={4} value={pasteText} onChange={(e) => setPasteText(e.target.value)} />
        <button type="button" className="secondary" onClick={applyPaste}>
          {fillLabel}
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
