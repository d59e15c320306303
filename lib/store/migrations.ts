import type Database from "better-sqlite3";

/**
 * Numbered schema migrations of the assessment store. Each runs once, in order, inside a transaction,
 * and is recorded in `schema_migrations` (version, name, applied_at). Never edit a migration that has
 * shipped: add the next number.
 */
export type Migration = { version: number; name: string; sql: string };

export const MIGRATIONS: readonly Migration[] = [
  {
    version: 1,
    name: "create assessments",
    sql: `CREATE TABLE assessments (
      id TEXT PRIMARY KEY,
      name TEXT NOT NULL,
      inputs_json TEXT NOT NULL,
      result_json TEXT NOT NULL,
      dataset_version TEXT NOT NULL,
      engine_version TEXT NOT NULL,
      created_at TEXT NOT NULL,
      updated_at TEXT NOT NULL
    )`,
  },
  {
    version: 2,
    name: "index assessments by update time",
    sql: `CREATE INDEX assessments_updated_at ON assessments (updated_at DESC)`,
  },
  {
    version: 3,
    name: "project name column for the list (backfilled from the inputs)",
    sql: `ALTER TABLE assessments ADD COLUMN project_name TEXT;
      UPDATE assessments SET project_name = json_extract(inputs_json, '$.project.name')
        WHERE json_valid(inputs_json) AND json_type(inputs_json, '$.project.name') = 'text'`,
  },
];

export type MigrationReport = { applied: number[]; currentVersion: number };

/**
 * Brings the database to the latest schema: creates `schema_migrations` if needed and applies every
 * migration whose number is above the highest recorded one. A database written by a newer Hydrastate
 * (a recorded number above the latest known) is refused rather than guessed at.
 */
export function applyMigrations(db: Database.Database, migrations: readonly Migration[] = MIGRATIONS, now: () => Date = () => new Date()): MigrationReport {
  db.exec(`CREATE TABLE IF NOT EXISTS schema_migrations (version INTEGER PRIMARY KEY, name TEXT NOT NULL, applied_at TEXT NOT NULL)`);
  const row = db.prepare(`SELECT MAX(version) AS version FROM schema_migrations`).get() as { version: number | null };
  const recorded = row.version ?? 0;
  const latest = migrations.reduce((max, m) => Math.max(max, m.version), 0);
  if (recorded > latest) throw new Error(`the database schema version ${recorded} is newer than this Hydrastate understands (${latest})`);
  const applied: number[] = [];
  const record = db.prepare(`INSERT INTO schema_migrations (version, name, applied_at) VALUES (?, ?, ?)`);
  for (const migration of [...migrations].sort((a, b) => a.version - b.version)) {
    if (migration.version <= recorded) continue;
    db.transaction(() => {
      db.exec(migration.sql);
      record.run(migration.version, migration.name, now().toISOString());
    })();
    applied.push(migration.version);
  }
  return { applied, currentVersion: Math.max(recorded, latest) };
}
