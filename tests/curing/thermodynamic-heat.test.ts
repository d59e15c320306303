import { describe, it, expect } from "vitest";
import { binderSystemFromInput, binderTimeline } from "../../lib/cement/binder-system";
import { partitionCementOxides } from "../../lib/cement/clinker-partition";
import { hydratePaste } from "../../lib/cement/hydrate-paste";
import { perPhaseHeatJPerG } from "../../lib/curing/per-phase-heat";
import { thermodynamicHeatAtAge, thermodynamicHeatCurve } from "../../lib/curing/thermodynamic-heat";
import { parseCuringInput } from "../../lib/schema/curing-input";
import cementPresets from "../../lib/data/binders/cement-presets.json";
import { expectReference } from "../support/reference-check";
import { molarMassGPerMol } from "../../lib/chem/atomic-weights";
import { parseFormulaOrThrow } from "../../lib/chem/formula";
import { loadDataset } from "../../lib/data/load-dataset";
import { anhydrousReactantResolver } from "../../lib/curing/anhydrous-enthalpy";
import { speciesEnthalpyResolver } from "../../lib/curing/species-enthalpy";

const fullReaction = { mode: "degrees", clinkerDegrees: { alite: 1, belite: 1, aluminate: 1, ferrite: 1 } } as const;
const mix = { waterBinderRatio: 0.5, binderContentKgPerM3: 350 };

type PasteOptions = { waterBinderRatio?: number; enable?: readonly string[] };

function system(input: Record<string, unknown>, waterBinderRatio = mix.waterBinderRatio) {
  const s = binderSystemFromInput({ mix: { ...mix, waterBinderRatio }, age: fullReaction, ...input });
  if (!s.ok) throw new Error(JSON.stringify(s.error));
  return s.value;
}

function heatOf(input: Record<string, unknown>, temperatureC = 25, options: PasteOptions = {}) {
  const s = system(input, options.waterBinderRatio);
  const paste = hydratePaste(s.composition, { temperatureC, binderContentKgPerM3: mix.binderContentKgPerM3, enable: options.enable });
  if (!paste.ok) throw new Error(JSON.stringify(paste.error));
  return thermodynamicHeatAtAge({ binder: s.binder, degrees: s.degrees, composition: s.composition, paste: paste.value });
}

function heatJPerG(input: Record<string, unknown>, temperatureC = 25, options: PasteOptions = {}): number {
  const h = heatOf(input, temperatureC, options);
  if (!h.ok) throw new Error(JSON.stringify(h.error));
  return h.value.heatJPerGBinder;
}

const molarMass = (formula: string) => molarMassGPerMol(parseFormulaOrThrow(formula).elements);
const c3aGPerMol = molarMass("Ca3Al2O6");
const gypsumGPerMol = molarMass("CaSO4(H2O)2");

/** Heat per g of `phase` of a mixture given in grams (normalised to the 100 g basis). */
function heatPerGramOf(phase: string, massesG: Record<string, number>, options: PasteOptions = {}): number {
  const totalG = Object.values(massesG).reduce((sum, g) => sum + g, 0);
  const phasesMassPercent = { alite: 0, belite: 0, aluminate: 0, ferrite: 0, ...Object.fromEntries(Object.entries(massesG).map(([id, g]) => [id, (100 * g) / totalG])) };
  return heatJPerG({ cement: { kind: "phases", phasesMassPercent } }, 25, options) / (massesG[phase] / totalG);
}

const pure = (phase: string) => ({ kind: "phases", phasesMassPercent: { alite: 0, belite: 0, aluminate: 0, ferrite: 0, [phase]: 100 } });
const cemI = { cement: { kind: "preset", presetId: "en197-cem-i" } };

/** Per-phase mass fractions of the CEM I preset (the exact partition of its analysis) for the classic check. */
function cemIPhaseFractions() {
  const preset = cementPresets.presets.find((p) => p.id === "en197-cem-i")!;
  const oxides = preset.cement!.oxidesMassPercent!;
  const partition = partitionCementOxides(oxides);
  if (!partition.ok) throw new Error("partition");
  const g = partition.value.phasesG;
  return { C3S: g.alite! / 100, C2S: g.belite! / 100, C3A: g.aluminate! / 100, C4AF: g.ferrite! / 100, SO3: oxides.SO3 / 100, freeCaO: (g["free-lime"] ?? 0) / 100, MgO: oxides.MgO / 100 };
}

