import { phaseLabel } from "../charts/phase-labels";

/**
 * Input paths whose values are phase ids (the run options that suppress phases or lift kinetic constraints):
 * `options.suppressedPhases.0`, or the whole list when it is a leaf.
 */
const PHASE_LIST_PATH = /^options\.(suppressedPhases|allowedPhases)(\.\d+)?$/;

/** True when the value at this flattened input path names a phase. */
export function isPhaseInputPath(path: string): boolean {
  return PHASE_LIST_PATH.test(path);
}

/**
 * The value of an input as a reader sees it: a phase id at a phase path becomes its readable name
 * (`phaseLabel`, the same names as the charts); every other value is returned unchanged.
 */
export function readableInputValue(path: string, value: unknown): unknown {
  if (!isPhaseInputPath(path)) return value;
  if (typeof value === "string") return phaseLabel(value);
  if (Array.isArray(value)) return value.map((v) => (typeof v === "string" ? phaseLabel(v) : v));
  return value;
}
