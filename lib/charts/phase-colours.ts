/**
 * One colour per phase, the same in every chart (assemblage, sweeps, timeline; page and PDF), so that a reader who has
 * found ettringite once finds it again. Phases of one family share a hue and differ in lightness (AFm greens,
 * hydrogarnet oranges, AFt magentas, calcium sulfates purples, unreacted binder greys and browns); the pore solution
 * is a light cyan and the empty pores a pale grey. Legends and data tables name every series, so colour is never
 * the only cue. Ids are the data set's (`lib/charts/phase-labels.ts` lists the same ones with their names).
 */
const PHASE_COLOURS: Readonly<Record<string, string>> = {
  // Unreacted binder (lib/cement/bulk-composition.ts)
  alite: "#2f2f2f",
  belite: "#5e5e5e",
  aluminate: "#8a8a8a",
  ferrite: "#7a5230",
  "clinker-minor-oxides": "#b4b4b4",
  "unreacted-slag": "#d8cdb2",
  "unreacted-siliceous-fly-ash": "#a59c8c",
  "unreacted-calcareous-fly-ash": "#c2b59b",
  "unreacted-silica-fume": "#c9c9e3",
  "unreacted-metakaolin": "#e6c39e",
  "unreacted-natural-pozzolan": "#bfae8f",
  "unreacted-limestone": "#efe2a8",
  // C-S-H, M-S-H and portlandite
  csh: "#8da0cb",
  msh: "#a6bb8c",
  portlandite: "#1f4e9c",
  // AFt and thaumasite
  ettringite: "#c2368a",
  "fe-ettringite": "#e68fc1",
  metaettringite: "#7d1f57",
  thaumasite: "#8e44ad",
  // AFm
  "monosulfate-14": "#1b7a3e",
  "monosulfate-12": "#2e9e5b",
  "monosulfate-10.5": "#63c183",
  "fe-monosulfate": "#98d5a6",
  monocarbonate: "#009e9e",
  "fe-monocarbonate": "#66cccc",
  hemicarbonate: "#86d9c6",
  "friedel-salt": "#b8860b",
  "kuzel-salt": "#dfb64c",
  c4ah13: "#4f7f2f",
  c4ah19: "#7a9f4f",
  c2ah8: "#a3c272",
  stratlingite: "#2c7f7f",
  // Hydrogarnets
  "siliceous-hydrogarnet": "#d55e00",
  "fe-siliceous-hydrogarnet": "#f0955a",
  katoite: "#a34100",
  "fe-katoite": "#f5b78c",
  // Mg phases
  hydrotalcite: "#f0e442",
  brucite: "#c5bd5f",
  // Carbonates
  calcite: "#f5a623",
  aragonite: "#d9820b",
  dolomite: "#d4a373",
  magnesite: "#e8cdb0",
  // Calcium and alkali sulfates
  gypsum: "#6a51a3",
  bassanite: "#a99bd0",
  anhydrite: "#3f007d",
  syngenite: "#c7c3e0",
  // Oxides and hydroxides
  "sio2-am": "#c6dbef",
  quartz: "#e3eef8",
  gibbsite: "#e3d29b",
  "al(oh)3-am": "#f1e7c6",
  ferrihydrite: "#8b2500",
  goethite: "#a0522d",
  hematite: "#5c1a0b",
  // The liquid and the empty pores stacked on the solids
  "pore-solution": "#aee0f2",
  "pore solution": "#aee0f2",
  "empty porosity": "#ececec",
};

/** Colours for series without a phase colour (other quantities, ids the table does not know), in this order. */
const OTHER_COLOURS = ["#0072b2", "#e69f00", "#009e73", "#cc79a7", "#56b4e9", "#d55e00", "#000000", "#999999", "#882255", "#44aa99", "#117733", "#ddcc77"];

/** The fixed colour of a phase id, or undefined when it has none. */
export function phaseColour(id: string): string | undefined {
  return Object.prototype.hasOwnProperty.call(PHASE_COLOURS, id) ? PHASE_COLOURS[id] : undefined;
}

/**
 * Colours for the series of one chart, named by phase id: each known phase its own colour, every other series the next
 * of OTHER_COLOURS not yet used in the chart (so two series of one chart never share a colour while colours last).
 */
export function seriesColours(ids: readonly string[]): string[] {
  const used = new Set<string>();
  const fixed = ids.map((id) => phaseColour(id));
  for (const colour of fixed) if (colour) used.add(colour);
  let next = 0;
  return fixed.map((colour) => {
    if (colour) return colour;
    while (next < OTHER_COLOURS.length && used.has(OTHER_COLOURS[next])) next++;
    const chosen = OTHER_COLOURS[next % OTHER_COLOURS.length];
    used.add(chosen);
    next++;
    return chosen;
  });
}

/** Every phase id with a fixed colour (tests). */
export function phasesWithColour(): string[] {
  return Object.keys(PHASE_COLOURS);
}
