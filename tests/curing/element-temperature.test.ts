import { describe, it, expect } from "vitest";
import { execFileSync } from "node:child_process";
import { simulateElementTemperature, type ElementThermalInput, type FaceBoundary } from "../../lib/curing/element-temperature";
import { hydrationHeatSource, sampledHeatSource, type HeatSource } from "../../lib/curing/heat-source";
import { equivalentAgeH } from "../../lib/curing/equivalent-age";
import { coverCoefficientWPerM2K, surfaceCover } from "../../lib/curing/surface-heat-transfer";
import type { CuringBinder } from "../../lib/curing/binder-description";

const density = 2400;
const specificHeat = 1000;
const conductivity = 2.0;
const diffusivityM2PerS = conductivity / (density * specificHeat);

const noHeat: HeatSource = { label: "none", referenceTemperatureC: 20, activationEnergyJPerMol: 40000, cumulativeHeatJPerKgBinder: () => 0 };
const insulated: FaceBoundary = { coefficientWPerM2K: () => 0, environmentC: () => 20 };

function base(overrides: Partial<ElementThermalInput>): ElementThermalInput {
  return {
    thicknessM: 1,
    geometry: "symmetric",
    nodeCount: 41,
    densityKgPerM3: density,
    specificHeatJPerKgK: specificHeat,
    conductivityWPerMK: conductivity,
    binderKgPerM3: 0,
    heatSource: noHeat,
    placementTemperatureC: 20,
    durationH: 48,
    timeStepH: 5 / 60,
    faceA: insulated,
    ...overrides,
  };
}

/** scipy.special.erf / erfc run by Debian's python3-scipy (independent library). */
function scipy(expression: string): number[] {
  const out = execFileSync("/usr/bin/python3", ["-c", `from scipy.special import erf, erfc\nimport math\nprint(repr(${expression}))`], {
    encoding: "utf8",
  });
  return JSON.parse(out.replace(/\(/g, "[").replace(/\)/g, "]"));
}

// ASTM C150 Bogue example cement (hand computed), high-cement mass-concrete mix (typical).
const phases = { C3S: 0.582, C2S: 0.152, C3A: 0.085, C4AF: 0.088, SO3: 0.0253, freeCaO: 0.01, MgO: 0.02 };
const opc: CuringBinder = { cementPhases: phases, scms: [], binderKgPerM3: 450, waterBinderRatio: 0.4, blaineM2PerKg: 380 };
const slag50: CuringBinder = { ...opc, scms: [{ kind: "slag", massFractionOfBinder: 0.5 }] };
const plywood = surfaceCover("plywood-formwork")!;
const plywoodFace = (ambientC: number): FaceBoundary => ({
  coefficientWPerM2K: (_t, meanC) => coverCoefficientWPerM2K(plywood, 2, meanC),
  environmentC: () => ambientC,
});

