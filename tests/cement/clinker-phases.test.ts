import { describe, it, expect } from "vitest";
import { clinkerPhase, allClinkerPhases, scmDensityGPerCm3 } from "../../lib/cement/clinker-phases";
import { scmTypes } from "../../lib/schema/binder-input";

describe("clinker phases and SCM densities", () => {
  it("gives the molar masses of C3S, C2S, C3A and C4AF tabulated by Taylor (1997, Cement Chemistry, Table 1.2; from memory)", () => {
    expect(clinkerPhase("alite").molarMassGPerMol).toBeCloseTo(228.32, 1);
    expect(clinkerPhase("belite").molarMassGPerMol).toBeCloseTo(172.24, 1);
    expect(clinkerPhase("aluminate").molarMassGPerMol).toBeCloseTo(270.20, 1);
    expect(clinkerPhase("ferrite").molarMassGPerMol).toBeCloseTo(485.96, 1);
  });

  it("gives gypsum 172.17 g/mol and calcite 100.09 g/mol (CRC Handbook of Chemistry and Physics, from memory)", () => {
    expect(clinkerPhase("gypsum").molarMassGPerMol).toBeCloseTo(172.17, 1);
    expect(clinkerPhase("calcite").molarMassGPerMol).toBeCloseTo(100.09, 1);
  });

  it("gives C3S a molar volume near 72.4 cm³/mol (228.32 g/mol ÷ 3.15 g/cm³, Taylor 1997 Table 1.2; from memory)", () => {
    expect(clinkerPhase("alite").molarVolumeCm3PerMol).toBeCloseTo(72.4, 0);
  });

  it("keeps every density of the clinker phases and sulfates within 2.2–4.1 g/cm³ and cites a source (common practice bounds)", () => {
    for (const phase of allClinkerPhases()) {
      expect(phase.densityGPerCm3).toBeGreaterThan(2.2);
      expect(phase.densityGPerCm3).toBeLessThan(4.1);
      expect(phase.source.length).toBeGreaterThan(5);
    }
  });

  it("has a density for every SCM type of the input schema, silica fume the lightest and slag the densest of the glasses (Lothenbach, Scrivener & Hooton 2011)", () => {
    const densities = scmTypes.map((type) => scmDensityGPerCm3(type));
    expect(Math.min(...densities)).toBe(scmDensityGPerCm3("silica-fume"));
    expect(scmDensityGPerCm3("slag")).toBeGreaterThan(scmDensityGPerCm3("siliceous-fly-ash"));
  });
});
