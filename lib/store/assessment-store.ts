import type { AssessmentComparison } from "./compare";

/**
 * Saved assessments (project files): the inputs, the result, and the data-set and engine versions that
 * produced it. `isCurrent` says whether the running versions are the same, i.e. whether reopening the file
 * and computing again today would use the same data and engine (it would then give the same result).
 */
export type Versions = { dataset: string; engine: string };

export type AssessmentSummary = {
  id: string;
  name: string;
  /** `inputs.project.name` when the inputs carry one. */
  projectName: string | null;
  createdAt: string;
  updatedAt: string;
  versions: Versions;
  isCurrent: boolean;
  /** Which of the versions differ from the running ones (empty when current). */
  outdated: ("dataset" | "engine")[];
};

export type SavedAssessment = AssessmentSummary & { inputs: unknown; result: unknown };

export type StoreError =
  | { code: "not_found"; id: string; message: string }
  | { code: "invalid_name"; message: string; maxLength: number }
  | { code: "invalid_compare"; message: string; minCount: number; maxCount: number }
  | { code: "invalid_record"; message: string };

export type StoreOutcome<T> = { ok: true; value: T } | { ok: false; error: StoreError };

export interface AssessmentStore {
  /** Summaries, most recently updated first. */
  list(): StoreOutcome<AssessmentSummary[]>;
  get(id: string): StoreOutcome<SavedAssessment>;
  save(name: string, inputs: unknown, result: unknown, versions: Versions): StoreOutcome<SavedAssessment>;
  /** A copy with a new id (and name, default "<name> (copy)"), keeping the original versions. */
  duplicate(id: string, name?: string): StoreOutcome<SavedAssessment>;
  rename(id: string, name: string): StoreOutcome<SavedAssessment>;
  remove(id: string): StoreOutcome<{ id: string }>;
  /** Two to four distinct saved assessments side by side. */
  compare(ids: readonly string[]): StoreOutcome<AssessmentComparison>;
  close(): void;
}

/** Longest accepted assessment name, characters (common practice: fits a list row and a report title). */
export const MAX_NAME_LENGTH = 200;

/** The trimmed name, or a typed error: names are 1–200 characters after trimming, without control characters. */
export function checkName(name: unknown): StoreOutcome<string> {
  if (typeof name !== "string") return { ok: false, error: { code: "invalid_name", message: "name must be text", maxLength: MAX_NAME_LENGTH } };
  const trimmed = name.trim();
  if (trimmed.length === 0) return { ok: false, error: { code: "invalid_name", message: "name is required", maxLength: MAX_NAME_LENGTH } };
  if (trimmed.length > MAX_NAME_LENGTH)
    return { ok: false, error: { code: "invalid_name", message: `name must be at most ${MAX_NAME_LENGTH} characters`, maxLength: MAX_NAME_LENGTH } };
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f]/.test(trimmed))
    return { ok: false, error: { code: "invalid_name", message: "name must not contain control characters", maxLength: MAX_NAME_LENGTH } };
  return { ok: true, value: trimmed };
}

/** Compares a record's versions with the running ones. */
export function currency(saved: Versions, running: Versions): { isCurrent: boolean; outdated: ("dataset" | "engine")[] } {
  const outdated: ("dataset" | "engine")[] = [];
  if (saved.dataset !== running.dataset) outdated.push("dataset");
  if (saved.engine !== running.engine) outdated.push("engine");
  return { isCurrent: outdated.length === 0, outdated };
}

/** `inputs.project.name` if present. */
export function projectNameOf(inputs: unknown): string | null {
  const project = (inputs as { project?: { name?: unknown } } | null)?.project;
  return typeof project?.name === "string" ? project.name : null;
}
