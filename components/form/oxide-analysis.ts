import { analysisTotalMassPercent, analysisTotalRangeMassPercent } from "../../lib/cement/analysis-total";
import type { OxideAnalysisMassPercent } from "../../lib/schema/binder-input";

/** The oxides of an analysis in the order the form shows them (EN 196-2 / ASTM C114 reporting order), mass %. */
export const OXIDE_ORDER = ["CaO", "SiO2", "Al2O3", "Fe2O3", "MgO", "SO3", "Na2O", "K2O", "TiO2", "P2O5", "Mn2O3", "CO2", "LOI", "freeLime", "Cl"] as const;
export type OxideKey = (typeof OXIDE_ORDER)[number];

/** How each oxide is printed (subscripts as Unicode digits). */
export const OXIDE_LABELS: Record<OxideKey, string> = {
  CaO: "CaO", SiO2: "SiO₂", Al2O3: "Al₂O₃", Fe2O3: "Fe₂O₃", MgO: "MgO", SO3: "SO₃", Na2O: "Na₂O", K2O: "K₂O",
  TiO2: "TiO₂", P2O5: "P₂O₅", Mn2O3: "Mn₂O₃", CO2: "CO₂", LOI: "Loss on ignition", freeLime: "Free lime", Cl: "Cl⁻",
};

export type OxideTotal = { totalMassPercent: number; withinRange: boolean; minMassPercent: number; maxMassPercent: number };

/**
 * The live total of an oxide analysis (the same sum the engine checks: oxides + LOI, or CO2 without LOI, + Cl;
 * free lime is part of CaO) and whether it lies in the accepted 97–101 % range of `oxide-to-phase-rules.json`.
 */
export function oxideTotal(values: Partial<Record<OxideKey, unknown>>): OxideTotal {
  const oxides: OxideAnalysisMassPercent = {};
  for (const key of OXIDE_ORDER) {
    const v = values[key];
    if (typeof v === "number" && Number.isFinite(v)) oxides[key] = v;
  }
  const [minMassPercent, maxMassPercent] = analysisTotalRangeMassPercent;
  const totalMassPercent = analysisTotalMassPercent(oxides);
  return { totalMassPercent, withinRange: totalMassPercent >= minMassPercent && totalMassPercent <= maxMassPercent, minMassPercent, maxMassPercent };
}

export type PastedRow = { ok: true; values: Partial<Record<OxideKey, number>> } | { ok: false; message: string };

/**
 * Parses one spreadsheet row pasted into the form: values in the order of `OXIDE_ORDER`, separated by tabs
 * (a copied spreadsheet row), semicolons or commas. With tabs or semicolons a decimal comma is accepted
 * ("63,5"); with commas as separators the decimal mark must be a point. Empty cells leave the field empty.
 */
export function parseOxideRow(text: string): PastedRow {
  const line = text.trim().split(/\r?\n/)[0] ?? "";
  if (!line) return { ok: false, message: "The pasted row is empty." };
  const separator = line.includes("\t") ? "\t" : line.includes(";") ? ";" : ",";
  const cells = line.split(separator).map((cell) => cell.trim());
  if (cells.length > OXIDE_ORDER.length)
    return { ok: false, message: `The row has ${cells.length} values; at most ${OXIDE_ORDER.length} are expected (${OXIDE_ORDER.join(", ")}).` };
  const values: Partial<Record<OxideKey, number>> = {};
  for (let i = 0; i < cells.length; i++) {
    const cell = cells[i];
    if (cell === "") continue;
    const normalised = separator === "," ? cell : cell.replace(",", ".");
    const number = Number(normalised);
    if (!Number.isFinite(number) || !/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(normalised))
      return { ok: false, message: `Value ${i + 1} (${OXIDE_ORDER[i]}) is not a number: "${cell}".` };
    if (number < 0 || number > 100) return { ok: false, message: `Value ${i + 1} (${OXIDE_ORDER[i]}) must be between 0 and 100 mass %.` };
    values[OXIDE_ORDER[i]] = number;
  }
  return { ok: true, values };
}
