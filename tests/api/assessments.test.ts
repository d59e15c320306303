import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { GET as getOne, PATCH as rename, DELETE as remove } from "../../app/api/v1/assessments/[id]/route";
import { POST as duplicate } from "../../app/api/v1/assessments/[id]/duplicate/route";
import { GET as compare } from "../../app/api/v1/assessments/compare/route";
import { GET as list, POST as save } from "../../app/api/v1/assessments/route";
import { GET as report } from "../../app/api/v1/reports/[file]/route";
import { setAssessmentStore } from "../../lib/service/store-instance";
import { runningVersions } from "../../lib/service/versions";
import { openSqliteStore } from "../../lib/store/sqlite-store";
import { context, json, jsonRequest } from "./request";

/** A valid assessment input (typical values, invented for the test). */
const inputs = {
  project: { name: "Quay Extension Phase 2", element: { type: "wall", thicknessM: 0.6 } },
  binder: { cement: { kind: "preset", presetId: "en197-cem-i" } },
  mix: { waterBinderRatio: 0.45, binderContentKgPerM3: 360 },
  age: { mode: "age", ageDays: 28, curingTemperatureC: 20 },
  exposure: {},
};
/** A result as the assess route returns it (typical values, invented for the test). */
const result = (pH: number) => ({
  assemblage: { pH, label: "28 d at 20 °C", phaseVolumesCm3: { "C-S-H": 30, portlandite: 8 }, poreSolutionCm3: 10 },
  flags: [{ id: "sulfate-attack", severity: "warning", title: "Sulfate attack", explanation: "x", basis: "EN 206", actions: [] }],
  cautions: ["Typical caution text for the test: defer to local codes and a licensed engineer."],
  versions: runningVersions(),
});

const previous = setAssessmentStore(undefined);
beforeEach(() => {
  setAssessmentStore(openSqliteStore({ path: ":memory:", currentVersions: runningVersions() }))?.close();
});
afterAll(() => {
  setAssessmentStore(previous)?.close();
});

async function saveOne(name = "Wall W3", pH = 12.9, body: Record<string, unknown> = {}) {
  const response = await save(jsonRequest("/assessments", "POST", { name, inputs, result: result(pH), ...body }), context());
  return { response, body: await json(response) };
}

describe("the exposure input of the test", () => {
  it("is accepted by the assessment schema (else the save tests would test nothing)", async () => {
    const { response, body } = await saveOne();
    expect(response.status, JSON.stringify(body)).toBe(201);
  });
});

describe("POST and GET /api/v1/assessments", () => {
  it("saves (201) and lists the record as current", async () => {
    const { body } = await saveOne();
    expect(body).toMatchObject({ name: "Wall W3", projectName: "Quay Extension Phase 2", isCurrent: true });
    const listed = await json(await list(jsonRequest("/assessments", "GET"), context()));
    expect((listed.assessments as { id: string }[]).map((a) => a.id)).toEqual([body.id]);
  });

  it("marks a record saved with another data-set version as not current", async () => {
    const stale = { ...result(12.9), versions: { dataset: "0000000000000000", engine: runningVersions().engine } };
    const response = await save(jsonRequest("/assessments", "POST", { name: "Old", inputs, result: stale }), context());
    expect(await json(response)).toMatchObject({ isCurrent: false, outdated: ["dataset"] });
  });

  it("answers 422 for a missing name, inputs outside the schema and a result without versions", async () => {
    const noName = await save(jsonRequest("/assessments", "POST", { inputs, result: result(1) }), context());
    expect(noName.status).toBe(422);
    expect((await json(noName)).issues).toContainEqual({ path: "name", message: "name must be text" });
    const badInputs = await save(jsonRequest("/assessments", "POST", { name: "x", inputs: { ...inputs, mix: { waterBinderRatio: 2, binderContentKgPerM3: 360 } }, result: result(1) }), context());
    expect(badInputs.status).toBe(422);
    expect(((await json(badInputs)).issues as { path: string }[]).some((i) => i.path.startsWith("inputs.mix.waterBinderRatio"))).toBe(true);
    const noVersions = await save(jsonRequest("/assessments", "POST", { name: "x", inputs, result: { flags: [] } }), context());
    expect(noVersions.status).toBe(422);
    expect(((await json(noVersions)).issues as { path: string }[])[0].path).toBe("result.versions");
  });

  it("answers 413 for a body above the size limit", async () => {
    const response = await save(jsonRequest("/assessments", "POST", { name: "x", inputs, result: { ...result(1), padding: "x".repeat(300_000) } }), context());
    expect(response.status).toBe(413);
  });
});

