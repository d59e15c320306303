import { binderTimeline, logarithmicAgesDays } from "../cement/binder-system";
import type { BulkComposition } from "../cement/bulk-composition";
import { hydratePaste, type HydratedPaste } from "../cement/hydrate-paste";
import { parrotKillohConstants } from "../cement/parrot-killoh";
import type { ReactionDegrees } from "../cement/reaction-degrees";
import type { ResolvedBinder } from "../cement/resolve-binder";
import type { Dataset } from "../data/dataset";
import { loadDataset } from "../data/load-dataset";
import type { EquilibriumFailure } from "../equilibrium/failure";
import type { SerializedState } from "../equilibrium/result";
import { WATER_MOLAR_MASS_KG_PER_MOL } from "../equilibrium/problem";
import { anhydrousReactantResolver } from "./anhydrous-enthalpy";
import { reactedBinder, type ReactantGroup, type ReactedBinderError, type UncoveredReactant } from "./reacted-binder";
import { SpeciesEnthalpyFailure, speciesEnthalpyResolver } from "./species-enthalpy";

/**
 * Heat of hydration from the enthalpies of the thermodynamic data set (issue 6).
 *
 * Method. Per 100 g binder at one age and curing temperature T, the heat released is the enthalpy of the
 * reactants less that of the products (Hess's law; e.g. Taylor 1997, Cement Chemistry, ch. 7):
 *
 *   Q(t) = [Σ_r n_r H_r(T) + n_w H_H2O(T)] − [Σ_p n_p H_p(T) + Σ_aq m_i W H_i(T) + n_w,free H_H2O(T) + Σ_X b_X (H_X+ + H_OH−)]
 *
 * - reactants r: the anhydrous solids that have reacted by age t (clinker phases by their Parrot–Killoh degrees,
 *   free lime, calcium and alkali sulfates, the MgO and alkalis in clinker solid solution, and the reactive part
 *   of each SCM times its degree; `reacted-binder.ts`), with H_r(T) from `lib/data/binders/anhydrous-enthalpies.json`;
 *   n_w is all the water of the mix (mixing water and LOI water), so the consumed water is counted and the water
 *   left in the pore solution cancels;
 * - products p: the equilibrium assemblage of `hydratePaste` (solid-solution members counted one by one), the pore
 *   solution (every species i at molality m_i in W kg of water, and the W/M_w mol of water) and the alkali X held
 *   in C-S-H by the distribution ratio, counted as dissolved X⁺ + OH⁻ (its enthalpy of sorption is not known and
 *   is neglected);
 * - H(T) are apparent standard enthalpies of formation at T (`apparentEnthalpyJPerMol`; reaction-defined entries by
 *   H_this = Σ ν_i H_i − ΔrH°(T), `species-enthalpy.ts`); excess enthalpies of the concentrated pore solution are
 *   neglected (standard-state values).
 * Unreacted binder is on both sides and drops out. Sign: Q > 0 is heat released (exothermic). Units: Q in J per g
 * of binder (the J per 100 g divided by 100).
 *
 * Mass and element balance are checked, not assumed: the elements of the reactants must equal the composition's
 * reacted elements, and those of the products (solids, dissolved species, solvent, bound alkali) must equal them too,
 * each to `elementBalanceRelativeTolerance`; otherwise a typed error.
 *
 * Accuracy (audited 2026-12-01 against calorimetric heats; figures in tests/curing/thermodynamic-heat.test.ts):
 * free lime, alite, belite and C3A (to C3AH6, ettringite or monosulfate) come within 1–6 % of Taylor (1997) or
 * Lerch & Bogue (1934); ferrite gives about 560–680 J/g of C4AF against the classic 420 J/g, a gap that Hess's law
 * with the tabulated ΔfH° of C4AF cannot close. A fully hydrated CEM I therefore gives about 544 J/g at 25 °C,
 * above the published 450–520 J/g, half of the excess from the ferrite and a third from the alite: the heat, and
 * the temperature rise it drives, errs high.
 */
/** How the element temperature model names this heat source. */
export const THERMODYNAMIC_HEAT_LABEL = "thermodynamic heat of hydration (enthalpy balance of reacted binder and equilibrium assemblage)";