describe("element temperature model", () => {
  it("reaches the adiabatic temperature rise Q·c/(ρ·cp) with insulated faces, to 1 %", () => {
    // Heat curve saturating at 400 J/g of binder by 100 h (typical shape); 450 kg/m³:
    // ΔT = 400 000 J/kg × 450 kg/m³ / (2400 kg/m³ × 1000 J/(kg K)) = 75.0 °C (hand calculation).
    const source = sampledHeatSource(
      [
        { equivalentAgeH: 0, cumulativeHeatJPerKgBinder: 0 },
        { equivalentAgeH: 10, cumulativeHeatJPerKgBinder: 100e3 },
        { equivalentAgeH: 30, cumulativeHeatJPerKgBinder: 300e3 },
        { equivalentAgeH: 100, cumulativeHeatJPerKgBinder: 400e3 },
      ],
      20,
      40000,
    );
    const r = simulateElementTemperature(base({ binderKgPerM3: 450, heatSource: source, durationH: 168 }));
    const rise = r.coreC[r.coreC.length - 1] - 20;
    expect(Math.abs(rise - 75) / 75).toBeLessThan(0.01);
    // Uniform: an insulated element has no gradient.
    expect(Math.abs(r.coreC[r.coreC.length - 1] - r.surfaceC[r.surfaceC.length - 1])).toBeLessThan(1e-6);
  });

  it("closes the adiabatic energy balance with the default heat curve at the equivalent age recomputed from its own temperature history, to 1 %", () => {
    const details = hydrationHeatSource(opc);
    const r = simulateElementTemperature(base({ binderKgPerM3: 450, heatSource: details.source, durationH: 72, placementTemperatureC: 25 }));
    // Equivalent age from the computed core history by the ASTM C1074 sum (independent of the solver's node ages).
    const ages = equivalentAgeH(r.timesH, r.coreC, details.source.activationEnergyJPerMol, details.source.referenceTemperatureC);
    const heatJPerKg = details.source.cumulativeHeatJPerKgBinder(ages[ages.length - 1]);
    const expectedRise = (heatJPerKg * 450) / (density * specificHeat);
    const rise = r.coreC[r.coreC.length - 1] - 25;
    expect(Math.abs(rise - expectedRise) / expectedRise).toBeLessThan(0.01);
  });

  it("matches the semi-infinite erf solution for a sudden surface temperature change, to 1 % of the step", () => {
    // Carslaw & Jaeger (1959) §2.4: T = Ts + (Ti − Ts) erf(x / (2 √(α t))). A 2 m slab insulated at the far face
    // behaves as semi-infinite for 24 h (4 √(α t) ≈ 1.1 m). Surface held at 0 °C by a very large coefficient.
    const hold: FaceBoundary = { coefficientWPerM2K: () => 1e9, environmentC: () => 0 };
    const r = simulateElementTemperature(
      base({ thicknessM: 2, geometry: "two-faces", nodeCount: 201, faceA: hold, faceB: insulated, durationH: 24 }),
    );
    const depthsM = [0.05, 0.1, 0.2, 0.3, 0.5];
    const rootAlphaT = Math.sqrt(diffusivityM2PerS * 24 * 3600);
    const erfValues = scipy(`[erf(x/(2*${rootAlphaT})) for x in ${JSON.stringify(depthsM)}]`);
    depthsM.forEach((x, k) => {
      const node = Math.round(x / 0.01);
      const exact = 20 * erfValues[k];
      expect(Math.abs(r.finalTemperaturesC[node] - exact)).toBeLessThan(0.01 * 20);
    });
  });

  it("matches the semi-infinite solution with a convective surface (Carslaw & Jaeger 1959 §2.7), to 1 % of the step", () => {
    // (T − Ti)/(Ta − Ti) = erfc(x/2√(αt)) − exp(hx/k + h²αt/k²) erfc(x/2√(αt) + h√(αt)/k), h = 10 W/(m² K).
    const h = 10;
    const air: FaceBoundary = { coefficientWPerM2K: () => h, environmentC: () => 0 };
    const r = simulateElementTemperature(
      base({ thicknessM: 2, geometry: "two-faces", nodeCount: 201, faceA: air, faceB: insulated, durationH: 24 }),
    );
    const depthsM = [0, 0.05, 0.1, 0.2, 0.4];
    const s = Math.sqrt(diffusivityM2PerS * 24 * 3600);
    const values = scipy(
      `[erfc(x/(2*${s})) - math.exp(${h}*x/${conductivity} + (${h}*${s}/${conductivity})**2) * erfc(x/(2*${s}) + ${h}*${s}/${conductivity}) for x in ${JSON.stringify(depthsM)}]`,
    );
    depthsM.forEach((x, k) => {
      const node = Math.round(x / 0.01);
      const exact = 20 + (0 - 20) * values[k];
      expect(Math.abs(r.finalTemperaturesC[node] - exact)).toBeLessThan(0.01 * 20);
    });
  });

  it("changes the peak core temperature by less than 0.5 °C when the grid and the time step are halved", () => {
    const run = (nodeCount: number, timeStepH: number) =>
      simulateElementTemperature(
        base({
          thicknessM: 1.5,
          nodeCount,
          timeStepH,
          binderKgPerM3: 450,
          heatSource: hydrationHeatSource(opc).source,
          placementTemperatureC: 25,
          faceA: plywoodFace(25),
          durationH: 168,
        }),
      ).peakCoreC;
    const coarse = run(41, 5 / 60);
    expect(Math.abs(run(81, 5 / 60) - coarse)).toBeLessThan(0.5);
    expect(Math.abs(run(41, 2.5 / 60) - coarse)).toBeLessThan(0.5);
  });

  it("agrees between Crank–Nicolson and backward Euler within 0.5 °C on the peak", () => {
    const run = (scheme: "crank-nicolson" | "backward-euler") =>
      simulateElementTemperature(
        base({ thicknessM: 1.5, scheme, binderKgPerM3: 450, heatSource: hydrationHeatSource(opc).source, placementTemperatureC: 25, faceA: plywoodFace(25), durationH: 168 }),
      ).peakCoreC;
    expect(Math.abs(run("crank-nicolson") - run("backward-euler"))).toBeLessThan(0.5);
  });

  it("heats a 1.5 m high-cement element placed at 25 °C above 60 °C, and the same mix with 50 % slag less", () => {
    // Published mass-concrete behaviour: thick sections of cement-rich mixes exceed 60 °C from a 25 °C placement,
    // and replacing cement by slag lowers and delays the peak (ACI 207.1R-05 ch. 2 and 5; ACI 233R-17), from memory.
    const run = (binder: CuringBinder) =>
      simulateElementTemperature(
        base({ thicknessM: 1.5, binderKgPerM3: 450, heatSource: hydrationHeatSource(binder).source, placementTemperatureC: 25, faceA: plywoodFace(25), durationH: 240 }),
      );
    const plain = run(opc);
    const blend = run(slag50);
    expect(plain.peakCoreC).toBeGreaterThan(60);
    expect(blend.peakCoreC).toBeLessThan(plain.peakCoreC);
    expect(blend.peakTimeH).toBeGreaterThan(plain.peakTimeH);
  });

  it("keeps the core hotter than the surface of a cooled element and reports the largest difference", () => {
    const r = simulateElementTemperature(
      base({ thicknessM: 1.5, binderKgPerM3: 450, heatSource: hydrationHeatSource(opc).source, placementTemperatureC: 25, faceA: plywoodFace(10), durationH: 168 }),
    );
    const differences = r.coreC.map((c, i) => c - r.surfaceC[i]);
    expect(r.maxDifferenceC).toBeCloseTo(Math.max(...differences), 10);
    expect(r.maxDifferenceC).toBeGreaterThan(0);
  });

  it("refuses a run with more steps than the cap instead of hanging", () => {
    expect(() => simulateElementTemperature(base({ durationH: 2000, timeStepH: 0.001 }))).toThrow(RangeError);
  });
});
