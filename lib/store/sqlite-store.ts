import { randomUUID } from "node:crypto";
import { mkdirSync } from "node:fs";
import path from "node:path";
import Database from "better-sqlite3";
import { checkName, currency, projectNameOf, type AssessmentStore, type AssessmentSummary, type SavedAssessment, type StoreOutcome, type Versions } from "./assessment-store";
import { checkCompareIds, compareAssessments } from "./compare";
import { applyMigrations } from "./migrations";

/** Default database file, relative to the working directory (ignored by git: `/data/`). */
export const DEFAULT_DATABASE_PATH = "data/hydrastate.sqlite";

/** The database path: env `HYDRASTATE_DB`, else `data/hydrastate.sqlite`; `:memory:` for tests. */
export function databasePath(env: Record<string, string | undefined> = process.env): string {
  const configured = env.HYDRASTATE_DB?.trim();
  return configured ? configured : DEFAULT_DATABASE_PATH;
}

type SummaryRow = {
  id: string;
  name: string;
  project_name: string | null;
  dataset_version: string;
  engine_version: string;
  created_at: string;
  updated_at: string;
};
type Row = SummaryRow & { inputs_json: string; result_json: string };

export type SqliteStoreOptions = {
  /** File path or `:memory:`; default `databasePath()`. The directory is created on demand. */
  path?: string;
  /** The versions of the running data set and engine, against which `isCurrent` is computed. */
  currentVersions: Versions;
  now?: () => Date;
  newId?: () => string;
};

/** Opens (creating if needed) the database and applies the migrations. */
export function openSqliteStore(options: SqliteStoreOptions): AssessmentStore {
  const file = options.path ?? databasePath();
  if (file !== ":memory:") mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  const db = new Database(file);
  db.pragma("journal_mode = WAL");
  db.pragma("foreign_keys = ON");
  applyMigrations(db);
  return new SqliteAssessmentStore(db, options.currentVersions, options.now ?? (() => new Date()), options.newId ?? randomUUID);
}

class SqliteAssessmentStore implements AssessmentStore {
  private readonly statements;

  constructor(
    private readonly db: Database.Database,
    private readonly running: Versions,
    private readonly now: () => Date,
    private readonly newId: () => string,
  ) {
    this.statements = {
      // The list reads no inputs or results: a store of large Monte Carlo results lists quickly.
      list: db.prepare(
        `SELECT id, name, project_name, dataset_version, engine_version, created_at, updated_at FROM assessments ORDER BY updated_at DESC, created_at DESC, id`,
      ),
      get: db.prepare(`SELECT * FROM assessments WHERE id = ?`),
      insert: db.prepare(
        `INSERT INTO assessments (id, name, project_name, inputs_json, result_json, dataset_version, engine_version, created_at, updated_at)
         VALUES (@id, @name, @project_name, @inputs_json, @result_json, @dataset_version, @engine_version, @created_at, @updated_at)`,
      ),
      rename: db.prepare(`UPDATE assessments SET name = ?, updated_at = ? WHERE id = ?`),
      remove: db.prepare(`DELETE FROM assessments WHERE id = ?`),
    };
  }

  private toSummary(row: SummaryRow): AssessmentSummary {
    const versions = { dataset: row.dataset_version, engine: row.engine_version };
    return {
      id: row.id,
      name: row.name,
      projectName: row.project_name,
      createdAt: row.created_at,
      updatedAt: row.updated_at,
      versions,
      ...currency(versions, this.running),
    };
  }

  private toSaved(row: Row): StoreOutcome<SavedAssessment> {
    let inputs: unknown;
    let result: unknown;
    try {
      inputs = JSON.parse(row.inputs_json);
      result = JSON.parse(row.result_json);
    } catch {
      return { ok: false, error: { code: "invalid_record", message: `saved assessment ${row.id} holds unreadable JSON` } };
    }
    return { ok: true, value: { ...this.toSummary(row), projectName: row.project_name ?? projectNameOf(inputs), inputs, result } };
  }

  private notFound(id: string): { ok: false; error: { code: "not_found"; id: string; message: string } } {
    return { ok: false, error: { code: "not_found", id, message: `no saved assessment with id ${id}` } };
  }

  list() {
    const rows = this.statements.list.all() as SummaryRow[];
    return { ok: true as const, value: rows.map((row) => this.toSummary(row)) };
  }

  get(id: string) {
    const row = this.statements.get.get(id) as Row | undefined;
    return row ? this.toSaved(row) : this.notFound(id);
  }

  save(name: string, inputs: unknown, result: unknown, versions: Versions): StoreOutcome<SavedAssessment> {
    const checked = checkName(name);
    if (!checked.ok) return checked;
    if (!versions || typeof versions.dataset !== "string" || typeof versions.engine !== "string" || !versions.dataset || !versions.engine)
      return { ok: false, error: { code: "invalid_record", message: "versions.dataset and versions.engine must be non-empty text" } };
    const inputsJson = JSON.stringify(inputs ?? null);
    const resultJson = JSON.stringify(result ?? null);
    const stamp = this.now().toISOString();
    const id = this.newId();
    this.statements.insert.run({
      id,
      name: checked.value,
      project_name: projectNameOf(inputs),
      inputs_json: inputsJson,
      result_json: resultJson,
      dataset_version: versions.dataset,
      engine_version: versions.engine,
      created_at: stamp,
      updated_at: stamp,
    });
    return this.get(id);
  }

  duplicate(id: string, name?: string) {
    const original = this.get(id);
    if (!original.ok) return original;
    const copyName = name ?? `${original.value.name} (copy)`.slice(0, 200);
    return this.save(copyName, original.value.inputs, original.value.result, original.value.versions);
  }

  rename(id: string, name: string) {
    const checked = checkName(name);
    if (!checked.ok) return checked;
    const changed = this.statements.rename.run(checked.value, this.now().toISOString(), id);
    return changed.changes === 0 ? this.notFound(id) : this.get(id);
  }

  remove(id: string) {
    const changed = this.statements.remove.run(id);
    return changed.changes === 0 ? this.notFound(id) : { ok: true as const, value: { id } };
  }

  compare(ids: readonly string[]) {
    const checked = checkCompareIds(ids);
    if (!checked.ok) return checked;
    const saved: SavedAssessment[] = [];
    for (const id of checked.value) {
      const one = this.get(id);
      if (!one.ok) return one;
      saved.push(one.value);
    }
    return { ok: true as const, value: compareAssessments(saved) };
  }

  close() {
    this.db.close();
  }
}
