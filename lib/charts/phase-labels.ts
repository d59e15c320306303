import type { ChartData } from "./chart-data";

/**
 * Readable names of the solid phases for legends, table headings and CSV columns. The ids are the data set's
 * (lowercase, kebab-case; see `lib/data/cement/*.json` and `lib/data/starter/solids.json`); the names are the
 * mineral names and the cement chemist notation of the trade (common practice). Hydrate water in brackets
 * follows the notation of the phase (C₄AsH₁₄ → 14 H2O).
 */
const PHASE_LABELS: Readonly<Record<string, string>> = {
  csh: "C-S-H",
  msh: "M-S-H",
  portlandite: "Portlandite",
  calcite: "Calcite",
  aragonite: "Aragonite",
  dolomite: "Dolomite",
  magnesite: "Magnesite",
  brucite: "Brucite",
  gypsum: "Gypsum",
  bassanite: "Bassanite",
  anhydrite: "Anhydrite",
  syngenite: "Syngenite",
  quartz: "Quartz",
  "sio2-am": "Amorphous SiO₂",
  gibbsite: "Gibbsite",
  "al(oh)3-am": "Amorphous Al(OH)₃",
  goethite: "Goethite",
  hematite: "Hematite",
  ferrihydrite: "Ferrihydrite",
  hydrotalcite: "Hydrotalcite",
  ettringite: "Ettringite",
  "fe-ettringite": "Fe-ettringite",
  metaettringite: "Metaettringite",
  thaumasite: "Thaumasite",
  "monosulfate-10.5": "Monosulfate (10.5 H2O)",
  "monosulfate-12": "Monosulfate (12 H2O)",
  "monosulfate-14": "Monosulfate (14 H2O)",
  "fe-monosulfate": "Fe-monosulfate",
  monocarbonate: "Monocarbonate",
  "fe-monocarbonate": "Fe-monocarbonate",
  hemicarbonate: "Hemicarbonate",
  "friedel-salt": "Friedel's salt",
  "kuzel-salt": "Kuzel's salt",
  c2ah8: "C₂AH₈",
  c4ah13: "C₄AH₁₃",
  c4ah19: "C₄AH₁₉",
  stratlingite: "Strätlingite",
  katoite: "Katoite",
  "fe-katoite": "Fe-katoite",
  "siliceous-hydrogarnet": "Siliceous hydrogarnet",
  "fe-siliceous-hydrogarnet": "Fe-siliceous hydrogarnet",
  // Unreacted binder in the hydration timeline (lib/cement/bulk-composition.ts), by the clinker phase's mineral name.
  alite: "Alite (C₃S, unreacted)",
  belite: "Belite (C₂S, unreacted)",
  aluminate: "Aluminate (C₃A, unreacted)",
  ferrite: "Ferrite (C₄AF, unreacted)",
  "clinker-minor-oxides": "Minor clinker oxides (unreacted)",
  // The liquid and the empty pores stacked on the solids.
  "pore-solution": "Pore solution",
  "pore solution": "Pore solution",
  "empty porosity": "Empty porosity",
};

/** Unreacted supplementary material, `unreacted-<scm type>` (lib/cement/bulk-composition.ts): `unreacted-fly-ash` → "Unreacted fly ash". */
const UNREACTED_SCM = /^unreacted-([a-z]+(?:-[a-z]+)*)$/;

/** End-members of the C-S-H and M-S-H solid solutions, named by their Ca (or Mg) and Si per formula unit (`csh-ca1.5-si0.6667`: Ca/Si 2.25). */
const END_MEMBER = /^(csh|msh)-(ca|mg)(\d+(?:\.\d+)?)-si(\d+(?:\.\d+)?)$/;

/** The readable name of a phase id (`csh` → "C-S-H"); an id without one is returned as it is. */
export function phaseLabel(id: string): string {
  if (Object.prototype.hasOwnProperty.call(PHASE_LABELS, id)) return PHASE_LABELS[id];
  const endMember = END_MEMBER.exec(id);
  if (endMember) {
    const [, solution, cation, cationMol, siliconMol] = endMember;
    const ratio = Number(cationMol) / Number(siliconMol);
    if (Number.isFinite(ratio) && Number(siliconMol) > 0)
      return `${solution === "csh" ? "C-S-H" : "M-S-H"} end-member (${cation === "ca" ? "Ca" : "Mg"}/Si ${Number(ratio.toFixed(2))})`;
  }
  const unreacted = UNREACTED_SCM.exec(id);
  if (unreacted) return `Unreacted ${unreacted[1].replace(/-/g, " ")}`;
  return id;
}

/** The chart with its series named by `phaseLabel` (legend, data table and CSV alike); other labels are kept. */
export function withPhaseLabels(chart: ChartData): ChartData {
  return { ...chart, series: chart.series.map((s) => ({ ...s, label: phaseLabel(s.label) })) };
}