describe("thermodynamic heat of hydration: balances", () => {
  it("closes the element balance of the reactants and of the products (solids, pore solution, alkali in C-S-H) against the paste at every age", () => {
    const s = binderSystemFromInput({ ...cemI, mix, age: { mode: "age", ageDays: 28, curingTemperatureC: 20 } });
    if (!s.ok) throw new Error();
    const timeline = binderTimeline(s.value.binder, [0.1, 1, 7, 90], 20);
    if (!timeline.ok) throw new Error();
    for (const point of timeline.value) {
      const paste = hydratePaste(point.composition, { temperatureC: 20, binderContentKgPerM3: 350 });
      if (!paste.ok) throw new Error();
      const heat = thermodynamicHeatAtAge({ binder: s.value.binder, degrees: point.degrees, composition: point.composition, paste: paste.value });
      if (!heat.ok) throw new Error(JSON.stringify(heat.error));
      // Mass conservation is exact bookkeeping (common practice: to the engine's mass-balance tolerance).
      expect(heat.value.elementBalanceResidual.reactants).toBeLessThan(1e-9);
      expect(heat.value.elementBalanceResidual.products).toBeLessThan(1e-9);
    }
  });

  it("releases heat (positive sign) that grows with the reaction degree", () => {
    const partly = heatJPerG({ ...cemI, age: { mode: "degrees", clinkerDegrees: { alite: 0.5, belite: 0.3, aluminate: 0.6, ferrite: 0.4 } } });
    const full = heatJPerG(cemI);
    expect(partly).toBeGreaterThan(0);
    expect(full).toBeGreaterThan(partly);
  });
});

