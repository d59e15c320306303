import { arrheniusAgeFactor } from "./arrhenius-rate";
import type { HeatSource } from "./heat-source";
import { solveTridiagonal } from "./tridiagonal";
import { curingInputDefaults } from "./curing-data";

/** One face of the element: its environment temperature and overall surface coefficient over time. */
export type FaceBoundary = {
  /** Overall surface coefficient, W/(m²·K), at time tH with the given mean film temperature (°C); 0 = insulated. */
  coefficientWPerM2K: (timeH: number, meanFilmTemperatureC: number) => number;
  /** Environment (air or enclosure) temperature, °C. */
  environmentC: (timeH: number) => number;
};

export type ElementGeometry = "symmetric" | "two-faces";
export type TimeScheme = "crank-nicolson" | "backward-euler";

export type ElementThermalInput = {
  thicknessM: number;
  /** "symmetric": both faces alike, half the thickness is modelled with an adiabatic mid-plane (face A on both sides). */
  geometry: ElementGeometry;
  nodeCount: number;
  densityKgPerM3: number;
  specificHeatJPerKgK: number;
  conductivityWPerMK: number;
  binderKgPerM3: number;
  heatSource: HeatSource;
  placementTemperatureC: number;
  durationH: number;
  timeStepH: number;
  scheme?: TimeScheme;
  faceA: FaceBoundary;
  /** Required for "two-faces". */
  faceB?: FaceBoundary;
};

export type ElementThermalResult = {
  timesH: number[];
  /** Mid-thickness temperature, °C. */
  coreC: number[];
  /** Face A temperature, °C. */
  surfaceC: number[];
  /** Face B temperature for "two-faces", °C. */
  surfaceBC?: number[];
  peakCoreC: number;
  peakTimeH: number;
  /** Largest core − coolest-face temperature difference over the run, °C. */
  maxDifferenceC: number;
  maxDifferenceTimeH: number;
  /** Highest temperature anywhere in the element over the run, °C. */
  maxTemperatureC: number;
  /** Cumulative heat released at the core, J per kg binder (from the heat source). */
  coreHeatJPerKgBinder: number[];
  /** Core equivalent age in the heat source's own reference temperature, h. */
  coreSourceEquivalentAgeH: number[];
  nodePositionsM: number[];
  finalTemperaturesC: number[];
  finalSourceEquivalentAgeH: number[];
  steps: number;
};

/** Upper bound on time steps, so a run always ends (data file: input defaults). */
export const maxElementSteps = curingInputDefaults.maxTimeSteps.value;
const secondsPerHour = 3600;
const startupBackwardEulerSteps = 2; // Rannacher (1984) start-up: damps Crank–Nicolson oscillation after the placement jump

/**
 * 1-D transient conduction through the thickness with hydration heat (vertex-centred finite volumes):
 *   ρ c_p ∂T/∂t = ∂/∂x(λ ∂T/∂x) + q,   q = m_b · dQ(t_e)/dt,
 *   −λ ∂T/∂n = h (T_s − T_env) at each face,
 * θ-scheme in time (θ = ½ Crank–Nicolson with two backward-Euler start-up steps, or θ = 1).
 * The heat source is coupled through the Arrhenius equivalent age of each node,
 *   dt_e/dt = exp[−(E/R)(1/T − 1/T_ref)],
 * advanced by a predictor–corrector with the step-mean node temperature; the source per step is the exact
 * difference Q(t_e,new) − Q(t_e,old), so the energy balance closes to round-off.
 */
