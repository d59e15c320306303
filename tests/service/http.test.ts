import { describe, expect, it } from "vitest";
import { domainError, validationError } from "../../lib/service/outcome";
import { BUSY_RETRY_AFTER_S, domainStatus, errorResponse, guarded, jsonComputation, readJsonBody, withTimeLimit } from "../../lib/service/http";

const ctx = { params: Promise.resolve({}) };
const post = (body: BodyInit | null, headers: Record<string, string> = {}) => new Request("http://localhost/api/v1/x", { method: "POST", body, headers, duplex: "half" } as RequestInit);

function streamOf(bytes: number, chunk = 16 * 1024): ReadableStream<Uint8Array> {
  let sent = 0;
  return new ReadableStream({
    pull(controller) {
      if (sent >= bytes) return controller.close();
      const size = Math.min(chunk, bytes - sent);
      controller.enqueue(new Uint8Array(size).fill(0x20));
      sent += size;
    },
  });
}

describe("readJsonBody", () => {
  it("reads JSON and treats an empty body as {}", async () => {
    expect(await readJsonBody(post('{"a":1}'))).toEqual({ ok: true, value: { a: 1 } });
    expect(await readJsonBody(post(null))).toEqual({ ok: true, value: {} });
  });

  it("refuses a declared Content-Length above the limit without reading", async () => {
    const read = await readJsonBody(post("{}", { "content-length": "999999" }), 1000);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.response.status).toBe(413);
  });

  it("refuses a streamed body that grows past the limit even without Content-Length", async () => {
    const read = await readJsonBody(post(streamOf(300 * 1024)));
    expect(read.ok).toBe(false);
    if (!read.ok) expect(await read.response.json()).toMatchObject({ error: "payload_too_large", limitBytes: 256 * 1024 });
  });

  it("accepts a body of exactly the limit", async () => {
    const read = await readJsonBody(post(streamOf(1000)), 1000);
    expect(read).toEqual({ ok: true, value: {} });
  });
});

describe("status mapping", () => {
  it("sends validation errors as 422 with the issues", async () => {
    const response = errorResponse(validationError([{ path: "mix.waterBinderRatio", message: "w/b must be between 0.25 and 0.80" }]).error);
    expect(response.status).toBe(422);
    expect(await response.json()).toEqual({ error: "validation", issues: [{ path: "mix.waterBinderRatio", message: "w/b must be between 0.25 and 0.80" }] });
  });

  it("gives domain codes their own status", () => {
    expect([domainStatus("not_found"), domainStatus("no_convergence"), domainStatus("cancelled"), domainStatus("infeasible_composition"), domainStatus("time_limit"), domainStatus("busy")]).toEqual([404, 409, 409, 422, 504, 503]);
  });

  it("sends busy as 503 with a Retry-After header (RFC 9110 §10.2.3), and no Retry-After on other errors", async () => {
    const busy = errorResponse(domainError("busy", "the service is busy", { maxQueued: 8 }).error);
    expect(busy.status).toBe(503);
    expect(busy.headers.get("retry-after")).toBe(String(BUSY_RETRY_AFTER_S));
    expect(errorResponse(domainError("no_convergence", "x").error).headers.get("retry-after")).toBeNull();
  });

  it("keeps a domain error's code, message and detail in the body", async () => {
    const response = errorResponse(domainError("no_convergence", "no convergence in 200 iterations", { iterations: 200 }).error);
    expect(response.status).toBe(409);
    expect(await response.json()).toEqual({ error: "no_convergence", message: "no convergence in 200 iterations", detail: { iterations: 200 } });
  });
});

describe("withTimeLimit", () => {
  it("returns the value of work that finishes in time", async () => {
    expect(await withTimeLimit(async () => 42, 1000)).toEqual({ ok: true, value: 42 });
  });

  it("gives up at the limit and aborts the signal of work that runs on", async () => {
    let signal: AbortSignal | undefined;
    const outcome = await withTimeLimit((s) => {
      signal = s;
      return new Promise(() => undefined);
    }, 30);
    expect(outcome.ok).toBe(false);
    expect(signal?.aborted).toBe(true);
  });
});

describe("jsonComputation", () => {
  it("answers 504 with a typed body when the computation passes its time limit", async () => {
    const route = jsonComputation(() => new Promise(() => undefined), { timeLimitMs: 30 });
    const response = await route(post("{}"), ctx);
    expect(response.status).toBe(504);
    expect(await response.json()).toMatchObject({ error: "time_limit", limitMs: 30 });
  });

  it("answers 500 with a request id and no stack, and logs exactly one line carrying that id", async () => {
    const lines: string[] = [];
    const route = jsonComputation(() => {
      throw new Error("secret internal detail");
    }, { log: (line) => lines.push(line) });
    const response = await route(post("{}"), ctx);
    expect(response.status).toBe(500);
    const body = await response.json();
    expect(Object.keys(body).sort()).toEqual(["error", "message", "requestId"]);
    expect(body.error).toBe("internal");
    expect(JSON.stringify(body)).not.toMatch(/secret internal detail|at .*\.ts/);
    expect(lines).toHaveLength(1);
    expect(JSON.parse(lines[0])).toMatchObject({ level: "error", requestId: body.requestId, method: "POST", path: "/api/v1/x", message: "secret internal detail" });
  });

  it("aborts the computation's signal when the request's signal aborts (the client went away)", async () => {
    const client = new AbortController();
    let computeSignal: AbortSignal | undefined;
    const route = jsonComputation((_body, signal) => {
      computeSignal = signal;
      client.abort();
      return signal.aborted ? domainError("cancelled", "stopped") : { ok: true, value: "ran on" };
    }, { timeLimitMs: 10_000 });
    const request = new Request("http://localhost/api/v1/x", { method: "POST", body: "{}", signal: client.signal });
    const response = await route(request, ctx);
    expect(computeSignal?.aborted).toBe(true);
    expect(response.status).toBe(409);
    expect(await response.json()).toMatchObject({ error: "cancelled" });
  });

  it("passes the parsed body to the service and its value back as 200 JSON", async () => {
    const route = jsonComputation((body) => ({ ok: true, value: { echoed: body } }));
    const response = await route(post('{"x":[1,2]}'), ctx);
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ echoed: { x: [1, 2] } });
  });
});

describe("guarded", () => {
  it("turns a rejected promise into the 500 body too", async () => {
    const lines: string[] = [];
    const route = guarded(async () => Promise.reject(new TypeError("boom")), (line) => lines.push(line));
    const response = await route(new Request("http://localhost/api/v1/y"), ctx);
    expect(response.status).toBe(500);
    expect(lines).toHaveLength(1);
  });
});