describe("thermodynamic heat of hydration: pure phases against calorimetric heats", () => {
  it("gives the heat of slaking free lime (CaO + H2O → Ca(OH)2) within 3 % of Taylor's 1166 J/g", () => {
    expectReference({
      id: "heat-free-lime-25C",
      quantity: "Heat of hydration of CaO to portlandite",
      conditions: "25 °C, complete reaction, w/b 0.5",
      source: "Taylor 1997, Cement Chemistry 2nd ed., ch. 7 (enthalpies of hydration of the pure phases), from memory",
      reference: 1166,
      computed: heatJPerG({ cement: pure("freeLime") }),
      tolerance: 0.03,
      relative: true,
      unit: "J/g",
    });
  });

  it("follows Kirchhoff's law for the lime slaking between 25 and 40 °C (ΔCp ≈ −29.8 J/(mol K) from CODATA/NBS heat capacities)", () => {
    // Cp at 298 K: Ca(OH)2 87.5, CaO 42.0, H2O(l) 75.3 J/(mol K) (Wagman et al. 1982 NBS tables, from memory):
    // Q(40) − Q(25) = −ΔCp·15 K / M(CaO) = 29.8·15/56.08 ≈ 8.0 J/g.
    const rise = heatJPerG({ cement: pure("freeLime") }, 40) - heatJPerG({ cement: pure("freeLime") }, 25);
    expect(rise).toBeGreaterThan(8.0 - 2);
    expect(rise).toBeLessThan(8.0 + 2);
  });

  it("gives the heat of alite to C-S-H and portlandite within 10 % of Taylor's 517 J/g", () => {
    expectReference({
      id: "heat-alite-25C",
      quantity: "Heat of complete hydration of C3S",
      conditions: "25 °C, w/b 0.5, products from the equilibrium (C-S-H of the four-end-member solution, portlandite)",
      source: "Taylor 1997, Cement Chemistry 2nd ed., ch. 7, from memory",
      reference: 517,
      computed: heatJPerG({ cement: pure("alite") }),
      tolerance: 0.1,
      relative: true,
      unit: "J/g",
    });
  });

  it("gives the heat of belite within 10 % of Taylor's 262 J/g", () => {
    expectReference({
      id: "heat-belite-25C",
      quantity: "Heat of complete hydration of beta-C2S",
      conditions: "25 °C, w/b 0.5",
      source: "Taylor 1997, Cement Chemistry 2nd ed., ch. 7, from memory",
      reference: 262,
      computed: heatJPerG({ cement: pure("belite") }),
      tolerance: 0.1,
      relative: true,
      unit: "J/g",
    });
  });

  // The aluminate checks run at w/b 0.8 so that water does not run out before the water-rich products form
  // (ettringite binds 32 H2O per C3A); the heat per g of C3A is that of the whole mixture over its C3A content,
  // so the gypsum's part of the reaction is counted, as in the cited tables.
  it("gives the heat of C3A to the hydrogarnet C3AH6 (hydrogarnet allowed) within 5 % of Lerch & Bogue's 866 J/g", () => {
    expectReference({
      id: "heat-aluminate-c3ah6-25C",
      quantity: "Heat of complete hydration of C3A alone (C3A + 6 H → C3AH6)",
      conditions: "25 °C, w/b 0.5, katoite enabled (the default constraint suppresses it below 50 °C)",
      source: "Lerch & Bogue 1934, J. Res. NBS 12, 645, C3A 207 cal/g = 866 J/g, as compiled by Bogue 1947, from memory",
      reference: 866,
      computed: heatJPerG({ cement: pure("aluminate") }, 25, { enable: ["katoite"] }),
      tolerance: 0.05,
      relative: true,
      unit: "J/g",
    });
  });

  it("gives the heat of C3A with three gypsum to ettringite within 5 % of Taylor's 1672 J/g of C3A", () => {
    expectReference({
      id: "heat-aluminate-ettringite-25C",
      quantity: "Heat of C3A + 3 CaSO4·2H2O + 26 H2O → ettringite, per g C3A",
      conditions: "25 °C, w/b 0.8, gypsum/C3A 3 mol/mol",
      source: "Taylor 1997, Cement Chemistry 2nd ed., ch. 7 (enthalpies of hydration of the pure phases), from memory",
      reference: 1672,
      computed: heatPerGramOf("aluminate", { aluminate: c3aGPerMol, gypsum: 3 * gypsumGPerMol }, { waterBinderRatio: 0.8 }),
      tolerance: 0.05,
      relative: true,
      unit: "J/g",
    });
  });

  it("gives the heat of C3A with one gypsum to monosulfate within 10 % of Taylor's 1144 J/g of C3A", () => {
    expectReference({
      id: "heat-aluminate-monosulfate-25C",
      quantity: "Heat of C3A + CaSO4·2H2O + water → monosulfate, per g C3A",
      conditions: "25 °C, w/b 0.8, gypsum/C3A 1 mol/mol (the equilibrium gives monosulfate-14)",
      source: "Taylor 1997, Cement Chemistry 2nd ed., ch. 7 (the AFm route of the C3A value in lib/data/curing/clinker-phase-heats.json), from memory",
      reference: 1144,
      computed: heatPerGramOf("aluminate", { aluminate: c3aGPerMol, gypsum: gypsumGPerMol }, { waterBinderRatio: 0.8 }),
      tolerance: 0.1,
      relative: true,
      unit: "J/g",
    });
  });

  // KNOWN DEVIATION (audited 2026-12-01, not tuned). Target: Taylor 1997 418 J/g (Lerch & Bogue 1934 420 J/g).
  // The data give 609 J/g for C4AF alone (C4AH13 + gibbsite + ferrihydrite + portlandite) and about 563 J/g
  // by Taylor's own route C4AF + 2 CH + 10 H → C3AH6 + C3FH6 (both hydrogarnets enabled; the slaking of the
  // CaO that supplies the CH is subtracted), so the product assumption is not the cause. Hess's law says why:
  // with ΔfH°(C4AF) = −5080.2 kJ/mol (NBS 1982, lib/data/binders/anhydrous-enthalpies.json), C4AF lies only
  // 31.3 kJ/mol below C3A + CaO + Fe2O3, so any route to Ca-rich hydrates releases about the C3A heat plus
  // the slaking of one CaO: 234 + 67 − 31 ≈ 270 kJ/mol ≈ 555 J/g, with Lerch & Bogue's own C3A (866 J/g)
  // and CaO (1186 J/g) values and the Fe part near thermoneutral (Fe2O3 + 3 H2O → 2 Fe(OH)3: +6.6 kJ/mol here).
  // The classic 418 J/g (203 kJ/mol) would need ΔfH°(C4AF) about 65–130 kJ/mol more negative than the tabulated
  // value, i.e. a formation enthalpy from the oxides of about −105 to −165 kJ/mol against −38.6 (−43.3 for C2F,
  // Robie & Hemingway 1995). The deviation sits in the classic ferrite heat or in ΔfH°(C4AF), not in the bookkeeping.
  // Re-audited 2026-12-01 (second pass): ΔfH°(C4AF) is per Ca4Al2Fe2O10 (485.96 g/mol, −10454 J/g; −38.6 kJ/mol
  // from the oxides, as for C2F); with the ΔfG° −4786.5 kJ/mol and S° 326.3 J/(mol K) recalled beside it (from
  // memory) it implies S° 318 J/(mol K), consistent to 2.4 kJ/mol, so no 70–120 kJ/mol slip. The Fe product does
  // not matter either: from hematite (+ the CH, gypsum, silica and water its formula needs) ferrihydrite takes up
  // 6.6 kJ/mol Fe2O3, C3FH6 releases 3.7, Fe-siliceous hydrogarnet 36, Fe-monosulfate 39, Fe-ettringite 178;
  // hematite and goethite are suppressed by default. C4AF alone at w/b 0.5 binds all the water (no pore solution
  // is left: 16 H2O per C4AF to C4AH13 + 2 Fe(OH)3 against 13.5 available), still 609 J/g; at w/b 0.8 672 J/g.
  // The least exothermic route in the data, C4AF + 10 H → 4 CH + 2 AH3 + 2 Fe(OH)3, gives 524 J/g (test below).
  const ferriteAloneJPerG = heatJPerG({ cement: pure("ferrite") });
  const ferriteHydrogarnetRouteJPerG = (() => {
    const ferriteG = molarMass("Ca4Al2Fe2O10");
    const limeG = 2 * molarMass("CaO");
    const both = heatJPerG({ cement: { kind: "phases", phasesMassPercent: { alite: 0, belite: 0, aluminate: 0, ferrite: (100 * ferriteG) / (ferriteG + limeG), freeLime: (100 * limeG) / (ferriteG + limeG) } } }, 25, { enable: ["katoite", "fe-katoite"] });
    const slakingJPerG = heatJPerG({ cement: pure("freeLime") });
    return (both * (ferriteG + limeG) - slakingJPerG * limeG) / ferriteG;
  })();

  it.fails("gives the heat of ferrite within 15 % of Taylor's 418 J/g (KNOWN DEVIATION: about 609 J/g, +46 %)", () => {
    expectReference({
      id: "heat-ferrite-25C",
      quantity: "Heat of complete hydration of C4AF",
      conditions: "25 °C, w/b 0.5",
      source: "Taylor 1997, Cement Chemistry 2nd ed., ch. 7, from memory",
      reference: 418,
      computed: ferriteAloneJPerG,
      tolerance: 0.15,
      relative: true,
      unit: "J/g",
    });
  });

  it("KNOWN DEVIATION support (Hess's law): ΔfH° of C4AF is per Ca4Al2Fe2O10, and no product route of the data comes within 15 % of Taylor's 418 J/g", () => {
    const loaded = loadDataset();
    if (!loaded.ok) throw new Error(loaded.error.message);
    const anhydrous = anhydrousReactantResolver(loaded.value, 298.15);
    const hydrate = speciesEnthalpyResolver(loaded.value, 298.15);
    const h = (id: string) => (["ferrite", "free-lime", "corundum", "hematite", "water"].includes(id) ? anhydrous(id).enthalpyJPerMol : hydrate(id));
    // Formula unit: a clinker phase lies a few tens of kJ/mol below its oxides (C2F −43 kJ/mol, C3A −7 kJ/mol,
    // Robie & Hemingway 1995, from memory); a value per Ca2AlFeO5, or kcal read as kJ, would be off by thousands.
    const fromOxidesJPerMol = h("ferrite") - (4 * h("free-lime") + h("corundum") + h("hematite"));
    expect(fromOxidesJPerMol).toBeLessThan(0);
    expect(fromOxidesJPerMol).toBeGreaterThan(-100e3);
    // Heat of C4AF + n H2O (+ CH) → products, J per g C4AF, for the classic products and the least stable ones.
    const ferriteG = molarMass("Ca4Al2Fe2O10");
    const route = (reactants: Record<string, number>, products: Record<string, number>) => {
      const sum = (side: Record<string, number>) => Object.entries(side).reduce((total, [id, n]) => total + n * h(id), 0);
      return (sum({ ferrite: 1, ...reactants }) - sum(products)) / ferriteG;
    };
    const routesJPerG = [
      route({ water: 10, portlandite: 2 }, { katoite: 1, "fe-katoite": 1 }), // Taylor's C6AFH12 route
      route({ water: 10 }, { katoite: 1, portlandite: 1, ferrihydrite: 2 }),
      route({ water: 16 }, { c4ah13: 1, ferrihydrite: 2 }),
      route({ water: 10 }, { portlandite: 4, gibbsite: 2, ferrihydrite: 2 }), // the least exothermic
    ];
    for (const q of routesJPerG) expect(q).toBeGreaterThan(418 * 1.15); // Taylor 1997 ch. 7, from memory
  });

  it("KNOWN DEVIATION pin: ferrite gives 580–640 J/g alone and 530–600 J/g by the hydrogarnet route, both far above the classic 418–420 J/g", () => {
    // What the code gives (see the comment above for the target and the reason); a change of the bookkeeping or
    // of the Fe/Al hydrate data moves these and must update the comment.
    expect(ferriteAloneJPerG).toBeGreaterThan(580);
    expect(ferriteAloneJPerG).toBeLessThan(640);
    expect(ferriteHydrogarnetRouteJPerG).toBeGreaterThan(530);
    expect(ferriteHydrogarnetRouteJPerG).toBeLessThan(600);
  });
});

