import type { SpeciesAtTemperature } from "../equilibrium/types";
import { liquidWaterMaximumTemperatureK, liquidWaterMinimumTemperatureK } from "../thermo/liquid-water-range";
import { gasConstantJPerMolK } from "../thermo/physical-constants";
import { apparentGibbsJPerMol } from "../thermo/standard-gibbs";
import { ThermoInputError } from "../thermo/thermo-error";
import type { Dataset, LoadedSpecies } from "./dataset";
import { vanTHoffLog10K } from "./van-t-hoff-log-k";

export type SpeciesAtTemperatureError =
  | { code: "temperature_out_of_range"; field: "temperatureK"; temperatureK: number; minimumK: number; maximumK: number; message: string }
  | { code: "missing_reference"; speciesId: string; missingId: string; message: string }
  | { code: "reaction_cycle"; cycle: string[]; message: string }
  | { code: "thermo_input"; speciesId: string; field: string; message: string };

export type SpeciesAtTemperatureResult = { ok: true; value: readonly SpeciesAtTemperature[] } | { ok: false; error: SpeciesAtTemperatureError };

/** Thrown by `speciesAtTemperature`; `detail` holds the typed error. */
export class SpeciesAtTemperatureFailure extends Error {
  constructor(readonly detail: SpeciesAtTemperatureError) {
    super(detail.message);
    this.name = "SpeciesAtTemperatureFailure";
  }
}

/** Most temperatures kept per data-set version before the cache is emptied (a sweep rarely needs more). */
const maximumCachedTemperatures = 512;
const cache = new Map<string, SpeciesAtTemperatureResult>();
/**
 * Engine species of self-contained entries (formation data with a heat capacity) per entry object and T: their G(T)
 * depends on nothing else, so data sets that share entry objects (the Monte Carlo samples of `sampleDataset` share
 * every aqueous entry with the data set they come from) evaluate each such entry once per temperature. Entries are
 * treated as immutable, as everywhere in the data layer; reaction entries are always re-resolved.
 */
const entryCache = new WeakMap<LoadedSpecies, Map<number, SpeciesAtTemperature>>();

/**
 * Every data-set entry as the engine's `SpeciesAtTemperature` at T (273.15–373.15 K, 1 bar).
 *
 * Entries with formation data and a heat capacity: G(T) = `apparentGibbsJPerMol` (Benson–Helgeson
 * convention, `lib/thermo/standard-gibbs.ts`); they take precedence when an entry also has `logK`.
 * Entries defined by a reaction `1 (this) = Σ ν_i (i)`:
 *   G_this(T) = Σ ν_i G_i(T) + R·T·ln10·log10 K(T),
 * with log10 K(T) from `vanTHoffLog10K` (constant ΔrH°, ΔrCp°). Reaction entries are resolved in
 * dependency order; a cycle or a reference to an absent id is a typed error. Results are cached per
 * (data-set version, T) and frozen: do not mutate them.
 */
export function speciesAtTemperatureResult(dataset: Dataset, temperatureK: number): SpeciesAtTemperatureResult {
  if (!Number.isFinite(temperatureK) || temperatureK < liquidWaterMinimumTemperatureK || temperatureK > liquidWaterMaximumTemperatureK) {
    return {
      ok: false,
      error: {
        code: "temperature_out_of_range",
        field: "temperatureK",
        temperatureK,
        minimumK: liquidWaterMinimumTemperatureK,
        maximumK: liquidWaterMaximumTemperatureK,
        message: `temperatureK = ${temperatureK} K is outside the data range ${liquidWaterMinimumTemperatureK}–${liquidWaterMaximumTemperatureK} K (0–100 °C)`,
      },
    };
  }
  const key = `${dataset.version}|${temperatureK}`;
  const cached = cache.get(key);
  if (cached) return cached;
  const result = compute(dataset, temperatureK);
  if (cache.size >= maximumCachedTemperatures) cache.clear();
  cache.set(key, result);
  return result;
}

/** As `speciesAtTemperatureResult`, for trusted data; throws `SpeciesAtTemperatureFailure` on error. */
export function speciesAtTemperature(dataset: Dataset, temperatureK: number): SpeciesAtTemperature[] {
  const result = speciesAtTemperatureResult(dataset, temperatureK);
  if (!result.ok) throw new SpeciesAtTemperatureFailure(result.error);
  return result.value as SpeciesAtTemperature[];
}

