import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { molarMassGPerMol } from "../chem/atomic-weights";
import { parseFormula } from "../chem/formula";
import { dataDirectory } from "./data-directory";
import type { DatasetError, DatasetFileInfo, DatasetResult, LoadedSpecies } from "./dataset";
import { dataFile, type DataFile, type SolutionEntry } from "./schema";

export type { Dataset, DatasetError, DatasetResult, LoadedSpecies } from "./dataset";

/** Folders under `lib/data/` read by default, in this order; a missing folder is skipped. */
const defaultFolders = ["starter", "cement"];

const cache = new Map<string, DatasetResult>();

/**
 * The `*.json` files read by default: every file in `lib/data/starter/` and, if the folder exists,
 * `lib/data/cement/`, each folder in file-name order.
 */
export function defaultDatasetFiles(): string[] {
  const directory = dataDirectory();
  if (!directory) return [];
  const files: string[] = [];
  // Read at run time from the source tree, not traced into the server bundle (the bundler would take the whole project).
  for (const folder of defaultFolders) {
    const folderPath = path.join(/*turbopackIgnore: true*/ directory, folder);
    if (!existsSync(folderPath)) continue;
    for (const name of readdirSync(folderPath).filter((n) => n.endsWith(".json")).sort()) files.push(path.join(/*turbopackIgnore: true*/ folderPath, name));
  }
  return files;
}

/**
 * Reads, validates and combines thermodynamic data files (schema of `lib/data/schema.ts`).
 *
 * For each entry: the formula is parsed, the molar mass computed (IUPAC 2021 weights), and the file's
 * `defaultUncertaintyLog10K` applied when the entry states none. Rejects, as a typed error naming the file
 * and the path inside it: unreadable files, bad JSON, schema violations, unparsable formulas, an `id` used
 * twice across all files, a `solution` declared twice, and an end-member whose `solution` no file declares.
 * `logK` reaction references are resolved later, by `speciesAtTemperature`.
 *
 * Results (and errors) are cached per process by the list of paths; `clearDatasetCache` empties the cache.
 * @param files explicit paths (absolute or relative to the working directory); default `defaultDatasetFiles()`.
 */
export function loadDataset(files?: string[]): DatasetResult {
  const paths = (files ?? defaultDatasetFiles()).map((f) => path.resolve(f));
  const key = paths.join("\n");
  const cached = cache.get(key);
  if (cached) return cached;
  const result = loadUncached(paths);
  cache.set(key, result);
  return result;
}

/** Empties the per-process cache (for tests and for tools that rewrite data files). */
export function clearDatasetCache(): void {
  cache.clear();
}

function fail(file: string, code: DatasetError["code"], errorPath: string, message: string): DatasetResult {
  return { ok: false, error: { code, file, path: errorPath, message } };
}

function loadUncached(paths: string[]): DatasetResult {
  if (paths.length === 0) return fail("", "no_files", "", "no data files given and none found in lib/data/starter");
  const hash = createHash("sha256");
  const species: LoadedSpecies[] = [];
  const solutions: SolutionEntry[] = [];
  const files: DatasetFileInfo[] = [];
  const speciesFile = new Map<string, string>();
  const solutionIds = new Set<string>();
  const endMembers: { file: string; path: string; solution: string; id: string }[] = [];

  for (const file of paths) {
    let text: string;
    try {
      text = readFileSync(file, "utf8");
    } catch (caught) {
      return fail(file, "file_unreadable", "", `cannot read ${file}: ${(caught as Error).message}`);
    }
    hash.update(path.basename(file)).update("\0").update(text).update("\0");

    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch (caught) {
      return fail(file, "json_syntax", "", `${file} is not valid JSON: ${(caught as Error).message}`);
    }
    const parsed = dataFile.safeParse(json);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const issuePath = formatPath(issue.path);
      return fail(file, "schema_invalid", issuePath, `${file}: ${issuePath || "file"}: ${issue.message}`);
    }
    const content: DataFile = parsed.data;
    files.push({ family: content.family, title: content.title, provenance: content.provenance });

    for (const [index, solution] of content.solutions.entries()) {
      if (solutionIds.has(solution.id)) {
        return fail(file, "duplicate_id", `solutions[${index}].id`, `${file}: solution "${solution.id}" is declared twice`);
      }
      solutionIds.add(solution.id);
      solutions.push(solution);
    }

    for (const [index, entry] of content.species.entries()) {
      const entryPath = `species[${index}]`;
      const earlierFile = speciesFile.get(entry.id);
      if (earlierFile !== undefined) {
        return fail(file, "duplicate_id", `${entryPath}.id`, `${file}: species id "${entry.id}" is already defined in ${earlierFile}`);
      }
      speciesFile.set(entry.id, file);
      const formula = parseFormula(entry.formula);
      if (!formula.ok) {
        return fail(file, "formula_invalid", `${entryPath}.formula`, `${file}: ${entryPath}.formula: ${formula.error.message}`);
      }
      if (entry.solution !== undefined) endMembers.push({ file, path: `${entryPath}.solution`, solution: entry.solution, id: entry.id });
      species.push({
        ...entry,
        elements: formula.value.elements,
        charge: formula.value.charge,
        molarMassGPerMol: molarMassGPerMol(formula.value.elements),
        uncertaintyLog10K: entry.uncertaintyLog10K ?? content.defaultUncertaintyLog10K.value,
        family: content.family,
      });
    }
  }

  for (const member of endMembers) {
    if (!solutionIds.has(member.solution)) {
      return fail(member.file, "unknown_solution", member.path, `${member.file}: end-member "${member.id}" names solution "${member.solution}", which no data file declares`);
    }
  }

  return { ok: true, value: { species, solutions, files, version: hash.digest("hex").slice(0, 16) } };
}

function formatPath(segments: readonly PropertyKey[]): string {
  let out = "";
  for (const segment of segments) {
    if (typeof segment === "number") out += `[${segment}]`;
    else out += out === "" ? String(segment) : `.${String(segment)}`;
  }
  return out;
}
