import { describe, it, expect } from "vitest";
import { bandContains, type ClassBand } from "../../lib/advisory/class-band";
import { ACI318, EN206 } from "../../lib/advisory/standards-data";

/** Bands sorted by min must neither overlap nor leave a gap between the first and last bound. */
function checkContiguous(bands: readonly ClassBand[], label: string) {
  const sorted = [...bands].sort((a, b) => (a.min ?? -Infinity) - (b.min ?? -Infinity));
  for (let i = 1; i < sorted.length; i++) {
    const lower = sorted[i - 1];
    const upper = sorted[i];
    expect(lower.max, `${label}: ${lower.exposureClass} upper end`).toBe(upper.min);
    // At the shared limit exactly one of the two bands must contain the value.
    const at = upper.min as number;
    expect(Number(bandContains(lower, at)) + Number(bandContains(upper, at)), `${label}: value ${at}`).toBe(1);
  }
}

describe("the exposure-standard data files", () => {
  it("load and carry provenance", () => {
    expect(EN206.provenance.sources.length).toBeGreaterThan(0);
    expect(ACI318.provenance.sources.length).toBeGreaterThan(0);
    expect(EN206.jurisdictionNote).toMatch(/national annex/);
  });

  it("have contiguous, non-overlapping bands in every EN 206 Table 2 row and ACI 318 sulfate row", () => {
    for (const c of EN206.chemicalAttack.characteristics) {
      checkContiguous(c.bands, c.id);
      if (c.accumulation) checkContiguous(c.accumulation.bands.filter((b) => b.min !== b.max), `${c.id} (accumulation)`);
    }
    checkContiguous(ACI318.sulfate.soil.bands, "ACI soil");
    checkContiguous(ACI318.sulfate.water.bands, "ACI water");
  });

  it("tighten the EN 206 Annex F limits from XA1 to XA3 and from XC1 to XC4 (Table F.1 is ordered by severity)", () => {
    const L = EN206.limitingValues.classes;
    for (const series of [["XA1", "XA2", "XA3"], ["XC1", "XC2", "XC3", "XC4"], ["XS1", "XS2", "XS3"], ["XD1", "XD3"]]) {
      for (let i = 1; i < series.length; i++) {
        expect(L[series[i]].maxWaterCementRatio!).toBeLessThanOrEqual(L[series[i - 1]].maxWaterCementRatio!);
        expect(L[series[i]].minCementContentKgPerM3!).toBeGreaterThanOrEqual(L[series[i - 1]].minCementContentKgPerM3!);
      }
    }
  });

  it("name an existing strength class for every Annex F entry", () => {
    const known = new Set(EN206.strengthClasses.classes.map((c) => c.strengthClass));
    for (const limits of Object.values(EN206.limitingValues.classes)) expect(known.has(limits.minStrengthClass)).toBe(true);
  });

  it("give ACI 318 SI strengths that match the psi values within rounding (1 psi = 6.894757e-3 MPa, NIST SP 811)", () => {
    for (const [cls, r] of Object.entries(ACI318.requirements.classes)) {
      expect(Math.abs(r.minFcMPa - r.minFcPsi * 6.894757e-3), cls).toBeLessThan(0.6);
    }
  });

  it("hold the ACI 318 S-class maximum w/cm of the confirmed reference list: S1 0.50, S2 0.45, S3 0.45 (option 2: 0.40)", () => {
    const r = ACI318.requirements.classes;
    expect([r.S1.maxWaterCementitiousRatio, r.S2.maxWaterCementitiousRatio, r.S3.maxWaterCementitiousRatio, r.S3.alternative?.maxWaterCementitiousRatio]).toEqual([0.5, 0.45, 0.45, 0.4]);
  });
});
