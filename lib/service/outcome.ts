import type { FieldIssue } from "../schema/format-issues";

/**
 * What every service function (`lib/service/*`) returns to the API, the CLI and the pages: a value, or
 * a typed error. `validation` errors carry field paths (HTTP 422); `domain` errors are known failures
 * of the computation (no convergence, infeasible composition, cancelled; HTTP 409/422 by code); anything
 * else is a bug and is logged by the caller, never shown as a stack trace.
 */
export type ServiceError =
  | { kind: "validation"; issues: FieldIssue[] }
  | { kind: "domain"; code: string; message: string; detail?: Record<string, unknown> };

export type ServiceOutcome<T> = { ok: true; value: T } | { ok: false; error: ServiceError };

export const validationError = (issues: FieldIssue[]): { ok: false; error: ServiceError } => ({ ok: false, error: { kind: "validation", issues } });
export const domainError = (code: string, message: string, detail?: Record<string, unknown>): { ok: false; error: ServiceError } => ({
  ok: false,
  error: { kind: "domain", code, message, detail },
});
