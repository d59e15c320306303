import { afterAll, describe, expect, it } from "vitest";
import { POST as assess } from "../../app/api/v1/assess/route";
import { GET as getOne } from "../../app/api/v1/assessments/[id]/route";
import { POST as save } from "../../app/api/v1/assessments/route";
import { GET as report } from "../../app/api/v1/reports/[file]/route";
import { culvertDemo } from "../../lib/demo/culvert-demo";
import { setAssessmentStore } from "../../lib/service/store-instance";
import { runningVersions } from "../../lib/service/versions";
import { openSqliteStore } from "../../lib/store/sqlite-store";
import { context, json, jsonRequest } from "./request";

const previous = setAssessmentStore(openSqliteStore({ path: ":memory:", currentVersions: runningVersions() }));
afterAll(() => setAssessmentStore(previous)?.close());

describe("assess, save, reopen and report through the API", () => {
  it("keeps the computed result, states it is current, and reports it with its charts, flags and cautions", async () => {
    const computed = await json(await assess(jsonRequest("/assess", "POST", culvertDemo), context()));
    const saved = await save(jsonRequest("/assessments", "POST", { name: "Culvert walls", inputs: computed.inputs, result: computed }), context());
    expect(saved.status).toBe(201);
    const id = (await json(saved)).id as string;
    const reopened = await json(await getOne(jsonRequest(`/assessments/${id}`, "GET"), context({ id })));
    expect(reopened.result).toEqual(computed);
    expect(reopened.isCurrent).toBe(true);

    const markdown = await (await report(jsonRequest(`/reports/${id}.md`, "GET"), context({ file: `${id}.md` }))).text();
    expect(markdown).toContain("# Culvert walls");
    expect(markdown).toContain("Fernbrook Lane box culvert (demo)");
    for (const caution of computed.cautions as string[]) expect(markdown).toContain(caution);
    expect(markdown).toContain("### Phase volumes of the hydrate assemblage");
    expect(markdown).toContain("### Exposure classes");
    for (const flag of computed.flags as { title: string }[]) expect(markdown).toContain(flag.title);
    expect(markdown).toMatch(/would compute the same today/);

    const pdf = Buffer.from(await (await report(jsonRequest(`/reports/${id}.pdf`, "GET"), context({ file: `${id}.pdf` }))).arrayBuffer());
    expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(pdf.toString("latin1")).toContain("(Fernbrook Lane box culvert \\(demo\\))");
  });
});
