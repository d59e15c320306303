import { describe, expect, it } from "vitest";
import { binderSystemFromInput } from "../../lib/cement/binder-system";
import { sulfateAttackFlag } from "../../lib/advisory/flag-rules/sulfate-attack";
import { magnesiumSulfateAttackFlag } from "../../lib/advisory/flag-rules/magnesium-sulfate-attack";
import { sulfateIngress } from "../../lib/scenarios/sulfate-ingress";
import type { ExposureInput } from "../../lib/schema/exposure-input";

const age = { mode: "age", ageDays: 28, curingTemperatureC: 20 } as const;
const mix = { waterBinderRatio: 0.5, binderContentKgPerM3: 350 };
/** An invented high-C3A clinker (Bogue C3A about 12 %: Al2O3 6.3, Fe2O3 2.0 mass %). */
const highC3A = { kind: "oxides", oxidesMassPercent: { CaO: 64.5, SiO2: 20.0, Al2O3: 6.3, Fe2O3: 2.0, MgO: 1.5, SO3: 3.0, Na2O: 0.2, K2O: 0.8, CO2: 0.5 } };
/** An invented low-C3A clinker (Bogue C3A about 1.5 %: Al2O3 3.6, Fe2O3 4.8 mass %), as ASTM C150 type V. */
const lowC3A = { kind: "oxides", oxidesMassPercent: { CaO: 64.0, SiO2: 21.5, Al2O3: 3.6, Fe2O3: 4.8, MgO: 1.5, SO3: 2.2, Na2O: 0.2, K2O: 0.5, CO2: 0.5 } };
const exposure = (cation: "Na" | "Mg", sulfateMgPerL = 3500): ExposureInput => ({ sulfateMgPerL, sulfateCation: cation, co2Percent: 0.04, reinforced: true });

function scenario(input: Record<string, unknown>, e: ExposureInput) {
  const system = binderSystemFromInput({ mix, age, ...input });
  if (!system.ok) throw new Error(JSON.stringify(system.error));
  const r = sulfateIngress({ composition: system.value.composition, temperatureC: 20, binderContentKgPerM3: 350 }, e, { points: 12 });
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return r.value;
}

describe("sulfate ingress", () => {
  const high = scenario({ cement: highC3A }, exposure("Na"));

  it("turns AFm into ettringite and grows the solid volume as sulfate is taken up (Lothenbach et al. 2010, Cem. Concr. Res. 40, 1211)", () => {
    expect(high.summary.ettringiteIncreaseMolPer100g).toBeGreaterThan(0);
    const volumes = high.sweep.points.map((p) => p.solidVolumeChangeCm3);
    expect(volumes[volumes.length - 1]).toBeGreaterThan(volumes[0]);
    expect(high.sweep.points[0].dose).toBe(0);
  });

  it("raises sulfate-attack as a warning for a high-C3A Portland cement in 3500 mg/L Na2SO4 water (XA3; sulfate-resistance trends: ACI 201.2R, Mehta 1983)", () => {
    const flag = sulfateAttackFlag(high, { exposure: exposure("Na") });
    expect(flag?.severity).toBe("warning");
    expect(flag?.explanation).toMatch(/ettringite/);
    expect(flag?.basis).toMatch(/EN 206|ACI 318/);
  });

  it("computes a larger solid volume increase for high C3A than for low C3A or a slag-rich binder (ASTM C150 type V and slag cements resist sulfate; ACI 201.2R)", () => {
    const low = scenario({ cement: lowC3A }, exposure("Na"));
    const slag = scenario(
      { cement: highC3A, supplementaryMaterials: [{ type: "slag", massPercentOfBinder: 65, composition: { kind: "preset", presetId: "slag-typical" } }] },
      exposure("Na"),
    );
    expect(high.summary.maximumSolidVolumeIncreasePercentOfPores).toBeGreaterThan(low.summary.maximumSolidVolumeIncreasePercentOfPores);
    expect(high.summary.maximumSolidVolumeIncreasePercentOfPores).toBeGreaterThan(slag.summary.maximumSolidVolumeIncreasePercentOfPores);
  });

  it("forms brucite or M-S-H with magnesium sulfate and flags magnesium sulfate attack (Bonen & Cohen 1992, Cem. Concr. Res. 22, 169)", () => {
    const mg = scenario({ cement: highC3A }, exposure("Mg"));
    expect(mg.summary.magnesiumPhasesOnsetDoseMmolPer100g).not.toBeNull();
    expect(magnesiumSulfateAttackFlag(mg, { exposure: exposure("Mg") })?.severity).toBe("warning");
  });

  it("weighs the magnesium sulfate flag by the exposure class: caution in XA1/S1 (400 mg/L), information below XA1/S1 (50 mg/L; EN 206 Table 2, ACI 318-19 Table 19.3.1.1)", () => {
    for (const [sulfateMgPerL, severity] of [[400, "caution"], [50, "info"]] as const) {
      const mg = scenario({ cement: highC3A }, exposure("Mg", sulfateMgPerL));
      expect(mg.summary.magnesiumPhasesOnsetDoseMmolPer100g).not.toBeNull();
      const flag = magnesiumSulfateAttackFlag(mg, { exposure: exposure("Mg", sulfateMgPerL) });
      expect(flag?.severity).toBe(severity);
      if (severity === "info") expect(flag?.explanation).toContain("below the lowest sulfate classes");
    }
  });

  it("does not flag sulfate attack without a sulfate exposure class (EN 206 Table 2: below 200 mg/L)", () => {
    expect(sulfateAttackFlag(high, { exposure: { sulfateMgPerL: 100, co2Percent: 0.04, reinforced: true } })).toBeUndefined();
  });
});