export type ThermodynamicHeat = {
  temperatureC: number;
  /** Heat released per g binder, J/g (positive: exothermic). */
  heatJPerGBinder: number;
  /** Enthalpies of the two sides, J per 100 g binder. */
  reactantEnthalpyJ: number;
  productEnthalpyJ: number;
  /** Reactant-side enthalpy of each group, J per 100 g binder (a bookkeeping aid, not a share of the heat). */
  reactantEnthalpyByGroupJ: Partial<Record<ReactantGroup, number>>;
  /** Largest relative element residual of reactants vs composition and products vs composition. */
  elementBalanceResidual: { reactants: number; products: number };
};

export type ThermodynamicHeatError =
  | ReactedBinderError
  | { code: "enthalpy_unavailable"; uncovered: UncoveredReactant[]; message: string }
  | { code: "missing_enthalpy"; speciesId: string; message: string }
  | { code: "element_balance_not_closed"; side: "reactants" | "products"; element: string; expectedMol: number; foundMol: number; message: string }
  | { code: "equilibrium_failed"; ageDays?: number; failure: EquilibriumFailure; message: string };

export type ThermodynamicHeatResult = { ok: true; value: ThermodynamicHeat } | { ok: false; error: ThermodynamicHeatError };

/** Relative element-balance tolerance (the engine converges mass balance to about 1e-10; common practice margin). */
export const elementBalanceRelativeTolerance = 1e-6;
const kelvinOffset = 273.15;
const gramsPerBasis = 100; // the bulk composition is per 100 g binder

function addElements(into: Record<string, number>, elements: Record<string, number>, moles: number) {
  for (const [e, n] of Object.entries(elements)) into[e] = (into[e] ?? 0) + n * moles;
}

function worstResidual(expected: Record<string, number>, found: Record<string, number>): { element: string; residual: number } {
  let worst = { element: "", residual: 0 };
  for (const element of new Set([...Object.keys(expected), ...Object.keys(found)])) {
    const e = expected[element] ?? 0;
    const f = found[element] ?? 0;
    const residual = Math.abs(f - e) / Math.max(Math.abs(e), 1e-12);
    if (residual > worst.residual && Math.abs(f - e) > 1e-14) worst = { element, residual };
  }
  return worst;
}

