import { z } from "zod";
import { assessInput } from "../schema/assess-input";
import { formatIssues } from "../schema/format-issues";
import type { AssessmentStore, AssessmentSummary, SavedAssessment, StoreError, StoreOutcome } from "../store/assessment-store";
import type { AssessmentComparison } from "../store/compare";
import { domainError, validationError, type ServiceOutcome } from "./outcome";

/**
 * Saved assessments as service functions over an `AssessmentStore`: request bodies validated with zod,
 * store errors mapped to service errors (not found → 404, invalid name → 422 naming the field).
 */

const versionsSchema = z.object({
  dataset: z.string({ error: "result.versions.dataset must be text" }).min(1, { error: "result.versions.dataset is required" }),
  engine: z.string({ error: "result.versions.engine must be text" }).min(1, { error: "result.versions.engine is required" }),
});

/** Body of `POST /api/v1/assessments`: a name, the assessment input and the result the service returned for it. */
export const saveAssessmentBody = z
  .object({
    name: z.string({ error: "name must be text" }).trim().min(1, { error: "name is required" }).max(200, { error: "name must be at most 200 characters" }),
    inputs: z.unknown(),
    result: z
      .object({ versions: versionsSchema }, { error: "result must be the object returned by POST /api/v1/assess" })
      .loose(),
  })
  .strict();

export const renameAssessmentBody = z
  .object({ name: z.string({ error: "name must be text" }).trim().min(1, { error: "name is required" }).max(200, { error: "name must be at most 200 characters" }) })
  .strict();

export const duplicateAssessmentBody = z
  .object({ name: z.string({ error: "name must be text" }).trim().min(1, { error: "name is required" }).max(200, { error: "name must be at most 200 characters" }).optional() })
  .strict();

function fromStore<T>(outcome: StoreOutcome<T>): ServiceOutcome<T> {
  if (outcome.ok) return outcome;
  const error: StoreError = outcome.error;
  switch (error.code) {
    case "invalid_name":
      return validationError([{ path: "name", message: error.message }]);
    case "invalid_compare":
      return validationError([{ path: "ids", message: error.message }]);
    case "not_found":
      return domainError("not_found", error.message, { id: error.id });
    case "invalid_record":
      return domainError("invalid_record", error.message);
  }
}

export function listAssessments(store: AssessmentStore): ServiceOutcome<{ assessments: AssessmentSummary[] }> {
  const listed = fromStore(store.list());
  return listed.ok ? { ok: true, value: { assessments: listed.value } } : listed;
}

export function getAssessment(store: AssessmentStore, id: string): ServiceOutcome<SavedAssessment> {
  return fromStore(store.get(id));
}

/** Saves inputs and result; the inputs must satisfy the assessment schema, the result must carry its versions. */
export function saveAssessment(store: AssessmentStore, raw: unknown): ServiceOutcome<SavedAssessment> {
  const body = saveAssessmentBody.safeParse(raw);
  if (!body.success) return validationError(formatIssues(body.error));
  const inputs = assessInput.safeParse(body.data.inputs);
  if (!inputs.success) return validationError(formatIssues(inputs.error).map((issue) => ({ ...issue, path: issue.path === "(input)" ? "inputs" : `inputs.${issue.path}` })));
  return fromStore(store.save(body.data.name, body.data.inputs, body.data.result, body.data.result.versions));
}

export function renameAssessment(store: AssessmentStore, id: string, raw: unknown): ServiceOutcome<SavedAssessment> {
  const body = renameAssessmentBody.safeParse(raw);
  if (!body.success) return validationError(formatIssues(body.error));
  return fromStore(store.rename(id, body.data.name));
}

export function duplicateAssessment(store: AssessmentStore, id: string, raw: unknown): ServiceOutcome<SavedAssessment> {
  const body = duplicateAssessmentBody.safeParse(raw ?? {});
  if (!body.success) return validationError(formatIssues(body.error));
  return fromStore(store.duplicate(id, body.data.name));
}

export function removeAssessment(store: AssessmentStore, id: string): ServiceOutcome<{ id: string }> {
  return fromStore(store.remove(id));
}

/** `ids` as the comma-separated query parameter of `GET /api/v1/assessments/compare?ids=a,b`. */
export function compareAssessmentIds(store: AssessmentStore, idsParameter: string | null): ServiceOutcome<AssessmentComparison> {
  if (idsParameter === null || idsParameter.trim() === "") return validationError([{ path: "ids", message: "ids is required: 2 to 4 comma-separated assessment ids" }]);
  return fromStore(store.compare(idsParameter.split(",").map((id) => id.trim())));
}
