import { describe, expect, it } from "vitest";
import { scenarioFindings } from "../../lib/report/scenario-findings";
import { demoResult } from "./real-result";

describe("scenarioFindings of the demo assessment", () => {
  it("gives the headline figures of every scenario run, each with its unit, in the scenarios' order", async () => {
    const result = await demoResult();
    const findings = scenarioFindings(result);
    const scenarios = [...new Set(findings.map((f) => f.scenario))];
    expect(scenarios).toEqual(["Sulfate ingress", "Carbonation", "Temperature history (delayed ettringite formation)", "Thaumasite", "Chloride binding", "Drying"]);
    const value = (quantity: RegExp) => findings.find((f) => quantity.test(f.quantity))?.value;
    expect(value(/^CO2 binding capacity$/)).toBe(result.scenarios.carbonation!.summary.co2BindingCapacityMolPerM3);
    expect(value(/portlandite is exhausted/)).toBe(result.scenarios.sulfate!.summary.portlanditeExhaustedDoseMmolPer100g ?? "not reached in the sweep");
    expect(value(/gypsum appears/)).toBe(result.scenarios.sulfate!.summary.gypsumOnsetDoseMmolPer100g ?? "not reached in the sweep");
    // The ettringite stability temperature is there although the demo's curing (about 40 °C) raises no DEF flag.
    expect(result.flags.some((f) => f.id === "delayed-ettringite-formation")).toBe(false);
    expect(value(/ettringite is not stable/)).toBe(result.scenarios.temperature!.summary.ettringiteStabilityTemperatureC);
    for (const f of findings) if (typeof f.value === "number") expect(Number.isFinite(f.value)).toBe(true);
  });

  it("names the solids after full carbonation readably and leaves out the gas phase", async () => {
    const solids = scenarioFindings(await demoResult()).find((f) => f.quantity === "Solids at full carbonation")!.value as string;
    expect(solids).toContain("Calcite");
    expect(solids).not.toMatch(/\bgas\b/);
  });
});

describe("scenarioFindings read defensively", () => {
  it("gives nothing for a result without scenarios, and words for limits that are not temperatures", () => {
    expect(scenarioFindings({})).toEqual([]);
    const findings = scenarioFindings({ scenarios: { thaumasite: { summary: { serviceTemperatureC: 5, stabilityLimit: { kind: "stable-throughout", upToC: 30 } } } } });
    expect(findings).toEqual([
      { scenario: "Thaumasite", quantity: "Service temperature evaluated (the coldest)", value: 5, unit: "°C" },
      { scenario: "Thaumasite", quantity: "Temperature above which thaumasite is not stable", value: "stable throughout (up to 30 °C)", unit: "" },
    ]);
  });
});
