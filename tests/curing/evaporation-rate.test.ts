import { describe, it, expect } from "vitest";
import { expectReference } from "../support/reference-check";
import { unoEvaporationKgPerM2H } from "../../lib/curing/evaporation-rate";

describe("Uno (1998) evaporation rate", () => {
  it("reproduces the ACI 305R nomograph worked example (Tc = Ta = 30 °C, RH 50 %, wind 16 km/h → about 0.8 kg/m²/h) within 0.05", () => {
    // ACI 305R-20 Fig. (evaporation nomograph) worked example; Uno 1998, ACI Mater. J. 95, 365.
    const e = unoEvaporationKgPerM2H({ concreteTemperatureC: 30, airTemperatureC: 30, relativeHumidityPercent: 50, windSpeedKmH: 16 });
    expectReference({
      id: "evaporation-aci305-example",
      quantity: "Evaporation rate of bleed water",
      conditions: "concrete and air 30 °C, RH 50 %, wind 16 km/h",
      source: "ACI 305R-20 evaporation nomograph worked example; Uno 1998, ACI Mater. J. 95, 365",
      reference: 0.8,
      computed: e,
      tolerance: 0.05,
      unit: "kg/m²/h",
    });
  });

  it("is zero with saturated air at the concrete temperature (no vapour-pressure difference)", () => {
    expect(unoEvaporationKgPerM2H({ concreteTemperatureC: 20, airTemperatureC: 20, relativeHumidityPercent: 100, windSpeedKmH: 30 })).toBeCloseTo(0, 12);
  });

  it("rises with wind speed and with concrete warmer than the air", () => {
    const base = { concreteTemperatureC: 25, airTemperatureC: 25, relativeHumidityPercent: 60, windSpeedKmH: 10 };
    const e = unoEvaporationKgPerM2H(base);
    expect(unoEvaporationKgPerM2H({ ...base, windSpeedKmH: 30 })).toBeGreaterThan(e);
    expect(unoEvaporationKgPerM2H({ ...base, concreteTemperatureC: 32 })).toBeGreaterThan(e);
  });
});
