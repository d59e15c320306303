"use client";

import type { ReactNode } from "react";
import { get, useFormContext, type FieldValues, type RegisterOptions } from "react-hook-form";
import { fieldId } from "./form-errors";

/** Empty input → undefined (the field is left out), otherwise a number (NaN when it is not one; the schema names it). */
export const numberOrUndefined = (value: unknown): number | undefined => {
  if (value === "" || value === null || value === undefined) return undefined;
  if (typeof value === "number") return value;
  const text = String(value).trim().replace(",", ".");
  return text === "" ? undefined : Number(text);
};

export const textOrUndefined = (value: unknown): string | undefined => (value === "" || value === null || value === undefined ? undefined : String(value));

type FieldProps = {
  name: string;
  label: ReactNode;
  unit?: string;
  hint?: ReactNode;
  required?: boolean;
};

function useFieldState(name: string) {
  const { formState } = useFormContext();
  const error = get(formState.errors, name) as { message?: string } | undefined;
  const id = fieldId(name);
  return { id, hintId: `${id}-hint`, errorId: `${id}-error`, error: error?.message };
}

function Described({ id, hintId, errorId, hint, error }: { id: string; hintId: string; errorId: string; hint?: ReactNode; error?: string }) {
  return (
    <>
      {hint ? (
        <p className="hint" id={hintId}>
          {hint}
        </p>
      ) : null}
      {error ? (
        <p className="field-error" id={errorId} data-for={id}>
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      ) : null}
    </>
  );
}

const describedBy = (hint: unknown, error: unknown, hintId: string, errorId: string) =>
  [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(" ") || undefined;

/** A number input with its unit beside it, a hint (default and source) and the schema's message. */
/**
 * The error of a group of fields (an array such as the supplementary materials, or a rule across its entries), shown
 * inside the group. react-hook-form keeps it at the group's path or at `root` under it.
 */
export function GroupError({ name }: { name: string }) {
  const { formState } = useFormContext();
  const node = get(formState.errors, name) as { message?: string; root?: { message?: string } } | undefined;
  const message = node?.message ?? node?.root?.message;
  if (!message) return null;
  return (
    <p className="field-error" id={`${fieldId(name)}-error`} data-for={fieldId(name)}>
      <span aria-hidden="true">⚠ </span>
      {message}
    </p>
  );
}

export function NumberField({ name, label, unit, hint, required, step = "any", options }: FieldProps & { step?: string; options?: RegisterOptions<FieldValues, string> }) {
  const { register } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState(name);
  return (
    <div className={`field${error ? " has-error" : ""}`}>
      <label htmlFor={id}>
        {label}
        {required ? <span className="required"> (required)</span> : null}
      </label>
      <div className="input-with-unit">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          data-step={step}
          autoComplete="off"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(hint, error, hintId, errorId)}
          {...register(name, { setValueAs: numberOrUndefined, ...options })}
        />
        {unit ? <span className="unit" aria-hidden="true">{unit}</span> : null}
        {unit ? <span className="visually-hidden">in {unit}</span> : null}
      </div>
      <Described id={id} hintId={hintId} errorId={errorId} hint={hint} error={error} />
    </div>
  );
}

export function TextField({ name, label, hint, required, optional = true }: FieldProps & { optional?: boolean }) {
  const { register } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState(name);
  return (
    <div className={`field${error ? " has-error" : ""}`}>
      <label htmlFor={id}>
        {label}
        {required ? <span className="required"> (required)</span> : null}
      </label>
      <input
        id={id}
        type="text"
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(hint, error, hintId, errorId)}
        {...register(name, optional ? { setValueAs: textOrUndefined } : {})}
      />
      <Described id={id} hintId={hintId} errorId={errorId} hint={hint} error={error} />
    </div>
  );
}

export type Choice = { value: string; label: string };

export function SelectField({ name, label, hint, required, choices, emptyLabel, setValueAs }: FieldProps & { choices: readonly Choice[]; emptyLabel?: string; setValueAs?: (v: unknown) => unknown }) {
  const { register } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState(name);
  return (
    <div className={`field${error ? " has-error" : ""}`}>
      <label htmlFor={id}>
        {label}
        {required ? <span className="required"> (required)</span> : null}
      </label>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(hint, error, hintId, errorId)}
        {...register(name, { setValueAs: setValueAs ?? textOrUndefined })}
      >
        {emptyLabel !== undefined ? <option value="">{emptyLabel}</option> : null}
        {choices.map((c) => (
          <option key={c.value} value={c.value}>
            {c.label}
          </option>
        ))}
      </select>
      <Described id={id} hintId={hintId} errorId={errorId} hint={hint} error={error} />
    </div>
  );
}

export function CheckboxField({ name, label, hint }: FieldProps) {
  const { register } = useFormContext();
  const { id, hintId, errorId, error } = useFieldState(name);
  return (
    <div className={`field checkbox${error ? " has-error" : ""}`}>
      <input id={id} type="checkbox" aria-describedby={describedBy(hint, error, hintId, errorId)} {...register(name)} />
      <label htmlFor={id}>{label}</label>
      <Described id={id} hintId={hintId} errorId={errorId} hint={hint} error={error} />
    </div>
  );
}

/** A choice between alternative parts of the form (cement given as preset / oxides / phases, …), as radio buttons. */
export function ModeRadios({ name, legend, choices, hint }: { name: string; legend: string; choices: readonly Choice[]; hint?: ReactNode }) {
  const { register } = useFormContext();
  const id = fieldId(name);
  return (
    <fieldset className="mode-radios" id={id} aria-describedby={hint ? `${id}-hint` : undefined}>
      <legend>{legend}</legend>
      {choices.map((c) => (
        <label key={c.value} className="radio">
          <input type="radio" value={c.value} {...register(name)} /> {c.label}
        </label>
      ))}
      {hint ? (
        <p className="hint" id={`${id}-hint`}>
          {hint}
        </p>
      ) : null}
    </fieldset>
  );
}
