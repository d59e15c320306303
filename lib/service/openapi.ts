import { z } from "zod";
import { assessInput } from "../schema/assess-input";
import { curingBinderFormSchema } from "../schema/curing-binder-form";
import { curingInputSchema } from "../schema/curing-input";
import { equilibrateInput } from "../schema/equilibrate-input";
import { hydrateInput } from "../schema/hydrate-input";
import { duplicateAssessmentBody, renameAssessmentBody, saveAssessmentBody } from "./assessments";
import { DEFAULT_BODY_LIMIT_BYTES } from "./http";
import { ENGINE_VERSION } from "./versions";

/**
 * The OpenAPI 3.1 document of `/api/v1`, served at `/api/v1/openapi.json`. Request bodies are generated
 * from the same zod schemas the routes validate with (zod v4 `z.toJSONSchema`, JSON Schema 2020-12, which
 * OpenAPI 3.1 uses), so the document cannot drift from the validation.
 */
function schemaOf(schema: z.ZodType): Record<string, unknown> {
  const json = z.toJSONSchema(schema, { target: "draft-2020-12", io: "input", unrepresentable: "any" }) as Record<string, unknown>;
  const { $schema: _dialect, ...rest } = json;
  return rest;
}

const errorSchemas = {
  ValidationError: {
    type: "object",
    required: ["error", "issues"],
    properties: {
      error: { const: "validation" },
      issues: { type: "array", items: { type: "object", required: ["path", "message"], properties: { path: { type: "string" }, message: { type: "string" } } } },
    },
  },
  Error: {
    type: "object",
    required: ["error", "message"],
    properties: { error: { type: "string", description: "error code" }, message: { type: "string" }, detail: { type: "object" }, requestId: { type: "string" }, limitBytes: { type: "integer" }, limitMs: { type: "integer" } },
  },
};

const ref = (name: string) => ({ $ref: `#/components/schemas/${name}` });
const json = (schema: unknown) => ({ "application/json": { schema } });
const errorResponse = (description: string) => ({ description, content: json(ref("Error")) });

const commonErrors = {
  "413": errorResponse(`request body over ${DEFAULT_BODY_LIMIT_BYTES} bytes`),
  "400": errorResponse("body is not JSON"),
  "422": { description: "invalid input: field paths and messages", content: json(ref("ValidationError")) },
  "500": errorResponse("unexpected failure (body carries a request id; never a stack trace)"),
};

function computation(summary: string, schemaName: string, queued = false) {
  return {
    post: {
      summary,
      requestBody: { required: true, content: json(ref(schemaName)) },
      responses: {
        "200": { description: "the result", content: json({ type: "object" }) },
        ...commonErrors,
        "409": errorResponse("the computation did not converge"),
        "504": errorResponse("time limit exceeded"),
        ...(queued ? { "503": errorResponse("too many assessments waiting (Retry-After header)") } : {}),
      },
    },
  };
}

const idParameter = { name: "id", in: "path", required: true, schema: { type: "string" } };
const notFound = { "404": errorResponse("no saved assessment with this id") };

