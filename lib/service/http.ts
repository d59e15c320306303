import { randomUUID } from "node:crypto";
import type { FieldIssue } from "../schema/format-issues";
import type { ServiceError, ServiceOutcome } from "./outcome";

/**
 * The HTTP wrapper shared by every `/api/v1` route handler, as pure functions from `Request` to `Response`
 * so that it is testable without Next. The contract (issue 7):
 * - JSON in and out; a request body above `limitBytes` → 413 `{ error: "payload_too_large", limitBytes }`;
 * - body that is not JSON → 400 `{ error: "invalid_json" }`;
 * - validation errors → 422 `{ error: "validation", issues: [{ path, message }] }`;
 * - domain errors → the status of their code (`domainStatus`), body `{ error: code, message, detail? }`;
 * - a computation over its time limit → 504 `{ error: "time_limit", limitMs }`; a full job or computation queue → 503 with Retry-After;
 * - anything else → 500 `{ error: "internal", message, requestId }` and ONE log line, never a stack trace.
 */

/** Default request-body limit, bytes (256 kB; common practice for JSON APIs of this size of input). */
export const DEFAULT_BODY_LIMIT_BYTES = 256 * 1024;
/** Retry-After of a busy (503) answer, s: about one full assessment with Monte Carlo samples (common practice: a few seconds). */
export const BUSY_RETRY_AFTER_S = 5;
/** Default time limit of one computation on the request path, ms. */
export const DEFAULT_TIME_LIMIT_MS = 30_000;

export type ErrorBody =
  | { error: "validation"; issues: FieldIssue[] }
  | { error: "invalid_json"; message: string }
  | { error: "payload_too_large"; message: string; limitBytes: number }
  | { error: "not_found"; message: string; path?: string }
  | { error: "method_not_allowed"; message: string; allowed: string[] }
  | { error: "time_limit"; message: string; limitMs: number }
  | { error: "internal"; message: string; requestId: string }
  | { error: string; message: string; detail?: Record<string, unknown> };

const jsonHeaders = { "content-type": "application/json; charset=utf-8", "cache-control": "no-store" };

/** A JSON response with the given status. */
export function jsonResponse(status: number, body: unknown, headers: Record<string, string> = {}): Response {
  return new Response(JSON.stringify(body), { status, headers: { ...jsonHeaders, ...headers } });
}

/**
 * HTTP status of a domain error code. Known failures of a computation that the same input will always
 * produce (infeasible composition, invalid name) are 422; conflicts of state (no convergence, cancelled,
 * job not finished) 409; missing records 404; time limits 504; a busy service 503.
 */
export function domainStatus(code: string): number {
  switch (code) {
    case "not_found":
      return 404;
    case "no_convergence":
    case "cancelled":
    case "conflict":
    case "not_finished":
      return 409;
    case "time_limit":
      return 504;
    case "busy":
      return 503;
    default:
      return 422;
  }
}

/** The response for a service error: 422 for validation, `domainStatus(code)` for domain errors. */
export function errorResponse(error: ServiceError): Response {
  if (error.kind === "validation") return jsonResponse(422, { error: "validation", issues: error.issues });
  const body: Record<string, unknown> = { error: error.code, message: error.message };
  if (error.detail !== undefined) body.detail = error.detail;
  const status = domainStatus(error.code);
  return jsonResponse(status, body, status === 503 ? { "retry-after": String(BUSY_RETRY_AFTER_S) } : {});
}

/** 200 (or `status`) with the value, or the error response. */
export function outcomeResponse<T>(outcome: ServiceOutcome<T>, status = 200): Response {
  return outcome.ok ? jsonResponse(status, outcome.value) : errorResponse(outcome.error);
}

export function notFoundResponse(path?: string): Response {
  return jsonResponse(404, { error: "not_found", message: path ? `no API route at ${path}` : "not found", ...(path ? { path } : {}) });
}

export function methodNotAllowedResponse(allowed: string[]): Response {
  return jsonResponse(405, { error: "method_not_allowed", message: `allowed methods: ${allowed.join(", ")}`, allowed }, { allow: allowed.join(", ") });
}

/** A handler for a method a route does not support: 405 with a JSON body and the Allow header. */
export function methodNotAllowed(allowed: string[]): RouteHandler {
  return async () => methodNotAllowedResponse(allowed);
}

export type BodyRead = { ok: true; value: unknown } | { ok: false; response: Response };

function tooLarge(limitBytes: number): BodyRead {
  return {
    ok: false,
    response: jsonResponse(413, { error: "payload_too_large", message: `request body must be at most ${limitBytes} bytes`, limitBytes }),
  };
}

/**
 * Reads a JSON body, refusing more than `limitBytes`: first by the declared Content-Length, then by
 * counting the bytes actually received (a client may omit or misstate the header). An empty body is `{}`.
 */
