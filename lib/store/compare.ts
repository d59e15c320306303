import { keyFigures, flagsOf, type KeyFigure } from "../report/key-figures";
import type { AssessmentSummary, SavedAssessment, StoreOutcome } from "./assessment-store";
import { differingPaths, type PathDifference } from "./flatten";

/** Bounds of a comparison: two to four assessments (issue 7). */
export const MIN_COMPARE = 2;
export const MAX_COMPARE = 4;

export type FlagComparisonRow = {
  id: string;
  title: string;
  /** Severity in each assessment, `null` where the flag is not raised. */
  severities: (string | null)[];
};

export type KeyFigureComparisonRow = { id: string; label: string; unit: string; values: (number | string | null)[] };

export type AssessmentComparison = {
  assessments: AssessmentSummary[];
  /** Inputs that differ, as flattened paths with each assessment's value. */
  inputDifferences: PathDifference[];
  flags: FlagComparisonRow[];
  keyFigures: KeyFigureComparisonRow[];
};

export function checkCompareIds(ids: readonly string[]): StoreOutcome<string[]> {
  const distinct = [...new Set(ids.map((id) => id.trim()).filter((id) => id !== ""))];
  if (distinct.length < MIN_COMPARE || distinct.length > MAX_COMPARE || distinct.length !== ids.length)
    return {
      ok: false,
      error: { code: "invalid_compare", message: `compare takes ${MIN_COMPARE} to ${MAX_COMPARE} distinct assessment ids (got ${ids.length}, ${distinct.length} distinct)`, minCount: MIN_COMPARE, maxCount: MAX_COMPARE },
    };
  return { ok: true, value: distinct };
}

function summaryOf(saved: SavedAssessment): AssessmentSummary {
  const { inputs: _inputs, result: _result, ...summary } = saved;
  return summary;
}

/** The comparison of loaded assessments (in the order given). */
export function compareAssessments(saved: readonly SavedAssessment[]): AssessmentComparison {
  const flagRows = new Map<string, FlagComparisonRow>();
  saved.forEach((assessment, index) => {
    for (const flag of flagsOf(assessment.result)) {
      const row = flagRows.get(flag.id) ?? { id: flag.id, title: flag.title, severities: saved.map(() => null) };
      row.severities[index] = flag.severity;
      flagRows.set(flag.id, row);
    }
  });
  const figureRows = new Map<string, KeyFigureComparisonRow>();
  saved.forEach((assessment, index) => {
    for (const figure of keyFigures(assessment.result)) {
      const row = figureRows.get(figure.id) ?? { id: figure.id, label: figure.label, unit: figure.unit, values: saved.map(() => null) };
      row.values[index] = figure.value;
      figureRows.set(figure.id, row);
    }
  });
  return {
    assessments: saved.map(summaryOf),
    inputDifferences: differingPaths(saved.map((s) => s.inputs)),
    flags: [...flagRows.values()],
    keyFigures: [...figureRows.values()],
  };
}

export type { KeyFigure };