describe("thermodynamic heat of hydration: ordinary Portland cement (issue 6 acceptance)", () => {
  // KNOWN DEVIATION (audited 2026-12-01, not tuned). Target: 450–520 J/g for a fully hydrated ordinary Portland
  // cement (Taylor 1997; Lerch & Bogue 1934), and the per-phase sums 481 J/g (Taylor set) and 470 J/g (Lerch &
  // Bogue set) for this preset. The CEM I preset gives 537.2 J/g at 25 °C with the four-end-member C-S-H of Kulik
  // (2011), the default since 2026-12-02 (543.5 J/g with the earlier two-end-member C-S-H). Decomposition, J per g
  // cement (tests/curing/fixtures/heat-decomposition.ts, rerun 2026-12-02): the increment of each clinker phase
  // averaged over the 24 orders of adding the four phases (increments are not additive otherwise), with the MgO held
  // in the clinker (1.8 %, reacting with the clinker) split off at its periclase → brucite heat, 920 J/g:
  //   alite      299 (545 J/g C3S)   Taylor 284 (517)   excess +15
  //   belite      48 (285 J/g C2S)   Taylor  45 (262)   excess  +3
  //   aluminate   90 with the sulfate and calcite it binds;  Taylor 88 (1144, AFm route)  +2
  //   ferrite     69 (757 J/g C4AF)  Taylor  38 (418)   excess +31
  //   free lime, sulfate dissolution, calcite (no clinker reacted) 14; Taylor CaO 12     +2
  //   MgO         17                 Taylor  15 (841)   excess  +2
  // Over half the excess is the ferrite (see the ferrite comment above: the classic ferrite heat is not reproducible
  // by Hess's law from the tabulated ΔfH° of C4AF) and a quarter the alite (C3S 538 J/g alone against 500–517:
  // 5 kJ/mol on a 118 kJ/mol reaction heat, within the uncertainty of ΔfH° of C3S and of the C-S-H end-members).
  // No bookkeeping error was found: water (mixing + LOI) cancels against the pore solution and hydrate water by
  // element balance, both sides are at 25 °C, and the calcium sulfate is counted as the partition gives it
  // (anhydrite + LOI water as liquid: 4 J/g more than gypsum would give).
  const cemITotalJPerG = heatJPerG(cemI);
  const cemIWithoutFerriteJPerG = heatJPerG({ ...cemI, age: { mode: "degrees", clinkerDegrees: { alite: 1, belite: 1, aluminate: 1, ferrite: 0 } } });
  const cemIFerriteJPerGFerrite = (cemITotalJPerG - cemIWithoutFerriteJPerG) / cemIPhaseFractions().C4AF;

  it.fails("puts the total heat of a fully hydrated ordinary Portland cement in the published 450–520 J/g range (KNOWN DEVIATION: about 537 J/g)", () => {
    expectReference({
      id: "heat-opc-total-25C",
      quantity: "Total heat of complete hydration of an ordinary Portland cement",
      conditions: "CEM I preset (typical), 25 °C, w/b 0.5, all clinker reacted",
      source: "Taylor 1997, Cement Chemistry 2nd ed., ch. 7; Lerch & Bogue 1934, J. Res. NBS 12, 645 (totals about 450-520 J/g), from memory",
      reference: 485,
      computed: cemITotalJPerG,
      tolerance: 35,
      unit: "J/g",
    });
  });

  it("KNOWN DEVIATION pin: the fully hydrated CEM I gives 525–555 J/g, above the published range by the ferrite and alite excesses", () => {
    // 537.2 J/g with the four-end-member C-S-H of Kulik (2011), the default since 2026-12-02 (543.5 J/g with the
    // earlier two-end-member C-S-H).
    // What the code gives (target and reason in the comment above); a change outside this band must update it.
    expect(cemITotalJPerG).toBeGreaterThan(525);
    expect(cemITotalJPerG).toBeLessThan(555);
  });

  it("agrees with the classic per-phase heat of Taylor (1997) within 15 %", () => {
    const classic = perPhaseHeatJPerG(cemIPhaseFractions(), 1, "taylor-1997");
    expectReference({
      id: "heat-opc-vs-taylor-per-phase",
      quantity: "Thermodynamic heat of a fully hydrated CEM I against the per-phase sum",
      conditions: "CEM I preset (typical), 25 °C, w/b 0.5",
      source: "Taylor 1997, Cement Chemistry 2nd ed., ch. 7 per-phase enthalpies (lib/data/curing/clinker-phase-heats.json), from memory",
      reference: classic,
      computed: cemITotalJPerG,
      tolerance: 0.15,
      relative: true,
      unit: "J/g",
    });
  });

  // 537.2 J/g is 14.3 % above the Lerch & Bogue sum (470 J/g), inside the 15 % of the issue (15.7 % with the earlier
  // two-end-member C-S-H, 543.5 J/g); the excess is the ferrite and alite of the decomposition above.
  it("agrees with the classic per-phase heat of Lerch & Bogue (1934) within 15 %", () => {
    const classic = perPhaseHeatJPerG(cemIPhaseFractions(), 1, "lerch-bogue");
    expectReference({
      id: "heat-opc-vs-lerch-bogue-per-phase",
      quantity: "Thermodynamic heat of a fully hydrated CEM I against the per-phase sum",
      conditions: "CEM I preset (typical), 25 °C, w/b 0.5",
      source: "Lerch & Bogue 1934, J. Res. NBS 12, 645, as compiled by Bogue 1947 (lib/data/curing/clinker-phase-heats.json), from memory",
      reference: classic,
      computed: cemITotalJPerG,
      tolerance: 0.15,
      relative: true,
      unit: "J/g",
    });
  });

  // KNOWN DEVIATION: the ferrite's increment in the cement (its Fe in Fe-siliceous hydrogarnet, which takes
  // portlandite and silica from the C-S-H, and its Al in carboaluminate AFm with the calcite) is about 681 J/g
  // C4AF, above even its stand-alone 609 J/g; target 420 J/g (reason in the ferrite comment above).
  it.fails("credits the ferrite of the CEM I with Lerch & Bogue's 420 J/g within 15 % (KNOWN DEVIATION: about 681 J/g)", () => {
    expectReference({
      id: "heat-opc-ferrite-increment-25C",
      quantity: "Heat added by the ferrite of the CEM I (with − without ferrite reacted), per g ferrite",
      conditions: "CEM I preset (typical), 25 °C, w/b 0.5, other clinker phases fully reacted",
      source: "Lerch & Bogue 1934, J. Res. NBS 12, 645, C4AF 100 cal/g = 420 J/g, as compiled by Bogue 1947, from memory",
      reference: 420,
      computed: cemIFerriteJPerGFerrite,
      tolerance: 0.15,
      relative: true,
      unit: "J/g",
    });
  });

  it("KNOWN DEVIATION pin: the ferrite of the CEM I adds 620–760 J/g of ferrite", () => {
    expect(cemIFerriteJPerGFerrite).toBeGreaterThan(620);
    expect(cemIFerriteJPerGFerrite).toBeLessThan(760);
  });
});

