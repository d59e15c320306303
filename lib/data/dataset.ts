import type { SolutionEntry, SpeciesEntry } from "./schema";

/** One data-file entry after loading: formula parsed, molar mass computed, uncertainty filled in. */
export type LoadedSpecies = SpeciesEntry & {
  elements: Record<string, number>;
  charge: number;
  molarMassGPerMol: number;
  /** The entry's own uncertainty, or its file's default (log10 K units, one standard uncertainty). */
  uncertaintyLog10K: number;
  /** `family` of the file the entry came from. */
  family: string;
};

export type DatasetFileInfo = {
  family: string;
  title: string;
  provenance: { sources: string[]; generatedBy: string; date: string };
};

/** The loaded thermodynamic data set. */
export type Dataset = {
  species: LoadedSpecies[];
  solutions: SolutionEntry[];
  files: DatasetFileInfo[];
  /** SHA-256 (hex, first 16 characters) of the file contents in load order: changes whenever any file does. */
  version: string;
};

export type DatasetErrorCode =
  | "no_files"
  | "file_unreadable"
  | "json_syntax"
  | "schema_invalid"
  | "formula_invalid"
  | "duplicate_id"
  | "unknown_solution";

export type DatasetError = {
  code: DatasetErrorCode;
  /** Path of the offending file as given or resolved. */
  file: string;
  /** Location inside the file, e.g. `species[3].formula`; empty for the whole file. */
  path: string;
  message: string;
};

export type DatasetResult = { ok: true; value: Dataset } | { ok: false; error: DatasetError };