export function simulateElementTemperature(input: ElementThermalInput): ElementThermalResult {
  const n = input.nodeCount;
  if (!(n >= 3) || !Number.isInteger(n)) throw new RangeError("nodeCount must be an integer of at least 3");
  const steps = Math.ceil(input.durationH / input.timeStepH - 1e-9);
  if (!(steps >= 1) || steps > maxElementSteps) throw new RangeError(`steps must be between 1 and ${maxElementSteps}`);
  if (input.geometry === "two-faces" && !input.faceB) throw new RangeError("faceB is required for two-faces geometry");

  const symmetric = input.geometry === "symmetric";
  const lengthM = symmetric ? input.thicknessM / 2 : input.thicknessM;
  const dxM = lengthM / (n - 1);
  const dtS = (input.durationH / steps) * secondsPerHour;
  const dtH = dtS / secondsPerHour;
  const conductanceWPerM2K = input.conductivityWPerMK / dxM;
  const volumetricHeatCapacity = input.densityKgPerM3 * input.specificHeatJPerKgK;
  const source = input.heatSource;

  // Node arrangement: symmetric → node 0 is the adiabatic mid-plane, node n−1 is face A;
  // two-faces → node 0 is face A, node n−1 is face B.
  const faceANode = symmetric ? n - 1 : 0;
  const faces: { node: number; boundary: FaceBoundary }[] = [{ node: faceANode, boundary: input.faceA }];
  if (!symmetric) faces.push({ node: n - 1, boundary: input.faceB! });

  const volume = new Float64Array(n).fill(dxM); // per m² of face
  volume[0] = dxM / 2;
  volume[n - 1] = dxM / 2;
  const capacity = new Float64Array(n);
  for (let i = 0; i < n; i++) capacity[i] = volumetricHeatCapacity * volume[i];

  const temperature = new Float64Array(n).fill(input.placementTemperatureC);
  const trial = new Float64Array(n);
  const age = new Float64Array(n);
  const ageNew = new Float64Array(n);
  const heat = new Float64Array(n).fill(source.cumulativeHeatJPerKgBinder(0));
  const heatNew = new Float64Array(n);
  const lower = new Float64Array(n);
  const diagonal = new Float64Array(n);
  const upper = new Float64Array(n);
  const baseRhs = new Float64Array(n);
  const rhs = new Float64Array(n);
  const scratch = new Float64Array(n);

  const coreLow = symmetric ? 0 : Math.floor((n - 1) / 2);
  const coreHigh = symmetric ? 0 : Math.ceil((n - 1) / 2);
  const coreOf = (t: Float64Array) => 0.5 * (t[coreLow] + t[coreHigh]);
  const coolestFace = (t: Float64Array) => (symmetric ? t[faceANode] : Math.min(t[0], t[n - 1]));

  const timesH = [0];
  const coreC = [coreOf(temperature)];
  const surfaceC = [temperature[faceANode]];
  const surfaceBC: number[] | undefined = symmetric ? undefined : [temperature[n - 1]];
  const coreHeat = [heat[coreLow]];
  const coreAge = [0];
  let peakCoreC = coreC[0];
  let peakTimeH = 0;
  let maxDifferenceC = coreC[0] - coolestFace(temperature);
  let maxDifferenceTimeH = 0;
  let maxTemperatureC = input.placementTemperatureC;

  const solveWithSource = () => {
    for (let i = 0; i < n; i++) {
      heatNew[i] = source.cumulativeHeatJPerKgBinder(ageNew[i]);
      rhs[i] = baseRhs[i] + (volume[i] * input.binderKgPerM3 * (heatNew[i] - heat[i])) / dtS;
    }
    solveTridiagonal(lower, diagonal, upper, rhs, trial, scratch);
  };

  for (let step = 1; step <= steps; step++) {
    const t0H = (step - 1) * dtH;
    const t1H = step * dtH;
    const theta = input.scheme === "backward-euler" || step <= startupBackwardEulerSteps ? 1 : 0.5;

    // Conduction part of the θ-scheme.
    for (let i = 0; i < n; i++) {
      const left = i > 0 ? conductanceWPerM2K : 0;
      const right = i < n - 1 ? conductanceWPerM2K : 0;
      lower[i] = -theta * left;
      upper[i] = -theta * right;
      diagonal[i] = capacity[i] / dtS + theta * (left + right);
      let explicitFlux = 0;
      if (i > 0) explicitFlux += left * (temperature[i - 1] - temperature[i]);
      if (i < n - 1) explicitFlux += right * (temperature[i + 1] - temperature[i]);
      baseRhs[i] = (capacity[i] / dtS) * temperature[i] + (1 - theta) * explicitFlux;
    }
    for (const face of faces) {
      const i = face.node;
      const env0 = face.boundary.environmentC(t0H);
      const env1 = face.boundary.environmentC(t1H);
      const h0 = face.boundary.coefficientWPerM2K(t0H, 0.5 * (temperature[i] + env0));
      const h1 = face.boundary.coefficientWPerM2K(t1H, 0.5 * (temperature[i] + env1));
      diagonal[i] += theta * h1;
      baseRhs[i] += (1 - theta) * h0 * (env0 - temperature[i]) + theta * h1 * env1;
    }

    // Predictor: equivalent age advanced at the old temperature.
    for (let i = 0; i < n; i++) {
      ageNew[i] = age[i] + arrheniusAgeFactor(temperature[i], source.activationEnergyJPerMol, source.referenceTemperatureC) * dtH;
    }
    solveWithSource();
    // Corrector: at the step-mean temperature.
    for (let i = 0; i < n; i++) {
      const meanC = 0.5 * (temperature[i] + trial[i]);
      ageNew[i] = age[i] + arrheniusAgeFactor(meanC, source.activationEnergyJPerMol, source.referenceTemperatureC) * dtH;
    }
    solveWithSource();

    for (let i = 0; i < n; i++) {
      temperature[i] = trial[i];
      age[i] = ageNew[i];
      heat[i] = heatNew[i];
      if (temperature[i] > maxTemperatureC) maxTemperatureC = temperature[i];
    }
    const core = coreOf(temperature);
    timesH.push(t1H);
    coreC.push(core);
    surfaceC.push(temperature[faceANode]);
    surfaceBC?.push(temperature[n - 1]);
    coreHeat.push(heat[coreLow]);
    coreAge.push(age[coreLow]);
    if (core > peakCoreC) {
      peakCoreC = core;
      peakTimeH = t1H;
    }
    const difference = core - coolestFace(temperature);
    if (difference > maxDifferenceC) {
      maxDifferenceC = difference;
      maxDifferenceTimeH = t1H;
    }
  }

  const nodePositionsM = Array.from({ length: n }, (_, i) => i * dxM);
  return {
    timesH,
    coreC,
    surfaceC,
    ...(surfaceBC ? { surfaceBC } : {}),
    peakCoreC,
    peakTimeH,
    maxDifferenceC,
    maxDifferenceTimeH,
    maxTemperatureC,
    coreHeatJPerKgBinder: coreHeat,
    coreSourceEquivalentAgeH: coreAge,
    nodePositionsM,
    finalTemperaturesC: Array.from(temperature),
    finalSourceEquivalentAgeH: Array.from(age),
    steps,
  };
}