describe("thermodynamic heat of hydration: blends", () => {
  it("covers limestone (as calcite) and silica fume (as amorphous silica) with a closed balance", () => {
    const limestone = heatOf({ cement: { kind: "preset", presetId: "en197-cem-ii-a-ll" } });
    const fume = heatOf({ ...cemI, supplementaryMaterials: [{ type: "silica-fume", massPercentOfBinder: 8, composition: { kind: "preset", presetId: "silica-fume-typical" } }], age: { ...fullReaction, scmDegrees: { "silica-fume": 0.8 } } });
    for (const h of [limestone, fume]) {
      if (!h.ok) throw new Error(JSON.stringify(h.error));
      expect(h.value.elementBalanceResidual.products).toBeLessThan(1e-9);
    }
    // Limestone is nearly inert filler: 15 % of it lowers the heat per g binder roughly by dilution (common practice).
    if (!limestone.ok) throw new Error();
    expect(limestone.value.heatJPerGBinder).toBeLessThan(heatJPerG(cemI) * 0.92);
  });

  it("reports the heat of a slag blend as unavailable (no glass enthalpy in the data) instead of guessing", () => {
    const h = heatOf({ cement: { kind: "preset", presetId: "en197-cem-iii-a" }, age: { ...fullReaction, scmDegrees: { slag: 0.5 } } });
    expect(h.ok).toBe(false);
    if (h.ok) return;
    expect(h.error.code).toBe("enthalpy_unavailable");
    if (h.error.code !== "enthalpy_unavailable") return;
    expect(h.error.uncovered.map((u) => u.scmType)).toEqual(["slag"]);
  });
});