describe("/api/v1/assessments/{id}", () => {
  it("gets, renames and deletes a record, then answers 404", async () => {
    const { body } = await saveOne();
    const id = body.id as string;
    const got = await json(await getOne(jsonRequest(`/assessments/${id}`, "GET"), context({ id })));
    expect(got.inputs).toEqual(inputs);
    const renamed = await rename(jsonRequest(`/assessments/${id}`, "PATCH", { name: "Wall W3 rev B" }), context({ id }));
    expect((await json(renamed)).name).toBe("Wall W3 rev B");
    expect((await remove(jsonRequest(`/assessments/${id}`, "DELETE"), context({ id }))).status).toBe(200);
    const gone = await getOne(jsonRequest(`/assessments/${id}`, "GET"), context({ id }));
    expect(gone.status).toBe(404);
    expect(await json(gone)).toMatchObject({ error: "not_found", detail: { id } });
  });

  it("answers 422 for an empty new name and 404 for a rename of a missing record", async () => {
    const { body } = await saveOne();
    const empty = await rename(jsonRequest(`/assessments/${body.id}`, "PATCH", { name: "  " }), context({ id: body.id as string }));
    expect(empty.status).toBe(422);
    expect((await json(empty)).issues).toEqual([{ path: "name", message: "name is required" }]);
    const missing = await rename(jsonRequest(`/assessments/none`, "PATCH", { name: "x" }), context({ id: "none" }));
    expect(missing.status).toBe(404);
  });

  it("duplicates (201) with a new id", async () => {
    const { body } = await saveOne();
    const copy = await duplicate(jsonRequest(`/assessments/${body.id}/duplicate`, "POST"), context({ id: body.id as string }));
    expect(copy.status).toBe(201);
    const copied = await json(copy);
    expect(copied.name).toBe("Wall W3 (copy)");
    expect(copied.id).not.toBe(body.id);
    expect((await duplicate(jsonRequest(`/assessments/none/duplicate`, "POST"), context({ id: "none" }))).status).toBe(404);
  });

  it("exports the record as JSON and its key series as CSV", async () => {
    const { body } = await saveOne();
    const asJson = await getOne(jsonRequest(`/assessments/${body.id}.json`, "GET"), context({ id: `${body.id}.json` }));
    expect(asJson.headers.get("content-disposition")).toBe('attachment; filename="wall-w3.json"');
    expect((await asJson.json()).inputs).toEqual(inputs);
    const csv = await getOne(jsonRequest(`/assessments/${body.id}.csv`, "GET"), context({ id: `${body.id}.csv` }));
    expect(csv.headers.get("content-type")).toMatch(/text\/csv/);
    const lines = (await csv.text()).split("\r\n");
    expect(lines[0]).toBe("chart,x,x unit,x value,series,unit,value");
    // Phases under their readable names, as in the results page's CSV (phaseLabel).
    expect(lines).toContain("phase-volumes,Assemblage,,28 d at 20 °C,Portlandite,cm³/100 g binder,8");
    expect(lines.some((line) => line.split(",")[4] === "portlandite")).toBe(false);
    const missing = await getOne(jsonRequest(`/assessments/none.csv`, "GET"), context({ id: "none.csv" }));
    expect(missing.status).toBe(404);
  });
});

describe("GET /api/v1/assessments/compare", () => {
  it("compares two records: differing inputs, flags and key figures", async () => {
    const a = (await saveOne("A", 12.9)).body;
    const b = (await save(jsonRequest("/assessments", "POST", { name: "B", inputs: { ...inputs, mix: { waterBinderRatio: 0.5, binderContentKgPerM3: 360 } }, result: result(12.6) }), context()).then(json));
    const response = await compare(new Request(`http://localhost/api/v1/assessments/compare?ids=${a.id},${b.id}`), context());
    expect(response.status).toBe(200);
    const body = await json(response);
    expect(body.inputDifferences).toEqual([{ path: "mix.waterBinderRatio", values: [0.45, 0.5] }]);
    expect((body.keyFigures as { id: string; values: number[] }[]).find((k) => k.id === "pH")?.values).toEqual([12.9, 12.6]);
  });

  it("answers 422 for fewer than two ids and 404 for an unknown id", async () => {
    const a = (await saveOne()).body;
    const one = await compare(new Request(`http://localhost/api/v1/assessments/compare?ids=${a.id}`), context());
    expect(one.status).toBe(422);
    expect(((await json(one)).issues as { path: string }[])[0].path).toBe("ids");
    const none = await compare(new Request(`http://localhost/api/v1/assessments/compare`), context());
    expect(none.status).toBe(422);
    const unknown = await compare(new Request(`http://localhost/api/v1/assessments/compare?ids=${a.id},zzz`), context());
    expect(unknown.status).toBe(404);
  });
});

describe("GET /api/v1/reports/{id}.pdf and .md", () => {
  it("serves a PDF and a Markdown report of a saved record", async () => {
    const { body } = await saveOne();
    const pdf = await report(jsonRequest(`/reports/${body.id}.pdf`, "GET"), context({ file: `${body.id}.pdf` }));
    expect(pdf.status).toBe(200);
    expect(pdf.headers.get("content-type")).toBe("application/pdf");
    const bytes = Buffer.from(await pdf.arrayBuffer());
    expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(bytes.toString("latin1")).toContain("(Quay Extension Phase 2)");
    const md = await report(jsonRequest(`/reports/${body.id}.md`, "GET"), context({ file: `${body.id}.md` }));
    const text = await md.text();
    expect(text).toContain("# Wall W3");
    expect(text).toContain("Typical caution text for the test");
  });

  it("answers 404 JSON for a missing record or an unknown extension", async () => {
    const missing = await report(jsonRequest(`/reports/none.pdf`, "GET"), context({ file: "none.pdf" }));
    expect(missing.status).toBe(404);
    expect((await json(missing)).error).toBe("not_found");
    const odd = await report(jsonRequest(`/reports/x.docx`, "GET"), context({ file: "x.docx" }));
    expect(odd.status).toBe(404);
  });
});