class ResolutionError extends Error {
  constructor(readonly detail: SpeciesAtTemperatureError) {
    super(detail.message);
  }
}

function compute(dataset: Dataset, temperatureK: number): SpeciesAtTemperatureResult {
  const byId = new Map(dataset.species.map((s) => [s.id, s]));
  const gibbs = new Map<string, number>();
  const visiting: string[] = [];
  const rtLn10JPerMol = gasConstantJPerMolK * temperatureK * Math.LN10;

  const resolve = (species: LoadedSpecies): number => {
    const known = gibbs.get(species.id);
    if (known !== undefined) return known;
    let gibbsJPerMol: number;
    const cachedEntry = entryCache.get(species)?.get(temperatureK);
    if (cachedEntry) gibbsJPerMol = cachedEntry.gibbsJPerMol;
    else if (species.standard && species.heatCapacity) {
      try {
        gibbsJPerMol = apparentGibbsJPerMol({ standard: species.standard, heatCapacity: species.heatCapacity }, temperatureK);
      } catch (caught) {
        if (caught instanceof ThermoInputError) {
          throw new ResolutionError({ code: "thermo_input", speciesId: species.id, field: caught.field, message: `${species.id}: ${caught.message}` });
        }
        throw caught;
      }
    } else if (species.logK) {
      const start = visiting.indexOf(species.id);
      if (start >= 0) {
        const cycle = [...visiting.slice(start), species.id];
        throw new ResolutionError({ code: "reaction_cycle", cycle, message: `reaction definitions form a cycle: ${cycle.join(" → ")}` });
      }
      visiting.push(species.id);
      let sumJPerMol = 0;
      for (const [id, coefficient] of Object.entries(species.logK.reaction)) {
        const reference = byId.get(id);
        if (!reference) {
          throw new ResolutionError({
            code: "missing_reference",
            speciesId: species.id,
            missingId: id,
            message: `the reaction of "${species.id}" names "${id}", which is not in the data set`,
          });
        }
        sumJPerMol += coefficient * resolve(reference);
      }
      visiting.pop();
      gibbsJPerMol = sumJPerMol + rtLn10JPerMol * vanTHoffLog10K(species.logK, temperatureK);
    } else {
      // The schema guarantees one of the two definitions; a hand-built Dataset may not.
      throw new ResolutionError({ code: "thermo_input", speciesId: species.id, field: "standard", message: `${species.id} has neither formation data with a heat capacity nor a logK reaction` });
    }
    gibbs.set(species.id, gibbsJPerMol);
    return gibbsJPerMol;
  };

  try {
    const value = dataset.species.map((species) => {
      const selfContained = species.standard !== undefined && species.heatCapacity !== undefined;
      let byTemperature = selfContained ? entryCache.get(species) : undefined;
      const known = byTemperature?.get(temperatureK);
      if (known) {
        gibbs.set(species.id, known.gibbsJPerMol);
        return known;
      }
      const engineSpecies = Object.freeze(toEngineSpecies(species, resolve(species)));
      if (selfContained) {
        if (!byTemperature) entryCache.set(species, (byTemperature = new Map()));
        if (byTemperature.size >= maximumCachedTemperatures) byTemperature.clear();
        byTemperature.set(temperatureK, engineSpecies);
      }
      return engineSpecies;
    });
    return { ok: true, value: Object.freeze(value) };
  } catch (caught) {
    if (caught instanceof ResolutionError) return { ok: false, error: caught.detail };
    throw caught;
  }
}

function toEngineSpecies(species: LoadedSpecies, gibbsJPerMol: number): SpeciesAtTemperature {
  const out: SpeciesAtTemperature = {
    id: species.id,
    phase: species.phase,
    elements: { ...species.elements },
    charge: species.charge,
    gibbsJPerMol,
    molarMassGPerMol: species.molarMassGPerMol,
  };
  if (species.solution !== undefined) out.solution = species.solution;
  if (species.molarVolumeCm3PerMol !== undefined) out.molarVolumeCm3PerMol = species.molarVolumeCm3PerMol;
  return out;
}
