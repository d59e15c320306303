import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { powersCapillaryPorosity, powersPasteFractions } from "../../lib/cement/powers-model";
import {
  CARBONATION_TIME_REPORTING_LIMIT_YEARS,
  CARBONATION_VOLUME_CHANGE_CH_M3_PER_MOL,
  carbonationCoefficientMmPerSqrtYear,
  carbonationDepthMm,
  carbonationPorosityReduction,
  co2BindingCapacityFromOxidesMolPerM3,
  co2BindingCapacityFromPhasesMolPerM3,
  co2ConcentrationMolPerM3,
  describeCarbonationTime,
  estimateCarbonation,
  papadakisConstituentsFromOxidesMolPerM3,
  papadakisEffectiveDiffusivityM2PerS,
  timeToReachDepthYears,
} from "../../lib/scenarios/carbonation-depth";

/** The ASTM C150 example cement of the project's confirmed reference list (CaO 63.9, SiO2 20.6, Al2O3 5.07, Fe2O3 2.90, SO3 2.53). */
const exampleCement = { CaO: 63.9, SiO2: 20.6, Al2O3: 5.07, Fe2O3: 2.9, SO3: 2.53 };

describe("the CO2 concentration of air", () => {
  it("is 0.0166 mol/m³ at 0.04 % by volume, 20 °C and 1 atm (ideal-gas molar volume 24.055 L/mol at 20 °C, 1 atm; CRC Handbook)", () => {
    expect(co2ConcentrationMolPerM3(0.04, 20)).toBeCloseTo(0.0004 / 0.024055, 6);
  });
});

describe("the Papadakis effective diffusivity", () => {
  it("follows De = 1.64e-6·εp^1.8·(1 − RH)^2.2 m²/s: εp 0.3, RH 50 % gives 4.087e-8 m²/s (evaluated independently by Python's math.pow)", () => {
    // /usr/bin/python3 -c "print(1.64e-6*0.3**1.8*0.5**2.2)" → 4.0869198e-08
    expect(papadakisEffectiveDiffusivityM2PerS(0.3, 50)).toBeCloseTo(4.0869198e-8, 14);
  });

  it("falls to zero in saturated pores and rises with porosity and with drier air (property)", () => {
    expect(papadakisEffectiveDiffusivityM2PerS(0.3, 100)).toBe(0);
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 0.6, noNaN: true }), fc.double({ min: 0, max: 99, noNaN: true }), (eps, rh) => {
        const d = papadakisEffectiveDiffusivityM2PerS(eps, rh);
        return papadakisEffectiveDiffusivityM2PerS(eps * 1.1, rh) > d && papadakisEffectiveDiffusivityM2PerS(eps, rh - 1 < 0 ? 0 : rh - 1) >= d;
      }),
    );
  });
});

describe("the carbonation depth", () => {
  it("grows with the square root of time and of the CO2 concentration, and falls with the root of the binding capacity (dimensional sanity)", () => {
    const x = carbonationDepthMm(1e-8, 0.0166, 3000, 25);
    expect(carbonationDepthMm(1e-8, 0.0166, 3000, 100)).toBeCloseTo(2 * x, 10);
    expect(carbonationDepthMm(1e-8, 4 * 0.0166, 3000, 25)).toBeCloseTo(2 * x, 10);
    expect(carbonationDepthMm(1e-8, 0.0166, 4 * 3000, 25)).toBeCloseTo(x / 2, 10);
    // By hand, SI units: sqrt(2 · 1e-8 m²/s · 0.0166 mol/m³ · 25 · 31 557 600 s / 3000 mol/m³) = 9.344e-3 m (Python: 0.0093439).
    expect(x).toBeCloseTo(9.344, 2);
  });

  it("gives back the depth from the time to reach it (t = (x/k)²)", () => {
    const k = carbonationCoefficientMmPerSqrtYear(2e-8, 0.0166, 3000);
    expect(carbonationDepthMm(2e-8, 0.0166, 3000, timeToReachDepthYears(30, k))).toBeCloseTo(30, 9);
    expect(timeToReachDepthYears(30, 0)).toBe(Number.POSITIVE_INFINITY);
  });
});

