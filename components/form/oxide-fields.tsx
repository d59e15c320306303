"use client";

import { useState } from "react";
import { useFormContext, useWatch } from "react-hook-form";
import { NumberField } from "./fields";
import { OXIDE_LABELS, OXIDE_ORDER, oxideTotal, parseOxideRow, type OxideKey } from "./oxide-analysis";
import { fieldId } from "./form-errors";

/**
 * The fields of an oxide analysis (mass %), the live total with a warning outside 97–101 %, and a box to paste a
 * spreadsheet row in the order shown.
 */
export function OxideFields({ prefix, required = ["CaO", "SiO2", "Al2O3", "Fe2O3"] }: { prefix: string; required?: readonly string[] }) {
  const { setValue, control } = useFormContext();
  const watched = useWatch({ control, name: prefix }) as Partial<Record<OxideKey, unknown>> | undefined;
  const total = oxideTotal(watched ?? {});
  const [pasteText, setPasteText] = useState("");
  const [pasteMessage, setPasteMessage] = useState<string | null>(null);
  const totalId = `${fieldId(prefix)}-total`;
  const pasteId = `${fieldId(prefix)}-paste`;

  const applyPaste = () => {
    const parsed = parseOxideRow(pasteText);
    if (!parsed.ok) {
      setPasteMessage(parsed.message);
      return;
    }
    for (const key of OXIDE_ORDER) {
      if (parsed.values[key] !== undefined) setValue(`${prefix}.${key}`, parsed.values[key], { shouldDirty: true });
    }
    setPasteMessage(`Filled ${Object.keys(parsed.values).length} values from the pasted row.`);
  };

  return (
    <div className="oxide-analysis">
      <div className="oxide-grid">
        {OXIDE_ORDER.map((key) => (
          <NumberField key={key} name={`${prefix}.${key}`} label={OXIDE_LABELS[key]} unit="mass %" required={required.includes(key)} />
        ))}
      </div>
      <p id={totalId} className={`oxide-total ${total.withinRange ? "ok" : "warn"}`} role="status" aria-live="polite">
        <span aria-hidden="true">{total.withinRange ? "✓ " : "⚠ "}</span>
        Analysis total: <strong data-testid="oxide-total">{total.totalMassPercent.toFixed(2)} mass %</strong>
        {total.withinRange
          ? ` (within ${total.minMassPercent}–${total.maxMassPercent} %)`
          : ` — warning: outside ${total.minMassPercent}–${total.maxMassPercent} %; check the analysis (oxides + loss on ignition, or CO₂ without LOI, + Cl; free lime is part of CaO).`}
      </p>
      <details className="paste-row">
        <summary>Paste a spreadsheet row</summary>
        <label htmlFor={pasteId}>Row of values in the order {OXIDE_ORDER.join(", ")} (tab, semicolon or comma separated)</label>
        <textarea id={pasteId} rows={2} value={pasteText} onChange={(e) => setPasteText(e.target.value)} />
        <button type="button" className="secondary" onClick={applyPaste}>
          Fill the analysis
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
