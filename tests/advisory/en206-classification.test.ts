import { describe, it, expect } from "vitest";
import { classifyEn206, classifyEn206ChemicalAttack, seawaterZoneOf } from "../../lib/advisory/en206-classification";
import { exposureInput, type ExposureInputRaw } from "../../lib/schema/exposure-input";

const parse = (raw: ExposureInputRaw) => exposureInput.parse(raw);
const xa = (raw: ExposureInputRaw) => classifyEn206ChemicalAttack(parse(raw)).governingClass;
const single = (raw: ExposureInputRaw) => classifyEn206ChemicalAttack(parse(raw)).findings[0].exposureClass;

// Expected classes are the limits of EN 206:2013+A2:2021 Table 2 as listed (confirmed) in the project's
// reference list: SO4 XA1 ≥ 200 and ≤ 600, XA2 > 600 and ≤ 3000, XA3 > 3000 and ≤ 6000 mg/L; etc.
describe("EN 206 Table 2 classification of chemical attack", () => {
  it("reproduces the groundwater sulfate limits at and around 200, 600, 3000 and 6000 mg/L", () => {
    const cases: Array<[number, string | null]> = [
      [199, null], [200, "XA1"], [600, "XA1"], [600.5, "XA2"], [601, "XA2"],
      [3000, "XA2"], [3001, "XA3"], [6000, "XA3"], [6001, "beyond-table"],
    ];
    for (const [sulfateMgPerL, expected] of cases) expect(single({ sulfateMgPerL }), `${sulfateMgPerL} mg/L`).toBe(expected);
  });

  it("reproduces the pH limits: XA1 ≤ 6.5 and ≥ 5.5, XA2 < 5.5 and ≥ 4.5, XA3 < 4.5 and ≥ 4.0", () => {
    const cases: Array<[number, string | null]> = [
      [6.6, null], [6.5, "XA1"], [5.5, "XA1"], [5.49, "XA2"], [4.5, "XA2"], [4.49, "XA3"], [4.0, "XA3"], [3.99, "beyond-table"],
    ];
    for (const [waterPH, expected] of cases) expect(single({ waterPH }), `pH ${waterPH}`).toBe(expected);
  });

  it("reproduces the magnesium limits at and around 300, 1000 and 3000 mg/L", () => {
    const cases: Array<[number, string | null]> = [[299, null], [300, "XA1"], [1000, "XA1"], [1001, "XA2"], [3000, "XA2"], [3001, "XA3"], [20000, "XA3"]];
    for (const [magnesiumMgPerL, expected] of cases) expect(single({ magnesiumMgPerL }), `${magnesiumMgPerL} mg/L Mg`).toBe(expected);
  });

  it("reproduces the soil sulfate limits at and around 2000, 3000, 12000 and 24000 mg/kg", () => {
    const cases: Array<[number, string | null]> = [
      [1999, null], [2000, "XA1"], [3000, "XA1"], [3001, "XA2"], [12000, "XA2"], [12001, "XA3"], [24000, "XA3"], [24001, "beyond-table"],
    ];
    for (const [soilSulfateMgPerKg, expected] of cases) expect(single({ soilSulfateMgPerKg }), `${soilSulfateMgPerKg} mg/kg`).toBe(expected);
    // Same limits entered in % by mass (1 % = 10 000 mg/kg).
    expect(single({ soilSulfateMassPercent: 0.3 })).toBe("XA1");
    expect(single({ soilSulfateMassPercent: 0.31 })).toBe("XA2");
  });

  it("lowers the XA1/XA2 soil sulfate limit to 2000 mg/kg where wetting and drying can accumulate sulfate (Table 2 footnote)", () => {
    expect(single({ soilSulfateMgPerKg: 2000, wetting: "wet-dry" })).toBe("XA1");
    expect(single({ soilSulfateMgPerKg: 2001, wetting: "wet-dry" })).toBe("XA2");
    expect(single({ soilSulfateMgPerKg: 2001, wetting: "permanently-wet" })).toBe("XA1");
  });

  it("reproduces the aggressive CO2 and ammonium limits (Table 2; limits from memory)", () => {
    expect(single({ aggressiveCo2MgPerL: 14 })).toBe(null);
    expect(single({ aggressiveCo2MgPerL: 15 })).toBe("XA1");
    expect(single({ aggressiveCo2MgPerL: 41 })).toBe("XA2");
    expect(single({ aggressiveCo2MgPerL: 101 })).toBe("XA3");
    expect(single({ ammoniumMgPerL: 30 })).toBe("XA1");
    expect(single({ ammoniumMgPerL: 31 })).toBe("XA2");
    expect(single({ ammoniumMgPerL: 101 })).toBe("beyond-table");
  });

  it("lets the most onerous single characteristic govern", () => {
    const r = classifyEn206ChemicalAttack(parse({ sulfateMgPerL: 3500, waterPH: 6.0 }));
    expect(r.governingClass).toBe("XA3");
    expect(r.governingCharacteristics).toEqual(["groundwater-sulfate"]);
    expect(r.raisedByCoincidence).toBe(false);
    expect(r.sulfateGoverns).toBe(true);
  });

  it("raises the class by one where two characteristics reach the same most onerous class (EN 206 Table 2 rule)", () => {
    const r = classifyEn206ChemicalAttack(parse({ sulfateMgPerL: 400, waterPH: 6.0 }));
    expect(r.governingClass).toBe("XA2");
    expect(r.raisedByCoincidence).toBe(true);
    const notes: string[] = [];
    expect(classifyEn206ChemicalAttack(parse({ sulfateMgPerL: 4000, magnesiumMgPerL: 3500 }), notes).governingClass).toBe("XA3");
    expect(notes.join(" ")).toMatch(/special study/);
  });

  it("derives magnesium from magnesium sulfate water when no Mg analysis is given (Mg/SO4 = 24.305/96.06)", () => {
    const r = classifyEn206ChemicalAttack(parse({ sulfateMgPerL: 4000, sulfateCation: "Mg" }));
    const mg = r.findings.find((f) => f.characteristic === "groundwater-magnesium")!;
    expect(Math.abs(mg.value - (4000 * 24.305) / 96.06)).toBeLessThan(0.1); // M(SO4) 96.06 g/mol (CRC Handbook), M(Mg) 24.305
    expect(mg.exposureClass).toBe("XA2");
    expect(r.governingClass).toBe("XA3");
  });

  it("finds no chemical attack where nothing reaches XA1", () => {
    expect(xa({ sulfateMgPerL: 150, waterPH: 7.2 })).toBe(null);
  });
});