describe("the CO2-binding capacity", () => {
  it("counts [CH] + 3[CSH] + 3[C3S] + 2[C2S] (Papadakis et al. 1991)", () => {
    expect(co2BindingCapacityFromPhasesMolPerM3({ portlandite: 1000, csh: 500, unhydratedC3S: 100, unhydratedC2S: 50 })).toBe(2900);
  });

  it("of the ASTM C150 example cement at full hydration agrees with a hand calculation from its Bogue phases (C3S 58.2, C2S 15.2, C4AF 8.8 %)", () => {
    // Hand: 3·582/228.32 + 2·152/172.24 − 2·88/485.96 = 9.050 mol/kg (molar masses CRC Handbook; C3A fully taken up by the sulfate).
    expect(co2BindingCapacityFromOxidesMolPerM3(exampleCement, 1)).toBeCloseTo(9.05, 1);
    expect(Math.abs(co2BindingCapacityFromOxidesMolPerM3(exampleCement, 1) / 9.05 - 1)).toBeLessThan(0.005);
  });

  it("binds less CO2 than the cement's whole CaO (79 % here), as only Ca in CH, C-S-H and silicates is counted", () => {
    const caoMolPerKg = 639 / 56.077; // CaO 56.077 g/mol (CRC Handbook)
    const ratio = co2BindingCapacityFromOxidesMolPerM3(exampleCement, 1) / caoMolPerKg;
    expect(ratio).toBeGreaterThan(0.7);
    expect(ratio).toBeLessThan(0.85);
  });

  it("scales with the cement content and does not depend on how much of the silicate has hydrated", () => {
    const a = papadakisConstituentsFromOxidesMolPerM3(exampleCement, 350, 0.6);
    expect(a.unhydratedC3S).toBeCloseTo((0.4 * 0.582 * 350_000) / 228.32, -1); // 40 % of C3S left, mol/m³ (C3S ≈ 58.2 %, reference list)
    expect(co2BindingCapacityFromOxidesMolPerM3(exampleCement, 700)).toBeCloseTo(2 * co2BindingCapacityFromOxidesMolPerM3(exampleCement, 350), 6);
    // 3[C3S] + 2[C2S] is the same whether counted as unhydrated silicate or as CH + 3 CSH; only the aluminate CH uptake scales with α.
    const silicateOnly = { ...exampleCement, Al2O3: 0, Fe2O3: 0 };
    expect(co2BindingCapacityFromOxidesMolPerM3(silicateOnly, 350, 0.3)).toBeCloseTo(co2BindingCapacityFromOxidesMolPerM3(silicateOnly, 350, 1), 6);
  });
});

describe("the porosity reduction by carbonation", () => {
  it("uses a CH → calcite volume change matching the molar volumes of calcite 36.934 and portlandite 33.056 cm³/mol (Robie & Hemingway 1995, USGS Bull. 2131; from memory)", () => {
    expect(Math.abs(CARBONATION_VOLUME_CHANGE_CH_M3_PER_MOL * 1e6 - (36.934 - 33.056)) / 3.878).toBeLessThan(0.02);
    expect(carbonationPorosityReduction(1000, 0)).toBeCloseTo(1000 * CARBONATION_VOLUME_CHANGE_CH_M3_PER_MOL, 12);
  });
});

