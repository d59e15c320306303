import { describe, it, expect } from "vitest";
import { hydrationHeatSource, sampledHeatSource } from "../../lib/curing/heat-source";
import { degreeOfHydration } from "../../lib/curing/hydration-degree";
import type { CuringBinder } from "../../lib/curing/binder-description";

const phases = { C3S: 0.582, C2S: 0.152, C3A: 0.085, C4AF: 0.088, SO3: 0.0253 };
const opc: CuringBinder = { cementPhases: phases, scms: [], binderKgPerM3: 400, waterBinderRatio: 0.45 };

describe("heat sources for the element model", () => {
  it("releases Hu · α(te) with the default curve (Schindler & Folliard 2005 form)", () => {
    const d = hydrationHeatSource(opc);
    expect(d.source.cumulativeHeatJPerKgBinder(48)).toBeCloseTo(d.ultimateHeatJPerKgBinder * degreeOfHydration(48, d.parameters), 6);
    expect(d.source.referenceTemperatureC).toBe(21.1);
  });

  it("gives an activation energy in the 40–50 kJ/mol band reported for plain Portland cements (Schindler 2004; Carino & Lew 2001), from memory", () => {
    const e = hydrationHeatSource(opc).source.activationEnergyJPerMol;
    expect(e).toBeGreaterThan(40000);
    expect(e).toBeLessThan(50000);
  });

  it("releases less heat by three days with 50 % slag than the plain cement", () => {
    const plain = hydrationHeatSource(opc).source.cumulativeHeatJPerKgBinder(72);
    const blend = hydrationHeatSource({ ...opc, scms: [{ kind: "slag", massFractionOfBinder: 0.5 }] }).source.cumulativeHeatJPerKgBinder(72);
    expect(blend).toBeLessThan(plain);
  });

  it("interpolates a sampled curve linearly and holds its last value", () => {
    const s = sampledHeatSource(
      [
        { equivalentAgeH: 0, cumulativeHeatJPerKgBinder: 0 },
        { equivalentAgeH: 10, cumulativeHeatJPerKgBinder: 100 },
        { equivalentAgeH: 20, cumulativeHeatJPerKgBinder: 150 },
      ],
      20,
      40000,
    );
    expect(s.cumulativeHeatJPerKgBinder(5)).toBeCloseTo(50, 12);
    expect(s.cumulativeHeatJPerKgBinder(15)).toBeCloseTo(125, 12);
    expect(s.cumulativeHeatJPerKgBinder(500)).toBe(150);
  });

  it("rejects a sampled curve whose heat decreases", () => {
    expect(() =>
      sampledHeatSource(
        [
          { equivalentAgeH: 0, cumulativeHeatJPerKgBinder: 10 },
          { equivalentAgeH: 1, cumulativeHeatJPerKgBinder: 5 },
        ],
        20,
        40000,
      ),
    ).toThrow(RangeError);
  });
});
