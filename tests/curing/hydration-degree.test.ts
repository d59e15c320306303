import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { degreeOfHydration, hydrationParameters } from "../../lib/curing/hydration-degree";
import type { CuringBinder } from "../../lib/curing/binder-description";

const phases = { C3S: 0.582, C2S: 0.152, C3A: 0.085, C4AF: 0.088, SO3: 0.0253 }; // ASTM C150 Bogue example (hand computed)
const opc: CuringBinder = { cementPhases: phases, scms: [], binderKgPerM3: 400, waterBinderRatio: 0.4, blaineM2PerKg: 380 };
const slag50: CuringBinder = { ...opc, scms: [{ kind: "slag", massFractionOfBinder: 0.5 }] };

describe("degree of hydration against equivalent age", () => {
  it("gives the plain-cement ultimate degree of Mills (1966) as used by Schindler & Folliard (2005)", () => {
    // alpha_u = 1.031 w/cm / (0.194 + w/cm) = 1.031 x 0.40 / 0.594 = 0.6943 (hand calculation from the published form).
    expect(hydrationParameters(opc).ultimateDegree).toBeCloseTo(0.6943, 3);
  });

  it("reaches alpha_u / e at te = tau, a property of the exponential form of Freiesleben Hansen & Pedersen (1985)", () => {
    const p = hydrationParameters(opc);
    expect(degreeOfHydration(p.tauH, p)).toBeCloseTo(p.ultimateDegree / Math.E, 12);
  });

  it("is zero at zero age and rises monotonically towards alpha_u", () => {
    const p = hydrationParameters(opc);
    expect(degreeOfHydration(0, p)).toBe(0);
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 1e5, noNaN: true }), fc.double({ min: 1.001, max: 10, noNaN: true }), (t, k) => {
        const a = degreeOfHydration(t, p);
        const b = degreeOfHydration(t * k, p);
        return b >= a && b <= p.ultimateDegree;
      }),
    );
  });

  it("slows and stretches hydration with 50 % slag, as slag blends are known to (ACI 233R; Schindler & Folliard 2005)", () => {
    const plain = hydrationParameters(opc);
    const blend = hydrationParameters(slag50);
    // exp(2.187 x 0.5) = 2.985: tau triples (published regression term, hand calculation).
    expect(blend.tauH / plain.tauH).toBeCloseTo(Math.exp(2.187 * 0.5), 6);
    expect(blend.beta).toBeLessThan(plain.beta);
    expect(degreeOfHydration(24, blend)).toBeLessThan(degreeOfHydration(24, plain));
  });

  it("stays finite for a sulfate-resisting cement with almost no C3A", () => {
    const p = hydrationParameters({ ...opc, cementPhases: { ...phases, C3A: 0 } });
    expect(Number.isFinite(p.tauH) && Number.isFinite(p.beta)).toBe(true);
  });
});