describe("EN 206 Table 1 classes other than XA", () => {
  const classes = (raw: ExposureInputRaw) => classifyEn206(parse(raw)).classes.map((c) => c.exposureClass);

  it("maps the wetting regime to XC1–XC4 as the Table 1 descriptions read", () => {
    expect(classes({ wetting: "dry" })).toEqual(["XC1"]);
    expect(classes({ wetting: "permanently-wet" })).toEqual(["XC1"]);
    expect(classes({ wetting: "wet-rarely-dry" })).toEqual(["XC2"]);
    expect(classes({ wetting: "sheltered" })).toEqual(["XC3"]);
    expect(classes({ wetting: "wet-dry" })).toEqual(["XC4"]);
  });

  it("assigns XS by sea-water zone and XD for other chlorides", () => {
    expect(classes({ wetting: "permanently-wet", seawater: true })).toContain("XS2");
    expect(classes({ wetting: "wet-dry", seawater: true })).toContain("XS3");
    expect(classes({ wetting: "sheltered", seawater: "airborne" })).toContain("XS1");
    expect(classes({ wetting: "wet-dry", deIcingSalts: true })).toContain("XD3");
    expect(classes({ wetting: "wet-rarely-dry", chlorideMgPerL: 2000 })).toContain("XD2");
    expect(classes({ wetting: "sheltered", chlorideMgPerL: 500 })).toContain("XD1");
    expect(seawaterZoneOf(parse({ seawater: false }))).toBeUndefined();
  });

  it("assigns XF1–XF4 from water saturation and de-icing agents, and none for dry freezing", () => {
    expect(classes({ wetting: "unsheltered", freezing: { exposed: true } })).toContain("XF1");
    expect(classes({ wetting: "unsheltered", freezing: { exposed: true }, deIcingSalts: true })).toContain("XF2");
    expect(classes({ wetting: "wet-dry", freezing: { exposed: true } })).toContain("XF3");
    expect(classes({ wetting: "wet-dry", freezing: { exposed: true }, seawater: true })).toContain("XF4");
    expect(classes({ wetting: "sheltered", freezing: { exposed: true } }).some((c) => c.startsWith("XF"))).toBe(false);
  });

  it("gives X0 to unreinforced concrete without freeze–thaw or chemical attack, and never XC to it", () => {
    expect(classes({ reinforced: false, wetting: "wet-dry" })).toEqual(["X0"]);
  });

  it("states that national annexes and local codes govern", () => {
    expect(classifyEn206(parse({})).jurisdictionNote).toMatch(/national annex/);
  });
});
