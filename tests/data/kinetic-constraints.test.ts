import { describe, it, expect } from "vitest";
import { constraintApplies, defaultSuppressedPhases, kineticConstraints, suppressedPhases } from "../../lib/data/kinetic-constraints";
import { loadDataset } from "../../lib/data/load-dataset";

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const solids = new Set(loaded.value.species.filter((s) => s.phase === "solid").map((s) => s.id));

describe("default kinetic constraints", () => {
  it("name only solids of the data set, each with a reason and a source", () => {
    for (const c of kineticConstraints()) {
      expect(solids.has(c.phase), c.phase).toBe(true);
      expect(c.reason.length).toBeGreaterThan(20);
      expect(c.source).toMatch(/\(\d{4}\)/);
    }
  });

  it("suppress quartz, hematite, goethite, dolomite and magnesite at every service temperature (Rimstidt & Barnes 1980; Dilnesa et al. 2014; Land 1998; Hänchen et al. 2008)", () => {
    for (const t of [0, 25, 85, 100]) expect(defaultSuppressedPhases(t)).toEqual(expect.arrayContaining(["quartz", "hematite", "goethite", "dolomite", "magnesite"]));
  });

  it("suppress hydrogarnets at 20 °C but allow them at 80 °C, where they form in heat-cured cement (Paul & Glasser 2000, Cem. Concr. Res. 30, 1869)", () => {
    expect(defaultSuppressedPhases(20)).toEqual(expect.arrayContaining(["katoite", "siliceous-hydrogarnet"]));
    expect(defaultSuppressedPhases(80)).not.toContain("katoite");
    expect(defaultSuppressedPhases(80)).not.toContain("siliceous-hydrogarnet");
  });

  it("keep thaumasite, aragonite and the Fe-siliceous hydrogarnet active where no age is given, the durability scenarios' long-term view (thaumasite is a thermodynamic phase at low temperature, Schmidt et al. 2008; Fe-siliceous hydrogarnet observed at 20 °C, Dilnesa et al. 2014)", () => {
    for (const t of [5, 25]) {
      expect(defaultSuppressedPhases(t)).not.toContain("thaumasite");
      expect(defaultSuppressedPhases(t)).not.toContain("aragonite");
      expect(defaultSuppressedPhases(t)).not.toContain("fe-siliceous-hydrogarnet");
    }
  });

  it("suppress thaumasite in a paste younger than 28 days, not at 28 days or later (slow formation: Bensted 1999; Crammond 2003)", () => {
    expect(defaultSuppressedPhases(5, 1)).toContain("thaumasite");
    expect(defaultSuppressedPhases(5, 28)).not.toContain("thaumasite");
    expect(suppressedPhases(5, { ageDays: 7 })).toContain("thaumasite");
    expect(suppressedPhases(5, { ageDays: 7, enable: ["thaumasite"] })).not.toContain("thaumasite");
    // An age bound applies only where the age is known.
    const ageBound = { phase: "x", reason: "a reason long enough", source: "s (2000)", whenAgeDaysBelow: 28 };
    expect(constraintApplies(ageBound, 20)).toBe(false);
    expect(constraintApplies(ageBound, 20, 27.9)).toBe(true);
  });

  it("apply a temperature bound strictly (50 °C is not below 50 °C)", () => {
    expect(constraintApplies({ phase: "x", reason: "a reason long enough", source: "s (2000)", whenTemperatureCBelow: 50 }, 50)).toBe(false);
    expect(constraintApplies({ phase: "x", reason: "a reason long enough", source: "s (2000)", whenTemperatureCAbove: 50 }, 50.1)).toBe(true);
  });

  it("let a calculation enable a default-suppressed phase or suppress another", () => {
    const phases = suppressedPhases(25, { enable: ["quartz"], suppress: ["thaumasite"] });
    expect(phases).not.toContain("quartz");
    expect(phases).toContain("thaumasite");
    expect(phases).toContain("hematite");
  });

  it("reject a temperature that is not a finite number, naming the field", () => {
    expect(() => defaultSuppressedPhases(Number.NaN)).toThrow(/temperatureC/);
  });
});