describe("the carbonation coefficient of Portland concretes in sheltered outdoor air", () => {
  // Reference: k for CEM I concrete sheltered from rain, 2.5 mm/√year above 35 MPa, 4 for 25–35 MPa and 6 for 15–20 MPa
  // (Lagerblad 2005, Carbon dioxide uptake during concrete life cycle, CBI report 2:2005, table of k values; the same values are
  // tabulated in EN 16757:2017 Annex BB. From memory.) Concretes of w/c 0.45–0.65 span these strength classes.
  //
  // Assumptions of this check (say so): 65 % RH, 0.04 % CO2, 20 °C; the ASTM C150 example cement; 180 kg/m³ of water, so
  // cement = 180/(w/c) kg/m³ (common practice for 20 mm aggregate); degree of hydration 0.8; carbonated paste porosity =
  // Powers total porosity (capillary + gel water, Powers & Brownyard 1947 in the Jensen & Hansen 2001 form) less the
  // Papadakis porosity reduction by carbonation. With the capillary porosity alone the model gives about 1.7–3.4 mm/√year.
  const degreeOfHydration = 0.8;
  const kFor = (waterCementRatio: number) => {
    const f = powersPasteFractions(waterCementRatio, degreeOfHydration);
    const totalPorosity = powersCapillaryPorosity(waterCementRatio, degreeOfHydration) + f.gelWater;
    const cementKgPerM3Paste = 1000 / (waterCementRatio + 1 / 3.15);
    const paste = papadakisConstituentsFromOxidesMolPerM3(exampleCement, cementKgPerM3Paste, degreeOfHydration);
    const carbonatedPorosity = totalPorosity - carbonationPorosityReduction(paste.portlandite, paste.csh);
    const binding = co2BindingCapacityFromOxidesMolPerM3(exampleCement, 180 / waterCementRatio, degreeOfHydration);
    const r = estimateCarbonation({ pastePorosity: carbonatedPorosity, relativeHumidityPercent: 65, co2Percent: 0.04, bindingCapacityMolPerM3: binding, coverMm: 30 });
    if (!r.ok) throw new Error(r.error.message);
    return r.value.coefficientMmPerSqrtYear;
  };

  it("falls within 2.5–6 mm/√year for w/c 0.45, 0.55 and 0.65 and rises with w/c", () => {
    const ks = [0.45, 0.55, 0.65].map(kFor);
    for (const k of ks) {
      expect(k).toBeGreaterThanOrEqual(2.5);
      expect(k).toBeLessThanOrEqual(6);
    }
    expect(ks[0]).toBeLessThan(ks[1]);
    expect(ks[1]).toBeLessThan(ks[2]);
  });
});

describe("estimateCarbonation", () => {
  it("returns a depth curve and the time to reach the cover", () => {
    const r = estimateCarbonation({ pastePorosity: 0.4, relativeHumidityPercent: 65, bindingCapacityMolPerM3: 3000, coverMm: 25, timesYears: [1, 4, 100] });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const k = r.value.coefficientMmPerSqrtYear;
    expect(r.value.depthCurve).toEqual([
      { timeYears: 1, depthMm: k },
      { timeYears: 4, depthMm: 2 * k },
      { timeYears: 100, depthMm: 10 * k },
    ]);
    expect(r.value.timeToCoverYears).toBeCloseTo((25 / k) ** 2, 9);
    expect(r.value.basis).toMatch(/Papadakis/);
    expect(r.value.cautionKind).toBe("carbonation-depth");
  });

  it("warns that the model overestimates in dry air and gives no progress in saturated air", () => {
    const dry = estimateCarbonation({ pastePorosity: 0.4, relativeHumidityPercent: 40, bindingCapacityMolPerM3: 3000 });
    expect(dry.ok && dry.value.notes.join(" ")).toMatch(/overestimates/);
    const wet = estimateCarbonation({ pastePorosity: 0.4, relativeHumidityPercent: 100, bindingCapacityMolPerM3: 3000, coverMm: 30 });
    expect(wet.ok && wet.value.timeToCoverYears).toBe(Number.POSITIVE_INFINITY);
  });

  it("rejects bad input with a typed error naming the field and its limit", () => {
    const r = estimateCarbonation({ pastePorosity: 1.2, relativeHumidityPercent: 65, bindingCapacityMolPerM3: 3000 });
    expect(r).toEqual({ ok: false, error: { code: "invalid-input", field: "pastePorosity", message: "pastePorosity must be strictly within 0–1, got 1.2" } });
    const b = estimateCarbonation({ pastePorosity: 0.3, relativeHumidityPercent: 65, bindingCapacityMolPerM3: 0 });
    expect(!b.ok && b.error.field).toBe("bindingCapacityMolPerM3");
  });
});

describe("describeCarbonationTime", () => {
  it("rounds to whole years up to 1000, says 'more than 1000 years' beyond and 'never' for saturated pores (EN 1990 Table 2.1: working lives up to 100 years)", () => {
    expect(describeCarbonationTime(62.4)).toBe("about 62 years");
    expect(describeCarbonationTime(1000)).toBe("about 1000 years");
    expect(describeCarbonationTime(19780)).toBe(`more than ${CARBONATION_TIME_REPORTING_LIMIT_YEARS} years`);
    expect(describeCarbonationTime(Number.POSITIVE_INFINITY)).toMatch(/^never/);
  });
});
