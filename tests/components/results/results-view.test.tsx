// @vitest-environment jsdom
import { describe, it, expect, afterEach, beforeAll } from "vitest";
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { ResultsView } from "../../../components/results/results-view";
import { cautionTextsFor } from "../../../lib/advisory/cautions";

beforeAll(() => {
  globalThis.ResizeObserver ??= class {
    observe() {}
    unobserve() {}
    disconnect() {}
  } as unknown as typeof ResizeObserver;
});
afterEach(cleanup);

const result = {
  versions: { dataset: "d1", engine: "0.1.0" },
  flags: [
    { id: "gypsum-formation", severity: "info", title: "Gypsum may form", explanation: "e", basis: "b", actions: [] },
    { id: "sulfate-attack", severity: "warning", title: "Sulfate attack", explanation: "e", basis: "b", actions: ["Use a sulfate-resisting binder"] },
  ],
  cautions: ["Caution one"],
  assemblage: { phases: [{ id: "C-S-H", volumeCm3: 20 }], poreSolutionCm3: 8, pH: 13.2 },
  curing: { temperature: { timesH: [0, 10], coreC: [20, 40], surfaceC: [20, 30], peakCoreC: 40, maxDifferenceC: 10 } },
};

describe("results view", () => {
  it("puts the flags first, most severe first, then the cautions, key figures and charts", () => {
    render(<ResultsView result={result} />);
    const headings = screen.getAllByRole("heading").map((h) => h.textContent);
    expect(headings.slice(0, 3)).toEqual(["Results", "Risk flags", expect.stringContaining("Warning")]);
    expect(headings.indexOf(headings.find((h) => h?.includes("Warning"))!)).toBeLessThan(headings.indexOf(headings.find((h) => h?.includes("Information"))!));
    expect(screen.getByText("Caution one")).toBeTruthy();
    expect(screen.getByText("Peak core temperature")).toBeTruthy();
    expect(screen.getByRole("heading", { name: "Phase volumes of the hydrate assemblage" })).toBeTruthy();
    expect(screen.getByRole("heading", { name: "Element temperature" })).toBeTruthy();
  });

  it("draws the heat of hydration behind the element temperature, with the per-phase check, and names its source among the key figures", () => {
    const heatModel = {
      label: "thermodynamic heat of hydration (enthalpy balance of reacted binder and equilibrium assemblage)",
      source: "thermodynamic",
      sourceName: "data-set enthalpies",
      referenceTemperatureC: 20,
      perPhaseCheckJPerGCement: { lerchBogue: 456, taylor1997: 467 },
      cementFractionOfBinder: 1,
      curve: [
        { equivalentAgeH: 1, cumulativeHeatJPerGBinder: 29 },
        { equivalentAgeH: 24, cumulativeHeatJPerGBinder: 215 },
        { equivalentAgeH: 8760, cumulativeHeatJPerGBinder: 474 },
      ],
    };
    render(<ResultsView result={{ ...result, curing: { ...result.curing, heatModel } }} />);
    expect(screen.getByText("Heat of hydration from")).toBeTruthy();
    expect(screen.getByText("data-set enthalpies")).toBeTruthy();
    const figure = screen.getByRole("heading", { name: "Heat of hydration" }).closest("figure")!;
    expect(within(figure as HTMLElement).getByText(/Heat source of the element temperature: thermodynamic heat of hydration/)).toBeTruthy();
    fireEvent.click(within(figure as HTMLElement).getByRole("button", { name: "Show data table" }));
    const cells = within(figure as HTMLElement).getAllByRole("cell").map((c) => c.textContent);
    expect(cells).toEqual(expect.arrayContaining(["215", "474"]));
  });

  it("lists what each scenario found, the scenario named once over its rows, values with their units", () => {
    const scenarios = {
      sulfate: { summary: { maximumSolidVolumeIncreasePercentOfPores: 60.5, gypsumOnsetDoseMmolPer100g: null, portlanditeExhaustedDoseMmolPer100g: 117.7 } },
      temperature: { summary: { stabilityLimit: { kind: "found", temperatureC: 89.6 }, curingTemperatureC: 39.7 } },
    };
    render(<ResultsView result={{ ...result, scenarios }} />);
    const section = screen.getByRole("heading", { name: "What the durability scenarios found" }).closest("section")!;
    const rows = within(section).getAllByRole("row").slice(1).map((r) => Array.from(r.querySelectorAll("th, td")).map((c) => c.textContent));
    expect(rows).toEqual([
      ["Sulfate ingress", "Largest solid-volume gain, of the initial capillary pores", "60.5 %"],
      ["", "Sulfate dose at which gypsum appears", "not reached in the sweep"],
      ["", "Sulfate dose at which portlandite is exhausted", "117.7 mmol SO4/100 g binder"],
      ["Temperature history (delayed ettringite formation)", "Temperature above which ettringite is not stable in this mix", "89.6 °C"],
      ["", "Curing temperature evaluated", "39.7 °C"],
    ]);
  });

  it("shows the computation notes (a scenario that could not be computed) after the key figures, and no such section without them", () => {
    render(<ResultsView result={{ ...result, warnings: [{ code: "scenario_failed", scenario: "sulfate", reason: "no_convergence", message: "at 12.0 mmol SO4 per 100 g binder: the phase set cycles" }] }} />);
    const section = screen.getByRole("heading", { name: "Computation notes" }).closest("section")!;
    expect(within(section).getByText(/^The sulfate scenario could not be computed \(no_convergence\)/)).toBeTruthy();
    cleanup();
    render(<ResultsView result={result} />);
    expect(screen.queryByRole("heading", { name: "Computation notes" })).toBeNull();
  });

  it("always shows the cautions, the standard assessment ones when the result carries none", () => {
    render(<ResultsView result={{ flags: [] }} />);
    for (const text of cautionTextsFor("assessment")) expect(screen.getByText(text)).toBeTruthy();
  });

  it("names the phases readably in the chart's data table (csh → C-S-H, monosulfate-14 → Monosulfate (14 H2O))", () => {
    const withIds = { ...result, assemblage: { phases: [{ id: "csh", volumeCm3: 20 }, { id: "monosulfate-14", volumeCm3: 3 }, { id: "new-phase", volumeCm3: 1 }], poreSolutionCm3: 8, pH: 13.2 } };
    render(<ResultsView result={withIds} />);
    const figure = screen.getByRole("heading", { name: "Phase volumes of the hydrate assemblage" }).closest("figure")!;
    fireEvent.click(within(figure as HTMLElement).getByRole("button", { name: "Show data table" }));
    const headings = within(figure as HTMLElement).getAllByRole("columnheader").map((h) => h.textContent);
    expect(headings).toEqual(expect.arrayContaining([expect.stringContaining("C-S-H"), expect.stringContaining("Monosulfate (14 H2O)"), expect.stringContaining("new-phase")]));
    expect(headings.some((h) => h?.startsWith("csh"))).toBe(false);
  });
});
