import { describe, expect, it } from "vitest";
import { buildReportModel, chartTable, formatCell, robustnessSentence } from "../../lib/report/report-model";
import { sampleCharts, sampleFiles, sampleSaved } from "./sample-assessment";

const running = { dataset: "abc123", engine: "0.1.0" };

describe("buildReportModel", () => {
  it("puts the project, its element and the result's cautions into the model", () => {
    const model = buildReportModel({ saved: sampleSaved, running, datasetFiles: sampleFiles, charts: sampleCharts });
    expect(model.subtitle).toBe("Quay Extension Phase 2");
    expect(model.project).toContainEqual({ label: "Thickness", value: "0.6 m" });
    expect(model.cautions).toEqual((sampleSaved.result as { cautions: string[] }).cautions);
  });

  it("orders flags most severe first", () => {
    const model = buildReportModel({ saved: sampleSaved, running, datasetFiles: sampleFiles, charts: [] });
    expect(model.flags.map((f) => f.severity)).toEqual(["warning", "caution"]);
  });

  it("says the result would compute the same today only when both versions match", () => {
    expect(buildReportModel({ saved: sampleSaved, running, datasetFiles: [], charts: [] }).currencyStatement).toMatch(/would compute the same today/);
    const stale = buildReportModel({ saved: sampleSaved, running: { dataset: "zzz", engine: "0.1.0" }, datasetFiles: [], charts: [] });
    expect(stale.currencyStatement).toMatch(/may not compute the same today: the data set has changed \(saved abc123, now zzz\)/);
  });

  it("lists suppressed phases by their readable names among the assumptions and the inputs without the project block", () => {
    const model = buildReportModel({ saved: sampleSaved, running, datasetFiles: [], charts: [] });
    expect(model.assumptions).toContain("Phases suppressed on top of the default kinetic constraints: Thaumasite.");
    expect(model.inputs.rows).toContainEqual(["options.suppressedPhases.0", "Thaumasite"]);
    expect(model.inputs.rows).toContainEqual(["mix.waterBinderRatio", "0.45"]);
    expect(model.inputs.rows.some(([path]) => path.startsWith("project."))).toBe(false);
  });

  it("falls back to a standard caution when a saved result carries none", () => {
    const saved = { ...sampleSaved, result: {} };
    expect(buildReportModel({ saved, running, datasetFiles: [], charts: [] }).cautions[0]).toMatch(/licensed engineer/);
  });

  it("says the validation dossier is not generated yet when there is none", () => {
    const model = buildReportModel({ saved: sampleSaved, running, datasetFiles: [], charts: [], dossier: null });
    expect(model.validation).toBeNull();
    expect(model.validationNote).toMatch(/run npm test/);
  });
});

describe("chartTable", () => {
  it("gives one column per series with its unit and one row per chart row", () => {
    const table = chartTable(sampleCharts[1]);
    expect(table.columns[0]).toBe("SO4 added (g/100 g binder)");
    expect(table.columns).toContain("ettringite (cm³/100 g binder)");
    expect(table.rows).toHaveLength(4);
  });
});

describe("formatCell", () => {
  it("prints numbers to four significant figures, empty arrays as (none), null as empty", () => {
    expect(formatCell(12.34567)).toBe("12.35");
    expect(formatCell([])).toBe("(none)");
    expect(formatCell(null)).toBe("");
    expect(formatCell(true)).toBe("yes");
  });
});

describe("robustnessSentence", () => {
  it("gives the fired fraction and the samples, and the samples that could not evaluate the flag when there are any", () => {
    expect(robustnessSentence({ firedFraction: 0.84, samples: 200 })).toBe("A caution or warning in 84 % of 200 Monte Carlo samples.");
    expect(robustnessSentence({ firedFraction: 0.5, samples: 190, notEvaluated: 10 })).toBe("A caution or warning in 50 % of 190 Monte Carlo samples (10 more could not evaluate it: its scenario did not converge there).");
  });
});
