import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { degreeOfHydration, hydrationParameters } from "../../lib/curing/hydration-degree";
import type { CuringBinder } from "../../lib/curing/binder-description";
import { curingInputFromBinderForm } from "../../lib/curing/binder-form-input";
import { curingBinderOf } from "../../lib/curing/advise-curing";
import { parseCuringInput } from "../../lib/schema/curing-input";

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

describe("the time parameter τ of Schindler & Folliard (2005)", () => {
  it("falls as the alite content rises: more C3S hastens hydration (common practice)", () => {
    const richer = hydrationParameters({ ...opc, cementPhases: { ...phases, C3S: 0.65, C2S: 0.082 } });
    expect(richer.tauH).toBeLessThan(hydrationParameters(opc).tauH);
    // Ferrite reacts slowly: more of it does not make hydration faster.
    const moreFerrite = hydrationParameters({ ...opc, cementPhases: { ...phases, C4AF: 0.12 } });
    expect(moreFerrite.tauH).toBeGreaterThanOrEqual(hydrationParameters(opc).tauH);
  });

  it("agrees within a factor of 1.5 with the time scale of the Parrot & Killoh hydration of the same cement (two independently published models)", () => {
    // The CEM I preset at w/b 0.45. Parrot & Killoh (1984) kinetics with the data-set enthalpies: the age at which the heat
    // at 20 °C reaches 1/e of its one-year value, against τ, the age at which α = αu/e (τ at 21.1 °C, taken as at 20 °C: 6 %).
    const form = {
      element: { thicknessM: 0.5 },
      concrete: { binderKgPerM3: 350, waterBinderRatio: 0.45, fcm28MPa: 45 },
      placementTemperatureC: 20,
      ambient: { kind: "constant", temperatureC: 20 },
      binder: { cement: { kind: "preset", presetId: "en197-cem-i" }, heatCalculation: { points: 30 } },
    };
    const converted = curingInputFromBinderForm(form);
    if (!converted.ok) throw new Error(converted.error.message);
    const input = parseCuringInput(converted.value.curingInput);
    if (!input.ok) throw new Error(input.error.message);
    const tauH = hydrationParameters(curingBinderOf(input.value)).tauH;
    const points = converted.value.heat.points;
    const target = points[points.length - 1].cumulativeHeatJPerG / Math.E;
    const i = points.findIndex((p) => p.cumulativeHeatJPerG >= target);
    const [a, b] = [points[i - 1], points[i]];
    // Interpolated on log age, as the curve's ages are log-spaced.
    const w = (target - a.cumulativeHeatJPerG) / (b.cumulativeHeatJPerG - a.cumulativeHeatJPerG);
    const parrotKillohH = Math.exp(Math.log(a.equivalentAgeH) + w * (Math.log(b.equivalentAgeH) - Math.log(a.equivalentAgeH)));
    expect(tauH / parrotKillohH).toBeGreaterThan(1 / 1.5);
    expect(tauH / parrotKillohH).toBeLessThan(1.5);
  });
});