/** Heat released by the paste at one age (see the module comment). */
export function thermodynamicHeatAtAge(args: {
  binder: ResolvedBinder;
  degrees: ReactionDegrees;
  composition: BulkComposition;
  paste: HydratedPaste;
  dataset?: Dataset;
}): ThermodynamicHeatResult {
  let dataset = args.dataset;
  if (!dataset) {
    const loaded = loadDataset();
    if (!loaded.ok) return { ok: false, error: { code: "missing_enthalpy", speciesId: "", message: loaded.error.message } };
    dataset = loaded.value;
  }
  const temperatureK = args.paste.temperatureC + kelvinOffset;
  const reacted = reactedBinder(args.binder, args.degrees);
  if (!reacted.ok) return reacted;
  if (reacted.value.uncovered.length > 0)
    return {
      ok: false,
      error: {
        code: "enthalpy_unavailable",
        uncovered: reacted.value.uncovered,
        message: `no enthalpy data for the reacted ${reacted.value.uncovered.map((u) => u.scmType).join(", ")}: the thermodynamic heat covers Portland cement, silica fume and limestone`,
      },
    };
  const expected = args.composition.reactedElementsMol as Record<string, number>;
  try {
    const reactant = anhydrousReactantResolver(dataset, temperatureK);
    const species = speciesEnthalpyResolver(dataset, temperatureK);
    const elementsOf = new Map(dataset.species.map((s) => [s.id, s.elements]));

    let reactantEnthalpyJ = 0;
    const byGroup: Partial<Record<ReactantGroup, number>> = {};
    const reactantElements: Record<string, number> = {};
    for (const r of reacted.value.reactants) {
      const data = reactant(r.id);
      reactantEnthalpyJ += r.mol * data.enthalpyJPerMol;
      byGroup[r.group] = (byGroup[r.group] ?? 0) + r.mol * data.enthalpyJPerMol;
      addElements(reactantElements, data.elements, r.mol);
    }

    let productEnthalpyJ = 0;
    const productElements: Record<string, number> = {};
    const addProduct = (id: string, moles: number) => {
      const elements = elementsOf.get(id);
      if (!elements) throw new SpeciesEnthalpyFailure({ code: "missing_species", speciesId: id, message: `product "${id}" is not in the data set` });
      productEnthalpyJ += moles * species(id);
      addElements(productElements, elements, moles);
    };
    const assemblage = args.paste.assemblage;
    for (const phase of assemblage.phases) for (const member of phase.members ?? [{ id: phase.id, moles: phase.moles }]) addProduct(member.id, member.moles);
    if (assemblage.solution) {
      const { waterKg } = assemblage.solution;
      for (const s of assemblage.solution.species) if (s.name !== "H2O(l)") addProduct(s.name, s.molality * waterKg);
      // The engine's own molar mass of water, so that the solvent moles match its mass balance.
      addProduct("H2O(l)", waterKg / WATER_MOLAR_MASS_KG_PER_MOL);
    }
    for (const [element, moles] of Object.entries(args.paste.alkaliInCshMol)) {
      addProduct(`${element}+`, moles);
      addProduct("OH-", moles);
    }
    // Gas exchanged with a reservoir (none in a sealed paste) would leave the balance open: count it as taken up.
    for (const [id, moles] of Object.entries(assemblage.gasUptakeMol)) addProduct(id, -moles);

    for (const [side, found] of [["reactants", reactantElements], ["products", productElements]] as const) {
      const worst = worstResidual(expected, found);
      if (worst.residual > elementBalanceRelativeTolerance)
        return {
          ok: false,
          error: {
            code: "element_balance_not_closed",
            side,
            element: worst.element,
            expectedMol: expected[worst.element] ?? 0,
            foundMol: found[worst.element] ?? 0,
            message: `the ${side} of the heat balance hold ${(found[worst.element] ?? 0).toPrecision(8)} mol ${worst.element} per 100 g binder, the paste ${(expected[worst.element] ?? 0).toPrecision(8)} mol`,
          },
        };
    }
    return {
      ok: true,
      value: {
        temperatureC: args.paste.temperatureC,
        heatJPerGBinder: (reactantEnthalpyJ - productEnthalpyJ) / gramsPerBasis,
        reactantEnthalpyJ,
        productEnthalpyJ,
        reactantEnthalpyByGroupJ: byGroup,
        elementBalanceResidual: { reactants: worstResidual(expected, reactantElements).residual, products: worstResidual(expected, productElements).residual },
      },
    };
  } catch (caught) {
    if (caught instanceof SpeciesEnthalpyFailure) return { ok: false, error: { code: "missing_enthalpy", speciesId: caught.detail.speciesId, message: caught.detail.message } };
    throw caught;
  }
}

export type HeatCurvePoint = {
  ageDays: number;
  /** Equivalent age at the curve's reference temperature (= the curing temperature of the calculation), h. */
  equivalentAgeH: number;
  /** Heat from the enthalpy balance, J/g binder. */
  heatJPerGBinder: number;
  /** Running maximum of the heat, floored at 0: the non-decreasing curve the element model needs, J/g binder. */
  cumulativeHeatJPerG: number;
};

export type ThermodynamicHeatCurve = {
  temperatureC: number;
  activationEnergyJPerMol: number;
  points: HeatCurvePoint[];
  /** Largest fall of the computed heat between successive ages (0 if it never falls), J/g: what the running maximum hides. */
  largestDecreaseJPerG: number;
  /** The curve as the curing input's `heatCurve` (equivalent age h, cumulative J/g), starting at (0, 0). */
  heatCurveInput: {
    points: { equivalentAgeH: number; cumulativeHeatJPerG: number }[];
    referenceTemperatureC: number;
    activationEnergyJPerMol: number;
  };
};

export type HeatCurveOptions = {
  /** Isothermal temperature of the calculation, °C; default 20 °C, the reference of the Parrot–Killoh constants. */
  temperatureC?: number;
  firstAgeDays?: number;
  lastAgeDays?: number;
  points?: number;
  /**
   * Activation energy that turns real time into equivalent age when the element is not at `temperatureC`, J/mol.
   * Default: the Parrot–Killoh activation energy of alite (Lothenbach et al. 2008, via `parrot-killoh-constants.json`),
   * the phase that releases most of the heat of a Portland cement; an approximation, as each phase has its own.
   */
  activationEnergyJPerMol?: number;
  dataset?: Dataset;
};

