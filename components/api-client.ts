/**
 * The browser's side of the HTTP API (`/api/v1`). Every call resolves to a typed outcome, never throws for
 * an HTTP error: a 422 gives the field issues, other failures a message fit to show to the user.
 */
export type FieldIssue = { path: string; message: string };
export type ApiOutcome<T> = { ok: true; value: T } | { ok: false; status: number; message: string; issues?: FieldIssue[] };

export async function apiRequest<T>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<ApiOutcome<T>> {
  const { json, ...rest } = init;
  let response: Response;
  try {
    response = await fetch(path, {
      ...rest,
      headers: { accept: "application/json", ...(json !== undefined ? { "content-type": "application/json" } : {}), ...(rest.headers ?? {}) },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    });
  } catch (caught) {
    if ((caught as Error)?.name === "AbortError") return { ok: false, status: 0, message: "The request was cancelled." };
    return { ok: false, status: 0, message: "The service could not be reached. Check the connection and try again." };
  }
  let body: unknown = null;
  const text = await response.text().catch(() => "");
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = null;
  }
  if (response.ok) return { ok: true, value: body as T };
  const b = (body ?? {}) as { error?: string; message?: string; issues?: FieldIssue[] };
  if (response.status === 422 && Array.isArray(b.issues))
    return { ok: false, status: 422, message: "The service did not accept the input.", issues: b.issues };
  return { ok: false, status: response.status, message: b.message ?? `The service answered ${response.status}${b.error ? ` (${b.error})` : ""}.` };
}

export type JobStatus = { id: string; state: "queued" | "running" | "succeeded" | "failed" | "cancelled"; progress: number; result?: unknown; error?: { kind: string; message?: string; issues?: FieldIssue[] } };

export type AssessmentSummary = {
  id: string;
  name: string;
  projectName: string | null;
  createdAt: string;
  updatedAt: string;
  versions: { dataset: string; engine: string };
  isCurrent: boolean;
  outdated: ("dataset" | "engine")[];
};

export type SavedAssessment = AssessmentSummary & { inputs: unknown; result: unknown };

/** Export links of a saved assessment. */
export function exportLinks(id: string): { label: string; href: string; format: string }[] {
  const e = encodeURIComponent(id);
  return [
    { label: "PDF report", href: `/api/v1/reports/${e}.pdf`, format: "pdf" },
    { label: "Markdown summary", href: `/api/v1/reports/${e}.md`, format: "md" },
    { label: "JSON (inputs and result)", href: `/api/v1/assessments/${e}.json`, format: "json" },
    { label: "CSV (figures)", href: `/api/v1/assessments/${e}.csv`, format: "csv" },
  ];
}
