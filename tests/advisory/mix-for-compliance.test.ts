import { describe, it, expect } from "vitest";
import { mixForCompliance } from "../../lib/advisory/mix-for-compliance";
import { checkCompliance } from "../../lib/advisory/exposure-compliance";
import { classifyExposure } from "../../lib/advisory/exposure-classes";
import { exposureInput } from "../../lib/schema/exposure-input";
import { specificationInput } from "../../lib/schema/specification-input";

const mix = { waterBinderRatio: 0.45, binderContentKgPerM3: 360 };

describe("the mix as the exposure-class comparison reads it", () => {
  it("takes the air content from the mix's air volume: 10 L/m³ is 1 % by volume (definition)", () => {
    expect(mixForCompliance({ mix: { ...mix, airVolume: { unit: "litresPerM3", value: 45 } }, supplementaryMaterials: [] }).airContentPercent).toBeCloseTo(4.5, 12);
    expect(mixForCompliance({ mix: { ...mix, airVolume: { unit: "fraction", value: 0.05 } }, supplementaryMaterials: [] }).airContentPercent).toBeCloseTo(5, 12);
    expect(mixForCompliance({ mix, supplementaryMaterials: [] }).airContentPercent).toBeUndefined();
  });

  it("counts slag and the pozzolans as 'pozzolan or slag cement' (ACI 318-19 Table 19.3.2.1), not calcareous fly ash or limestone", () => {
    const withType = (type: string) => mixForCompliance({ mix, supplementaryMaterials: [{ type, massPercentOfBinder: 20 }] }).withPozzolanOrSlag;
    expect(["slag", "siliceous-fly-ash", "silica-fume", "metakaolin", "natural-pozzolan"].map(withType)).toEqual([true, true, true, true, true]);
    expect(["calcareous-fly-ash", "limestone"].map(withType)).toEqual([false, false]);
    expect(mixForCompliance({ mix, supplementaryMaterials: [] }).withPozzolanOrSlag).toBe(false);
  });

  it("passes what the specification states and leaves out what it does not", () => {
    const m = mixForCompliance({ mix, specification: { strengthClass: "C35/45", sulfateResistance: "HS", calciumChlorideAdmixture: false }, supplementaryMaterials: [] });
    expect(m).toMatchObject({ strengthClass: "C35/45", sulfateResistanceDesignation: "HS", calciumChlorideAdmixture: false });
    expect("fckMPa" in m).toBe(false);
    expect("prestressed" in m).toBe(false);
  });
});

describe("the exposure-class comparison with a specification (EN 206 Annex F Table F.1; ACI 318-19 Table 19.3.2.1)", () => {
  // Groundwater with 1800 mg/L sulfate: EN 206 XA2 (> 600 and ≤ 3000 mg/L, Table 2); ACI 318 S2 (1500–10 000 ppm).
  const exposure = exposureInput.parse({ sulfateMgPerL: 1800, sulfateCation: "Na", wetting: "permanently-wet", serviceTemperatureC: 12, reinforced: false });
  const classes = classifyExposure(exposure);
  const itemsFor = (specification: object) => {
    const r = checkCompliance(mixForCompliance({ mix, specification: specificationInput.parse(specification), supplementaryMaterials: [] }), classes);
    return [...r.en206, ...r.aci318];
  };

  it("assesses the minimum strength: C25/30 fails XA2's C30/37 and S2's 31 MPa (meets F0, W1, C1's 17 MPa), C35/45 meets them all", () => {
    const strengthOf = (specification: object) => Object.fromEntries(itemsFor(specification).filter((i) => i.requirement === "min-strength").map((i) => [i.exposureClass, i.pass]));
    expect(strengthOf({ strengthClass: "C25/30" })).toEqual({ XA2: false, S2: false, F0: true, W1: true, C1: true });
    expect(strengthOf({ strengthClass: "C35/45" })).toEqual({ XA2: true, S2: true, F0: true, W1: true, C1: true });
    // A specified strength without a class: f'c 30 MPa meets XA2's fck 30 but not S2's 31.
    expect(strengthOf({ specifiedStrengthMPa: 30 })).toMatchObject({ XA2: true, S2: false });
  });

  it("assesses the binder: an HS binder meets the sulfate-resistance requirement of XA2 and S2, a binder without designation does not", () => {
    const hs = itemsFor({ sulfateResistance: "HS" }).filter((i) => i.requirement === "sulfate-resisting-binder");
    expect(hs.length).toBeGreaterThanOrEqual(2);
    expect(hs.every((i) => i.pass === true)).toBe(true);
    expect(itemsFor({ sulfateResistance: "none" }).filter((i) => i.requirement === "sulfate-resisting-binder").every((i) => i.pass === false)).toBe(true);
  });

  it("leaves strength and binder not assessed when the specification is silent", () => {
    const silent = itemsFor({}).filter((i) => i.requirement === "min-strength" || i.requirement === "sulfate-resisting-binder");
    expect(silent.length).toBeGreaterThan(0);
    expect(silent.every((i) => i.pass === null)).toBe(true);
  });

  it("refuses a strength class that EN 206 Table 12 does not have, naming the field", () => {
    const r = specificationInput.safeParse({ strengthClass: "C33/40" });
    expect(r.success).toBe(false);
    expect(!r.success && r.error.issues[0].message).toMatch(/^specification\.strengthClass must be one of C8\/10, .*C100\/115 \(EN 206 Table 12\)$/);
  });
});

describe("the non-compliance flag's actions", () => {
  it("say what to change for each kind of limit not met, with the governing value (EN 206 Table F.1 XA2: w/c 0.50, C30/37, 320 kg/m³)", () => {
    const exposure = exposureInput.parse({ sulfateMgPerL: 1800, sulfateCation: "Na", wetting: "permanently-wet", serviceTemperatureC: 12, reinforced: false });
    const poor = { waterBinderRatio: 0.6, binderContentKgPerM3: 280 };
    const r = checkCompliance(mixForCompliance({ mix: poor, specification: { strengthClass: "C25/30", sulfateResistance: "none" }, supplementaryMaterials: [] }), classifyExposure(exposure));
    const actions = r.flags.find((f) => f.id === "exposure-class-noncompliance")!.actions.join("\n");
    expect(actions).toMatch(/water\/binder ratio to 0\.45 or below/); // ACI 318 S2: 0.45 governs over XA2's 0.50
    expect(actions).toMatch(/strength of at least 31 MPa/); // ACI 318 S2 f'c 31 MPa over XA2's 30
    expect(actions).toMatch(/binder content to at least 320 kg\/m³/);
    expect(actions).toMatch(/SR cement/);
    expect(actions).not.toMatch(/air/i);
  });

  it("name only the limits not met: a mix failing w/cm alone gets no binder or strength action", () => {
    const exposure = exposureInput.parse({ sulfateMgPerL: 1800, sulfateCation: "Na", wetting: "permanently-wet", serviceTemperatureC: 12, reinforced: false });
    const r = checkCompliance(mixForCompliance({ mix: { waterBinderRatio: 0.48, binderContentKgPerM3: 360 }, specification: { strengthClass: "C35/45", sulfateResistance: "HS" }, supplementaryMaterials: [] }), classifyExposure(exposure));
    const actions = r.flags.find((f) => f.id === "exposure-class-noncompliance")!.actions;
    expect(actions[0]).toMatch(/0\.45 or below/);
    expect(actions.join("\n")).not.toMatch(/strength of at least|binder content to|SR cement/);
  });
});