export function openApiDocument(): Record<string, unknown> {
  return {
    openapi: "3.1.0",
    info: {
      title: "Hydrastate API",
      version: ENGINE_VERSION,
      description:
        "Concrete durability and curing advisory. Every result is a thermodynamic guide: decisions rest with the applicable codes and standards, licensed testing and a responsible engineer.",
    },
    jsonSchemaDialect: "https://json-schema.org/draft/2020-12/schema",
    servers: [{ url: "/api/v1" }],
    paths: {
      "/health": { get: { summary: "service status with engine and data-set versions", responses: { "200": { description: "up", content: json({ type: "object" }) } } } },
      "/equilibrate": computation("equilibrium phase assemblage of one system", "EquilibrateInput"),
      "/cure": {
        post: {
          ...computation("curing advisory: element temperature, maturity, strength, curing period, flags", "CuringInput").post,
          requestBody: { required: true, content: json({ oneOf: [ref("CuringInput"), ref("CuringBinderFormInput")] }) },
          description:
            "The body is a CuringInput, or a CuringBinderFormInput: the same without cement, supplementaryMaterials and heatCurve but with `binder: { cement, supplementaryMaterials, heatCalculation? }` as in AssessInput. The heat curve is then the thermodynamic heat of hydration of that binder, and the result carries a `thermodynamicHeat` section. The binder rules of AssessInput (blended presets, SCM totals, the binder model's w/b and binder content ranges) are checked when the binder is resolved.",
        },
      },
      "/hydrate": computation("hydrate assemblage of a binder at an age", "HydrateInput"),
      "/assess": computation("full assessment: assemblage, scenarios, exposure classes, flags, cautions", "AssessInput", true),
      "/assess/jobs": {
        post: {
          summary: "start an assessment as a background job (long Monte Carlo runs)",
          requestBody: { required: true, content: json(ref("AssessInput")) },
          responses: { "202": { description: "job started", content: json(ref("JobStatus")) }, ...commonErrors, "503": errorResponse("too many jobs running") },
        },
      },
      "/assess/jobs/{id}": {
        parameters: [idParameter],
        get: { summary: "job progress and, when finished, its result", responses: { "200": { description: "status", content: json(ref("JobStatus")) }, "404": errorResponse("no such job") } },
        delete: { summary: "cancel a job", responses: { "200": { description: "status after cancelling", content: json(ref("JobStatus")) }, "404": errorResponse("no such job") } },
      },
      "/data": { get: { summary: "the thermodynamic data set as a table with sources", responses: { "200": { description: "rows and files", content: json({ type: "object" }) } } } },
      "/assessments": {
        get: { summary: "saved assessments, most recent first", responses: { "200": { description: "list", content: json({ type: "object" }) } } },
        post: { summary: "save an assessment", requestBody: { required: true, content: json(ref("SaveAssessment")) }, responses: { "201": { description: "saved", content: json({ type: "object" }) }, ...commonErrors } },
      },
      "/assessments/compare": {
        get: {
          summary: "compare two to four saved assessments",
          parameters: [{ name: "ids", in: "query", required: true, description: "comma-separated ids (2 to 4)", schema: { type: "string" } }],
          responses: { "200": { description: "comparison", content: json({ type: "object" }) }, "422": commonErrors["422"], ...notFound },
        },
      },
      "/assessments/{id}": {
        parameters: [idParameter],
        get: { summary: "one saved assessment with inputs, result, versions and isCurrent", responses: { "200": { description: "record", content: json({ type: "object" }) }, ...notFound } },
        patch: { summary: "rename", requestBody: { required: true, content: json(ref("RenameAssessment")) }, responses: { "200": { description: "renamed", content: json({ type: "object" }) }, ...commonErrors, ...notFound } },
        delete: { summary: "delete", responses: { "200": { description: "deleted", content: json({ type: "object" }) }, ...notFound } },
      },
      "/assessments/{id}/duplicate": {
        parameters: [idParameter],
        post: { summary: "duplicate", requestBody: { required: false, content: json(ref("DuplicateAssessment")) }, responses: { "201": { description: "the copy", content: json({ type: "object" }) }, ...commonErrors, ...notFound } },
      },
      "/assessments/{id}.json": { parameters: [idParameter], get: { summary: "export the saved record as JSON", responses: { "200": { description: "file", content: json({ type: "object" }) }, ...notFound } } },
      "/assessments/{id}.csv": { parameters: [idParameter], get: { summary: "export the key series as CSV", responses: { "200": { description: "file", content: { "text/csv": { schema: { type: "string" } } } }, ...notFound } } },
      "/reports/{id}.pdf": { parameters: [idParameter], get: { summary: "PDF report", responses: { "200": { description: "file", content: { "application/pdf": { schema: { type: "string", format: "binary" } } } }, ...notFound } } },
      "/reports/{id}.md": { parameters: [idParameter], get: { summary: "Markdown report", responses: { "200": { description: "file", content: { "text/markdown": { schema: { type: "string" } } } }, ...notFound } } },
      "/openapi.json": { get: { summary: "this document", responses: { "200": { description: "OpenAPI 3.1", content: json({ type: "object" }) } } } },
    },
    components: {
      schemas: {
        EquilibrateInput: schemaOf(equilibrateInput),
        CuringInput: schemaOf(curingInputSchema),
        CuringBinderFormInput: schemaOf(curingBinderFormSchema),
        HydrateInput: schemaOf(hydrateInput),
        AssessInput: schemaOf(assessInput),
        SaveAssessment: schemaOf(saveAssessmentBody),
        RenameAssessment: schemaOf(renameAssessmentBody),
        DuplicateAssessment: schemaOf(duplicateAssessmentBody),
        JobStatus: {
          type: "object",
          required: ["id", "state", "progress", "createdAt", "finishedAt"],
          properties: {
            id: { type: "string" },
            state: { enum: ["queued", "running", "succeeded", "failed", "cancelled"] },
            progress: { type: "number", minimum: 0, maximum: 1 },
            createdAt: { type: "string" },
            finishedAt: { type: ["string", "null"] },
            result: { type: "object" },
            error: { type: "object" },
          },
        },
        ...errorSchemas,
      },
    },
  };
}
