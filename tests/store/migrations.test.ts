import Database from "better-sqlite3";
import { describe, expect, it } from "vitest";
import { applyMigrations, MIGRATIONS } from "../../lib/store/migrations";

describe("applyMigrations", () => {
  it("applies every numbered migration once to a new database and records each", () => {
    const db = new Database(":memory:");
    const report = applyMigrations(db);
    expect(report.applied).toEqual(MIGRATIONS.map((m) => m.version));
    const recorded = db.prepare("SELECT version, name FROM schema_migrations ORDER BY version").all();
    expect(recorded).toEqual(MIGRATIONS.map((m) => ({ version: m.version, name: m.name })));
    const tables = db.prepare("SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name").all() as { name: string }[];
    expect(tables.map((t) => t.name)).toContain("assessments");
  });

  it("applies nothing the second time the database is opened", () => {
    const db = new Database(":memory:");
    applyMigrations(db);
    expect(applyMigrations(db).applied).toEqual([]);
  });

  it("applies only the migrations above the recorded version to an older database", () => {
    const db = new Database(":memory:");
    applyMigrations(db, MIGRATIONS.slice(0, 1));
    const report = applyMigrations(db);
    expect(report.applied).toEqual(MIGRATIONS.slice(1).map((m) => m.version));
    const indexes = db.prepare("SELECT name FROM sqlite_master WHERE type = 'index' AND name = 'assessments_updated_at'").all();
    expect(indexes).toHaveLength(1);
  });

  it("refuses a database written by a newer schema instead of guessing", () => {
    const db = new Database(":memory:");
    applyMigrations(db);
    db.prepare("INSERT INTO schema_migrations (version, name, applied_at) VALUES (99, 'future', 'x')").run();
    expect(() => applyMigrations(db)).toThrow(/newer/);
  });

  it("rolls back a failing migration so that it is not recorded", () => {
    const db = new Database(":memory:");
    const broken = [...MIGRATIONS, { version: 99, name: "broken", sql: "CREATE TABLE assessments (id TEXT)" }];
    expect(() => applyMigrations(db, broken)).toThrow();
    const versions = (db.prepare("SELECT version FROM schema_migrations").all() as { version: number }[]).map((r) => r.version);
    expect(versions).toEqual(MIGRATIONS.map((m) => m.version));
  });

  it("backfills the project name of records saved before migration 3 from their inputs", () => {
    const db = new Database(":memory:");
    applyMigrations(db, MIGRATIONS.slice(0, 2));
    const insert = db.prepare("INSERT INTO assessments VALUES (?, 'n', ?, '{}', 'd', 'e', 't', 't')");
    insert.run("with", JSON.stringify({ project: { name: "Harbour" } }));
    insert.run("without", JSON.stringify({ mix: {} }));
    insert.run("numeric", JSON.stringify({ project: { name: 5 } }));
    applyMigrations(db);
    const names = db.prepare("SELECT id, project_name FROM assessments ORDER BY id").all();
    expect(names).toEqual([{ id: "numeric", project_name: null }, { id: "with", project_name: "Harbour" }, { id: "without", project_name: null }]);
  });
});
