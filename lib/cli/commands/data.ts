/**
 * `npm run cli -- data list [--json]`: the thermodynamic data set (starter + cement files) as a table —
 * id, phase, formula, ΔfG° at 25 °C, log10 Ksp at 25 °C for solids (dissolution to the cement basis of
 * `lib/data/cement-dissolution.ts`), molar volume, source, and a marker for values recalled from memory.
 * `--json` prints the same rows (with the reaction and full source) as JSON.
 */
import { loadDataset } from "../../data/load-dataset";
import { speciesAtTemperatureResult } from "../../data/species-at-temperature";
import { dissolutionLog10K, formatReaction } from "../../data/cement-dissolution";

export const summary = "list the thermodynamic data set: ΔfG°, log Ksp at 25 °C, molar volume, source";

const referenceTemperatureK = 298.15;
const sourceColumnWidth = 70;

export type DataListRow = {
  id: string;
  phase: string;
  formula: string;
  solution?: string;
  family: string;
  gibbsKJPerMol25C: number;
  log10Ksp25C?: number;
  dissolutionReaction?: string;
  molarVolumeCm3PerMol?: number;
  uncertaintyLog10K: number;
  source: string;
  recalledFromMemory: boolean;
};

/** The rows of `data list`, or a one-line error message. */
export function dataListRows(): { ok: true; rows: DataListRow[] } | { ok: false; message: string } {
  const loaded = loadDataset();
  if (!loaded.ok) return { ok: false, message: `data set: ${loaded.error.message}` };
  const atTemperature = speciesAtTemperatureResult(loaded.value, referenceTemperatureK);
  if (!atTemperature.ok) return { ok: false, message: `data set: ${atTemperature.error.message}` };
  const engineSpecies = atTemperature.value;
  const rows = loaded.value.species.map((entry, index): DataListRow => {
    const row: DataListRow = {
      id: entry.id,
      phase: entry.phase,
      formula: entry.formula,
      family: entry.family,
      gibbsKJPerMol25C: engineSpecies[index].gibbsJPerMol / 1000,
      uncertaintyLog10K: entry.uncertaintyLog10K,
      source: entry.source,
      recalledFromMemory: entry.recalledFromMemory === true,
    };
    if (entry.solution !== undefined) row.solution = entry.solution;
    if (entry.molarVolumeCm3PerMol !== undefined) row.molarVolumeCm3PerMol = entry.molarVolumeCm3PerMol;
    if (entry.phase === "solid") {
      const ksp = dissolutionLog10K(engineSpecies, entry.id, referenceTemperatureK);
      if (ksp.ok) {
        row.log10Ksp25C = ksp.value;
        if (ksp.reaction) row.dissolutionReaction = formatReaction(entry.id, ksp.reaction);
      }
    }
    return row;
  });
  return { ok: true, rows };
}

function truncate(text: string, width: number): string {
  return text.length <= width ? text : `${text.slice(0, width - 1)}…`;
}

/** Plain-text table of the rows; `*` marks entries recalled from memory. */
export function formatDataTable(rows: readonly DataListRow[]): string {
  const header = ["id", "phase", "formula", "ΔfG° 25 °C kJ/mol", "log Ksp 25 °C", "V cm3/mol", "source"];
  const body = rows.map((r) => [
    r.recalledFromMemory ? `${r.id} *` : r.id,
    r.solution ? `${r.phase} (${r.solution})` : r.phase,
    r.formula,
    r.gibbsKJPerMol25C.toFixed(2),
    r.log10Ksp25C === undefined ? "" : r.log10Ksp25C.toFixed(2),
    r.molarVolumeCm3PerMol === undefined ? "" : r.molarVolumeCm3PerMol.toFixed(2),
    truncate(r.source, sourceColumnWidth),
  ]);
  const widths = header.map((h, i) => Math.max(h.length, ...body.map((b) => b[i].length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === cells.length - 1 ? c : c.padEnd(widths[i]))).join("  ").trimEnd();
  return [
    line(header),
    line(widths.map((w) => "-".repeat(w))),
    ...body.map(line),
    "",
    "* values recalled from memory of the cited source; confirm against the printed table before relying on them.",
    "log Ksp: dissolution to Ca+2, Mg+2, Na+, K+, Al(OH)4-, Fe(OH)4-, SiO(OH)3-, SO4-2, CO3-2, Cl-, OH-, H2O (use --json for each reaction).",
  ].join("\n");
}

export async function run(args: string[]): Promise<number> {
  const [subcommand, ...rest] = args;
  if (subcommand !== "list") {
    process.stderr.write(`data: unknown subcommand "${subcommand ?? ""}"; use: data list [--json]\n`);
    return 2;
  }
  const unknown = rest.filter((a) => a !== "--json");
  if (unknown.length > 0) {
    process.stderr.write(`data list: unknown option "${unknown[0]}"; options: --json\n`);
    return 2;
  }
  const result = dataListRows();
  if (!result.ok) {
    process.stderr.write(`${result.message}\n`);
    return 1;
  }
  if (rest.includes("--json")) process.stdout.write(JSON.stringify(result.rows, null, 2) + "\n");
  else process.stdout.write(formatDataTable(result.rows) + "\n");
  return 0;
}
