import type { Rng } from "../advisory/random";
import type { Dataset } from "../data/load-dataset";

/** RT ln 10 at 298.15 K, J/mol: one log10 unit of K as a Gibbs energy (R from CODATA 2018). */
const RT_LN10_J_PER_MOL = 8.314462618 * 298.15 * Math.LN10;

/**
 * One Monte Carlo sample of the data set: each solid's standard Gibbs energy (or the log K of a solid defined
 * by a reaction) is shifted by a normal deviate of its own uncertainty, σ = uncertaintyLog10K · RT ln 10,
 * independently per entry. Aqueous species are left as they are: their data are far better known than the
 * hydrates' (the uncertainty of the assessment is dominated by the solids), and perturbing H2O, H+ and
 * OH- would only shift the reference. With zero uncertainty the sample equals the data set.
 */
export function sampleDataset(dataset: Dataset, rng: Rng): Dataset {
  let shifted = false;
  const species = dataset.species.map((entry) => {
    if (entry.phase !== "solid" || !(entry.uncertaintyLog10K > 0)) return entry;
    const deviateLog10K = rng.normal(0, entry.uncertaintyLog10K);
    shifted = true;
    if (entry.standard) return { ...entry, standard: { ...entry.standard, gibbsJPerMol: entry.standard.gibbsJPerMol + deviateLog10K * RT_LN10_J_PER_MOL } };
    if (entry.logK) return { ...entry, logK: { ...entry.logK, log10K25: entry.logK.log10K25 + deviateLog10K } };
    return entry;
  });
  if (!shifted) return dataset;
  // A distinct version keys the per-temperature cache of standard potentials to this sample.
  return { ...dataset, species, version: `${dataset.version}~${rng.nextUint32().toString(16)}` };
}
