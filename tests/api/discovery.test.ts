import { describe, expect, it } from "vitest";
import { GET as notFound, POST as notFoundPost } from "../../app/api/[...path]/route";
import { GET as data } from "../../app/api/v1/data/route";
import { GET as health } from "../../app/api/v1/health/route";
import { GET as legacyHealth } from "../../app/api/health/route";
import { GET as openapi } from "../../app/api/v1/openapi.json/route";
import { equilibrateInput } from "../../lib/schema/equilibrate-input";
import { context, json, jsonRequest } from "./request";
import packageJson from "../../package.json";

describe("GET /api/v1/health", () => {
  it("reports ok with the package version as engine version and a data-set version", async () => {
    for (const route of [health, legacyHealth]) {
      const body = await json(await route(jsonRequest("/health", "GET"), context()));
      expect(body).toMatchObject({ status: "ok", service: "hydrastate", engineVersion: packageJson.version });
      expect(body.datasetVersion).toMatch(/^[0-9a-f]{16}$/);
    }
  });
});

describe("GET /api/v1/data", () => {
  it("lists every species with its source and the data files with their provenance", async () => {
    const response = await data(jsonRequest("/data", "GET"), context());
    expect(response.status).toBe(200);
    const body = await json(response);
    const rows = body.rows as { id: string; source: string }[];
    expect(rows.find((r) => r.id === "portlandite")?.source).toBeTruthy();
    expect(rows.every((r) => typeof r.source === "string" && r.source.length > 0)).toBe(true);
    expect((body.files as { provenance: { sources: string[] } }[]).every((f) => f.provenance.sources.length > 0)).toBe(true);
  });
});

describe("GET /api/v1/openapi.json", () => {
  it("is an OpenAPI 3.1 document with every route and request schemas generated from the zod schemas", async () => {
    const body = await json(await openapi(jsonRequest("/openapi.json", "GET"), context()));
    expect(body.openapi).toBe("3.1.0");
    const paths = Object.keys(body.paths as object);
    for (const path of ["/health", "/equilibrate", "/cure", "/hydrate", "/assess", "/assess/jobs", "/assess/jobs/{id}", "/data", "/assessments", "/assessments/{id}", "/assessments/{id}/duplicate", "/assessments/compare", "/reports/{id}.pdf", "/reports/{id}.md", "/assessments/{id}.json", "/assessments/{id}.csv"])
      expect(paths).toContain(path);
    const schemas = (body.components as { schemas: Record<string, { properties?: Record<string, { minimum?: number; maximum?: number }> }> }).schemas;
    // The temperature limits of the document are those of the zod schema (0–100 °C).
    expect(schemas.EquilibrateInput.properties?.temperatureC).toMatchObject({ minimum: 0, maximum: 100 });
    expect(Object.keys(schemas.EquilibrateInput.properties ?? {}).sort()).toEqual(Object.keys(equilibrateInput.shape).sort());
    expect(schemas.AssessInput.properties).toHaveProperty("binder");
    // POST /cure takes either form of the curing input, each from its own zod schema.
    expect(schemas.CuringBinderFormInput.properties).toHaveProperty("binder");
    expect(schemas.CuringBinderFormInput.properties).not.toHaveProperty("cement");
    const cureBody = (body.paths as Record<string, { post: { requestBody: { content: Record<string, { schema: unknown }> } } }>)["/cure"].post.requestBody.content["application/json"].schema;
    expect(cureBody).toEqual({ oneOf: [{ $ref: "#/components/schemas/CuringInput" }, { $ref: "#/components/schemas/CuringBinderFormInput" }] });
  });
});

describe("unknown API routes", () => {
  it("answer 404 with a JSON body naming the path, for any method", async () => {
    for (const route of [notFound, notFoundPost]) {
      const response = await route(new Request("http://localhost/api/v1/nope"), context({ path: ["v1", "nope"] }));
      expect(response.status).toBe(404);
      expect(await json(response)).toEqual({ error: "not_found", message: "no API route at /api/v1/nope", path: "/api/v1/nope" });
    }
  });
});

describe("methods a route does not support", () => {
  it("answer 405 with a JSON body and the Allow header", async () => {
    const { PUT } = await import("../../app/api/v1/health/route");
    const { DELETE } = await import("../../app/api/v1/assessments/route");
    const health = await PUT(jsonRequest("/health", "PUT"), context());
    expect(health.status).toBe(405);
    expect(health.headers.get("allow")).toBe("GET");
    expect(await json(health)).toEqual({ error: "method_not_allowed", message: "allowed methods: GET", allowed: ["GET"] });
    const list = await DELETE(jsonRequest("/assessments", "DELETE"), context());
    expect(list.headers.get("allow")).toBe("GET, POST");
  });
});
