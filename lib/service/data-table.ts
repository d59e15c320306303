import { dataListRows, type DataListRow } from "../cli/commands/data";
import { loadDataset } from "../data/load-dataset";
import type { DatasetFileInfo } from "../data/dataset";
import { domainError, type ServiceOutcome } from "./outcome";

export type DataTable = {
  version: string;
  /** Each data file's family, title and provenance (sources, generator, date). */
  files: DatasetFileInfo[];
  /** One row per species: ΔfG° and log Ksp at 25 °C, molar volume, source, recalled-from-memory marker. */
  rows: DataListRow[];
  units: { gibbsKJPerMol25C: "kJ/mol"; molarVolumeCm3PerMol: "cm3/mol"; log10Ksp25C: "log10 (dissolution to the cement basis)" };
};

/** `GET /api/v1/data`: the thermodynamic data set as a table with its sources (same rows as `data list`). */
export function dataTable(): ServiceOutcome<DataTable> {
  const loaded = loadDataset();
  if (!loaded.ok) return domainError("dataset_unavailable", loaded.error.message, { file: loaded.error.file, path: loaded.error.path });
  const rows = dataListRows();
  if (!rows.ok) return domainError("dataset_unavailable", rows.message);
  return {
    ok: true,
    value: {
      version: loaded.value.version,
      files: loaded.value.files,
      rows: rows.rows,
      units: { gibbsKJPerMol25C: "kJ/mol", molarVolumeCm3PerMol: "cm3/mol", log10Ksp25C: "log10 (dissolution to the cement basis)" },
    },
  };
}
