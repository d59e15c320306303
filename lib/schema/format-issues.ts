import type { z } from "zod";

export type FieldIssue = { path: string; message: string };

/** Flattens zod issues to `{ path, message }` with dotted paths, for CLI lines, API 422 bodies and form fields. */
export function formatIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join(".") || "(input)",
    message: issue.message,
  }));
}
