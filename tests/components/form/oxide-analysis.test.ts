import { describe, it, expect } from "vitest";
import { OXIDE_ORDER, oxideTotal, parseOxideRow } from "../../../components/form/oxide-analysis";

describe("oxide total", () => {
  // The ASTM C150 example analysis of the reference values (CaO 63.9, SiO2 20.6, Al2O3 5.07, Fe2O3 2.90, SO3 2.53)
  // with MgO 2.5, alkalis and LOI typical of a mill certificate (invented for the test).
  it("adds the oxides, LOI and Cl but not free lime (part of CaO)", () => {
    const t = oxideTotal({ CaO: 63.9, SiO2: 20.6, Al2O3: 5.07, Fe2O3: 2.9, SO3: 2.53, MgO: 2.5, K2O: 0.8, Na2O: 0.2, LOI: 1.5, freeLime: 1.2, Cl: 0.02 });
    expect(t.totalMassPercent).toBeCloseTo(63.9 + 20.6 + 5.07 + 2.9 + 2.53 + 2.5 + 0.8 + 0.2 + 1.5 + 0.02, 10);
    expect(t.withinRange).toBe(true);
  });

  it("counts CO2 only when no LOI is given (CO2 is part of LOI)", () => {
    expect(oxideTotal({ CaO: 60, CO2: 2, LOI: 3 }).totalMassPercent).toBe(63);
    expect(oxideTotal({ CaO: 60, CO2: 2 }).totalMassPercent).toBe(62);
  });

  it("warns outside 97–101 % (range of the oxide-to-phase rules data file)", () => {
    expect(oxideTotal({ CaO: 60, SiO2: 20 }).withinRange).toBe(false);
    expect(oxideTotal({ CaO: 70, SiO2: 32 }).withinRange).toBe(false);
    const edge = oxideTotal({ CaO: 77, SiO2: 20 });
    expect([edge.minMassPercent, edge.maxMassPercent]).toEqual([97, 101]);
    expect(edge.withinRange).toBe(true);
  });

  it("ignores empty and non-numeric fields", () => {
    expect(oxideTotal({ CaO: 60, SiO2: undefined, Al2O3: Number.NaN, Fe2O3: "3" }).totalMassPercent).toBe(60);
  });
});

describe("pasted spreadsheet row", () => {
  it("reads tab-separated values in the order shown, with decimal commas", () => {
    const parsed = parseOxideRow("63,5\t20,3\t4,8\t3,0\t1,8\t3,1");
    expect(parsed).toEqual({ ok: true, values: { CaO: 63.5, SiO2: 20.3, Al2O3: 4.8, Fe2O3: 3.0, MgO: 1.8, SO3: 3.1 } });
  });

  it("reads semicolon- and comma-separated rows and skips empty cells", () => {
    expect(parseOxideRow("63.5;20.3;;3")).toEqual({ ok: true, values: { CaO: 63.5, SiO2: 20.3, Fe2O3: 3 } });
    expect(parseOxideRow("63.5,20.3,4.8")).toEqual({ ok: true, values: { CaO: 63.5, SiO2: 20.3, Al2O3: 4.8 } });
  });

  it("names the value that is not a number, or out of range, and refuses too many values", () => {
    expect(parseOxideRow("63.5\tabc")).toEqual({ ok: false, message: 'Value 2 (SiO2) is not a number: "abc".' });
    expect(parseOxideRow("163.5")).toEqual({ ok: false, message: "Value 1 (CaO) must be between 0 and 100 mass %." });
    const tooMany = Array.from({ length: OXIDE_ORDER.length + 1 }, () => "1").join("\t");
    expect(parseOxideRow(tooMany).ok).toBe(false);
    expect(parseOxideRow("  ").ok).toBe(false);
  });
});