export async function readJsonBody(request: Request, limitBytes = DEFAULT_BODY_LIMIT_BYTES): Promise<BodyRead> {
  const declared = Number(request.headers.get("content-length"));
  if (Number.isFinite(declared) && declared > limitBytes) return tooLarge(limitBytes);
  const chunks: Uint8Array[] = [];
  let received = 0;
  if (request.body) {
    const reader = request.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      received += value.byteLength;
      if (received > limitBytes) {
        await reader.cancel().catch(() => undefined);
        return tooLarge(limitBytes);
      }
      chunks.push(value);
    }
  }
  const text = Buffer.concat(chunks).toString("utf8");
  if (text.trim() === "") return { ok: true, value: {} };
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (caught) {
    return { ok: false, response: jsonResponse(400, { error: "invalid_json", message: `request body is not valid JSON: ${(caught as Error).message}` }) };
  }
}

export type TimeLimited<T> = { ok: true; value: T } | { ok: false; elapsedMs: number };

/**
 * Runs `work` with an AbortSignal that fires after `limitMs`, or when `outer` aborts (the request's signal:
 * the client went away); resolves to `{ ok: false }` as soon as the limit passes, even if the work ignores the
 * signal. Synchronous engine calls cannot be pre-empted in one thread: they carry their own iteration and
 * time caps (e.g. `timeLimitMs` of the equilibrium input); work in a worker thread is stopped by the signal.
 */
export async function withTimeLimit<T>(work: (signal: AbortSignal) => Promise<T> | T, limitMs: number, outer?: AbortSignal): Promise<TimeLimited<T>> {
  const controller = new AbortController();
  const abortOnOuter = () => controller.abort();
  if (outer?.aborted) controller.abort();
  else outer?.addEventListener("abort", abortOnOuter, { once: true });
  const started = Date.now();
  let timer: ReturnType<typeof setTimeout> | undefined;
  const expired = new Promise<TimeLimited<T>>((resolve) => {
    timer = setTimeout(() => {
      controller.abort();
      resolve({ ok: false, elapsedMs: Date.now() - started });
    }, limitMs);
  });
  try {
    const running = Promise.resolve().then(() => work(controller.signal)).then((value): TimeLimited<T> => ({ ok: true, value }));
    return await Promise.race([running, expired]);
  } finally {
    clearTimeout(timer);
    outer?.removeEventListener("abort", abortOnOuter);
  }
}

export function timeLimitResponse(limitMs: number): Response {
  return jsonResponse(504, { error: "time_limit", message: `the computation did not finish within ${limitMs} ms; use the job API for long runs`, limitMs });
}

/** Where the one log line of an unexpected failure goes (replaceable in tests). */
export type ErrorLogger = (line: string) => void;
const defaultLogger: ErrorLogger = (line) => console.error(line);

/**
 * 500 with a request id, and one log line (JSON) with the id, method, path and the error's message and
 * first stack frame, so the line can be found from the id a user reports. The stack never reaches the body.
 */
export function internalErrorResponse(request: Request, caught: unknown, log: ErrorLogger = defaultLogger): Response {
  const requestId = randomUUID();
  const message = caught instanceof Error ? caught.message : String(caught);
  const frame = caught instanceof Error ? caught.stack?.split("\n")[1]?.trim() : undefined;
  let path = request.url;
  try {
    path = new URL(request.url).pathname;
  } catch {
    // keep the raw URL
  }
  log(JSON.stringify({ level: "error", requestId, method: request.method, path, message, at: frame }));
  return jsonResponse(500, { error: "internal", message: "an unexpected error occurred; quote the request id when reporting it", requestId });
}

export type RouteContext = { params: Promise<Record<string, string | string[] | undefined>> };
export type RouteHandler = (request: Request, context: RouteContext) => Promise<Response>;

/** Wraps a handler so that nothing thrown escapes: unexpected errors become the 500 body and one log line. */
export function guarded(handler: (request: Request, context: RouteContext) => Promise<Response> | Response, log?: ErrorLogger): RouteHandler {
  return async (request, context) => {
    try {
      return await handler(request, context ?? { params: Promise.resolve({}) });
    } catch (caught) {
      return internalErrorResponse(request, caught, log);
    }
  };
}

export type ComputationOptions = { limitBytes?: number; timeLimitMs?: number; log?: ErrorLogger };

/**
 * A POST route for one computation: reads the JSON body (size-limited), runs the service function
 * under the time limit (its signal also aborts when the client disconnects), and maps its outcome to a response.
 */
export function jsonComputation<T>(
  compute: (body: unknown, signal: AbortSignal) => ServiceOutcome<T> | Promise<ServiceOutcome<T>>,
  options: ComputationOptions = {},
): RouteHandler {
  const limitBytes = options.limitBytes ?? DEFAULT_BODY_LIMIT_BYTES;
  const timeLimitMs = options.timeLimitMs ?? DEFAULT_TIME_LIMIT_MS;
  return guarded(async (request) => {
    const body = await readJsonBody(request, limitBytes);
    if (!body.ok) return body.response;
    const outcome = await withTimeLimit((signal) => compute(body.value, signal), timeLimitMs, request.signal);
    if (!outcome.ok) return timeLimitResponse(timeLimitMs);
    return outcomeResponse(outcome.value);
  }, options.log);
}

/** A route parameter as one string (Next passes catch-all segments as arrays). */
export async function routeParam(context: RouteContext, name: string): Promise<string> {
  const params = await context.params;
  const value = params[name];
  return Array.isArray(value) ? value.join("/") : (value ?? "");
}
