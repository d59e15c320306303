/**
 * The standard cautions every advisory result carries. Output of Hydrastate may inform durability
 * decisions, so each result states what kind of guide it is and who decides.
 */

export type CautionId =
  | "thermodynamic-guide"
  | "equilibrium-not-kinetics"
  | "data-uncertainty"
  | "responsible-engineer"
  | "national-annexes-govern"
  | "simplified-transport-model"
  | "sampling-uncertainty";

export type Caution = { id: CautionId; text: string };

export const CAUTIONS: Readonly<Record<CautionId, Caution>> = {
  "thermodynamic-guide": {
    id: "thermodynamic-guide",
    text:
      "This is a thermodynamic guide: it computes which phases are stable at equilibrium for the stated " +
      "composition and conditions. It is not a prediction of the service life or performance of a structure.",
  },
  "equilibrium-not-kinetics": {
    id: "equilibrium-not-kinetics",
    text:
      "Equilibrium is not kinetics: a phase predicted to be stable may form slowly or not at all within the " +
      "service life, and a phase predicted to be unstable may persist. Transport through the concrete, " +
      "cracking and the rate of reaction are not modelled by the equilibrium calculation.",
  },
  "data-uncertainty": {
    id: "data-uncertainty",
    text:
      "The thermodynamic data set has uncertainty; results near a phase boundary can change with small " +
      "changes of the data. Where a Monte Carlo run is offered, read each flag's fired fraction.",
  },
  "responsible-engineer": {
    id: "responsible-engineer",
    text:
      "Design decisions rest with the applicable codes and standards, with testing by a qualified laboratory " +
      "and with a responsible, licensed engineer. Do not use this output as the sole basis of a specification.",
  },
  "national-annexes-govern": {
    id: "national-annexes-govern",
    text:
      "Exposure classes and limiting values are shown as given in the cited standards. National annexes, " +
      "national application documents and local codes govern where they differ, and the specifier assigns " +
      "the exposure classes of a project.",
  },
  "simplified-transport-model": {
    id: "simplified-transport-model",
    text:
      "The carbonation depth comes from a simplified diffusion model with constant humidity, constant CO2 " +
      "concentration and uniform concrete; real depths scatter widely with curing, cracks, wetting and the " +
      "microclimate. Confirm with measurements (e.g. phenolphthalein testing per EN 14630).",
  },
  "sampling-uncertainty": {
    id: "sampling-uncertainty",
    text:
      "Monte Carlo fractions are estimates from a finite number of samples; a fraction from n samples has a " +
      "standard error of about sqrt(p(1−p)/n).",
  },
};

/** The kinds of result that carry cautions. */
export type ResultKind =
  | "assessment"
  | "scenario"
  | "exposure-classification"
  | "compliance"
  | "carbonation-depth"
  | "monte-carlo";

const BASE: readonly CautionId[] = [
  "thermodynamic-guide",
  "equilibrium-not-kinetics",
  "data-uncertainty",
  "responsible-engineer",
  "national-annexes-govern",
];

const EXTRA: Readonly<Record<ResultKind, readonly CautionId[]>> = {
  assessment: [],
  scenario: [],
  "exposure-classification": [],
  compliance: [],
  "carbonation-depth": ["simplified-transport-model"],
  "monte-carlo": ["sampling-uncertainty"],
};

/** The cautions a result of the given kind carries: always the five base cautions, plus those of the kind. */
export function cautionsFor(kind: ResultKind): Caution[] {
  return [...BASE, ...EXTRA[kind]].map((id) => CAUTIONS[id]);
}

/** The caution texts alone, for reports and JSON output. */
export function cautionTextsFor(kind: ResultKind): string[] {
  return cautionsFor(kind).map((c) => c.text);
}
