import { expect } from "vitest";

/** Builders for calling route handlers directly, as Next would. */
export const base = "http://localhost/api/v1";

export function jsonRequest(path: string, method: string, body?: unknown): Request {
  return new Request(`${base}${path}`, {
    method,
    headers: body === undefined ? {} : { "content-type": "application/json" },
    body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
  });
}

export function context(params: Record<string, string | string[]> = {}) {
  return { params: Promise.resolve(params) };
}

export async function json(response: Response): Promise<Record<string, unknown>> {
  expect(response.headers.get("content-type")).toMatch(/application\/json/);
  return (await response.json()) as Record<string, unknown>;
}