describe("thermodynamic heat curve", () => {
  const s = binderSystemFromInput({ ...cemI, mix, age: { mode: "age", ageDays: 28, curingTemperatureC: 20 } });
  if (!s.ok) throw new Error();
  const curve = thermodynamicHeatCurve(s.value.binder, { temperatureC: 20, points: 10, firstAgeDays: 1 / 24, lastAgeDays: 365 });

  it("is a valid heatCurve input of the curing model, starting at (0, 0) and never decreasing", () => {
    if (!curve.ok) throw new Error(JSON.stringify(curve.error));
    const parsed = parseCuringInput({
      element: { thicknessM: 1 },
      concrete: { binderKgPerM3: 350, waterBinderRatio: 0.5, fcm28MPa: 40 },
      cement: { phasesMassPercent: { C3S: 55, C2S: 17, C3A: 8, C4AF: 9 } },
      heatCurve: curve.value.heatCurveInput,
      placementTemperatureC: 20,
      ambient: { kind: "constant", temperatureC: 20 },
    });
    expect(parsed.ok).toBe(true);
    const pts = curve.value.heatCurveInput.points;
    expect(pts[0]).toEqual({ equivalentAgeH: 0, cumulativeHeatJPerG: 0 });
    for (let i = 1; i < pts.length; i++) expect(pts[i].cumulativeHeatJPerG).toBeGreaterThanOrEqual(pts[i - 1].cumulativeHeatJPerG);
  });

  it("matches the per-phase heat of Taylor (1997) evaluated with the same Parrot–Killoh degrees at 28 days within 15 %", () => {
    if (!curve.ok) throw new Error();
    const timeline = binderTimeline(s.value.binder, [28], 20);
    if (!timeline.ok) throw new Error();
    const d = timeline.value[0].degrees.clinker;
    const f = cemIPhaseFractions();
    // Free lime and sulfate react at once (bulk-composition.ts); MgO with alite.
    const classic = perPhaseHeatJPerG(f, { C3S: d.alite, C2S: d.belite, C3A: d.aluminate, C4AF: d.ferrite, SO3: 1, freeCaO: 1, MgO: d.alite }, "taylor-1997");
    const at28 = thermodynamicHeatCurve(s.value.binder, { temperatureC: 20, points: 2, firstAgeDays: 1, lastAgeDays: 28 });
    if (!at28.ok) throw new Error();
    const q = at28.value.points[1].heatJPerGBinder;
    expect(Math.abs(q - classic) / classic).toBeLessThan(0.15);
  });

  it("rises monotonically toward the fully hydrated heat: between 85 % and 100 % of it at one year", () => {
    // Parrot–Killoh degrees at one year at w/b 0.5 are 0.85-0.98 for the clinker phases (Lothenbach et al. 2008), from memory.
    if (!curve.ok) throw new Error();
    const last = curve.value.points[curve.value.points.length - 1].heatJPerGBinder;
    const full = heatJPerG(cemI, 20);
    expect(last / full).toBeGreaterThan(0.85);
    expect(last / full).toBeLessThanOrEqual(1.0);
    expect(curve.value.largestDecreaseJPerG).toBe(0);
  });
});
