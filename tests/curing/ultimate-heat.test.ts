import { describe, it, expect } from "vitest";
import { ultimateHeatJPerKgBinder } from "../../lib/curing/ultimate-heat";
import { perPhaseHeatJPerG } from "../../lib/curing/per-phase-heat";
import type { CuringBinder } from "../../lib/curing/binder-description";

const phases = { C3S: 0.582, C2S: 0.152, C3A: 0.085, C4AF: 0.088, SO3: 0.0253 };
const opc: CuringBinder = { cementPhases: phases, scms: [], binderKgPerM3: 400, waterBinderRatio: 0.4 };

describe("ultimate heat of the binder", () => {
  it("equals the per-phase cement heat for a plain cement", () => {
    expect(ultimateHeatJPerKgBinder(opc)).toBeCloseTo(perPhaseHeatJPerG(phases, 1) * 1000, 6);
  });

  it("mixes cement and slag heats by mass (Schindler & Folliard 2005, Hu = Hcem p_cem + 461 p_slag)", () => {
    const blend = ultimateHeatJPerKgBinder({ ...opc, scms: [{ kind: "slag", massFractionOfBinder: 0.5 }] });
    expect(blend).toBeCloseTo((0.5 * perPhaseHeatJPerG(phases, 1) + 0.5 * 461) * 1000, 6);
  });

  it("counts a class F fly ash by its CaO content (Hu term 1800 p_FA-CaO p_FA J/g)", () => {
    const blend = ultimateHeatJPerKgBinder({ ...opc, scms: [{ kind: "fly-ash", massFractionOfBinder: 0.25, caoMassFraction: 0.08 }] });
    expect(blend).toBeCloseTo((0.75 * perPhaseHeatJPerG(phases, 1) + 1800 * 0.08 * 0.25) * 1000, 6);
  });

  it("treats silica fume as a heat-free diluent and says so (regression does not cover it)", () => {
    const blend = ultimateHeatJPerKgBinder({ ...opc, scms: [{ kind: "silica-fume", massFractionOfBinder: 0.1 }] });
    expect(blend).toBeCloseTo(0.9 * perPhaseHeatJPerG(phases, 1) * 1000, 6);
  });
});