/** Defaults of the curve: 1 h to 1 year, 18 ages on a log axis (common practice for a heat curve; covers the 90-day curing horizon). */
export const heatCurveDefaults = { temperatureC: 20, firstAgeDays: 1 / 24, lastAgeDays: 365, points: 18 } as const;
/** Most ages a curve may ask for (each is an equilibrium calculation). */
export const heatCurveMaximumPoints = 60;
const hoursPerDay = 24;

/**
 * Heat against age at one isothermal curing temperature: reaction degrees from the binder model at each age
 * (`binderTimeline`), the assemblage by `hydratePaste` warm-started from the previous age (as `hydrationTimeline`
 * does), and the enthalpy balance of `thermodynamicHeatAtAge`. The curve is written in equivalent age at its own
 * temperature (te = t there), which the element-temperature model rescales by the Arrhenius factor at each node:
 * heat and temperature are coupled through the equivalent age.
 */
export function thermodynamicHeatCurve(binder: ResolvedBinder, options: HeatCurveOptions = {}): { ok: true; value: ThermodynamicHeatCurve } | { ok: false; error: ThermodynamicHeatError } {
  const temperatureC = options.temperatureC ?? heatCurveDefaults.temperatureC;
  const count = Math.min(heatCurveMaximumPoints, Math.max(2, Math.floor(options.points ?? heatCurveDefaults.points)));
  const ages = logarithmicAgesDays(options.firstAgeDays ?? heatCurveDefaults.firstAgeDays, options.lastAgeDays ?? heatCurveDefaults.lastAgeDays, count);
  const activationEnergyJPerMol = options.activationEnergyJPerMol ?? parrotKillohConstants.alite.activationEnergyJPerMol;
  let dataset = options.dataset;
  if (!dataset) {
    const loaded = loadDataset();
    if (!loaded.ok) return { ok: false, error: { code: "missing_enthalpy", speciesId: "", message: loaded.error.message } };
    dataset = loaded.value;
  }
  const timeline = binderTimeline(binder, ages, temperatureC);
  if (!timeline.ok) return { ok: false, error: timeline.error };
  const points: HeatCurvePoint[] = [];
  let warmStart: SerializedState | undefined;
  let alkaliBoundFraction: Record<string, number> | undefined;
  let runningMax = 0;
  let largestDecreaseJPerG = 0;
  let previous: number | undefined;
  for (const point of timeline.value) {
    const paste = hydratePaste(point.composition, { temperatureC, binderContentKgPerM3: binder.mix.binderContentKgPerM3, ageDays: point.ageDays, warmStart, alkaliBoundFraction, dataset });
    if (!paste.ok) return { ok: false, error: { code: "equilibrium_failed", ageDays: point.ageDays, failure: paste.error, message: `the equilibrium at age ${point.ageDays.toPrecision(3)} d failed: ${paste.error.code}` } };
    warmStart = paste.value.assemblage.state;
    const reacted = point.composition.reactedElementsMol;
    alkaliBoundFraction = Object.fromEntries(Object.entries(paste.value.alkaliInCshMol).map(([e, mol]) => [e, reacted[e as "Na" | "K"] > 0 ? mol / reacted[e as "Na" | "K"] : 0]));
    const heat = thermodynamicHeatAtAge({ binder, degrees: point.degrees, composition: point.composition, paste: paste.value, dataset });
    if (!heat.ok) return heat;
    const q = heat.value.heatJPerGBinder;
    if (previous !== undefined) largestDecreaseJPerG = Math.max(largestDecreaseJPerG, previous - q);
    previous = q;
    runningMax = Math.max(runningMax, q);
    points.push({ ageDays: point.ageDays, equivalentAgeH: point.ageDays * hoursPerDay, heatJPerGBinder: q, cumulativeHeatJPerG: runningMax });
  }
  return {
    ok: true,
    value: {
      temperatureC,
      activationEnergyJPerMol,
      points,
      largestDecreaseJPerG,
      heatCurveInput: {
        points: [{ equivalentAgeH: 0, cumulativeHeatJPerG: 0 }, ...points.map((p) => ({ equivalentAgeH: p.equivalentAgeH, cumulativeHeatJPerG: p.cumulativeHeatJPerG }))],
        referenceTemperatureC: temperatureC,
        activationEnergyJPerMol,
      },
    },
  };
}
