import { mkdtempSync, rmSync, existsSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { databasePath, openSqliteStore } from "../../lib/store/sqlite-store";
import type { AssessmentStore } from "../../lib/store/assessment-store";

const running = { dataset: "d-2", engine: "0.2.0" };
const opened: AssessmentStore[] = [];

function memoryStore(): AssessmentStore {
  let tick = 0;
  const store = openSqliteStore({ path: ":memory:", currentVersions: running, now: () => new Date(Date.UTC(2026, 0, 1, 0, 0, tick++)) });
  opened.push(store);
  return store;
}

afterEach(() => {
  while (opened.length) opened.pop()!.close();
});

const inputs = (name: string, waterBinderRatio: number) => ({ project: { name }, mix: { waterBinderRatio }, binder: { cement: { preset: "CEM I 42.5 N" } } });
const result = (severity: string, pH: number) => ({
  assemblage: { pH },
  flags: [{ id: "sulfate-attack", severity, title: "Sulfate attack", explanation: "", basis: "", actions: [] }],
  cautions: ["Caution text."],
});

describe("databasePath", () => {
  it("takes HYDRASTATE_DB when set and data/hydrastate.sqlite otherwise", () => {
    expect(databasePath({ HYDRASTATE_DB: "/tmp/x.sqlite" })).toBe("/tmp/x.sqlite");
    expect(databasePath({})).toBe("data/hydrastate.sqlite");
    expect(databasePath({ HYDRASTATE_DB: "  " })).toBe("data/hydrastate.sqlite");
  });
});

describe("the SQLite assessment store", () => {
  it("saves an assessment and gives it back with its inputs, result and versions", () => {
    const store = memoryStore();
    const saved = store.save("  Wall W1  ", inputs("Harbour wall", 0.45), result("warning", 12.9), running);
    expect(saved.ok).toBe(true);
    if (!saved.ok) return;
    expect(saved.value.name).toBe("Wall W1");
    expect(saved.value.projectName).toBe("Harbour wall");
    const again = store.get(saved.value.id);
    expect(again.ok && again.value.inputs).toEqual(inputs("Harbour wall", 0.45));
    expect(again.ok && again.value.result).toEqual(result("warning", 12.9));
    expect(again.ok && again.value.versions).toEqual(running);
  });

  it("states that a record is current only when both data-set and engine versions match the running ones", () => {
    const store = memoryStore();
    const same = store.save("same", {}, {}, running);
    const oldData = store.save("old data", {}, {}, { dataset: "d-1", engine: running.engine });
    const oldBoth = store.save("old both", {}, {}, { dataset: "d-1", engine: "0.1.0" });
    expect(same.ok && same.value.isCurrent).toBe(true);
    expect(oldData.ok && [oldData.value.isCurrent, oldData.value.outdated]).toEqual([false, ["dataset"]]);
    expect(oldBoth.ok && oldBoth.value.outdated).toEqual(["dataset", "engine"]);
  });

  it("lists summaries most recently updated first, without inputs or results", () => {
    const store = memoryStore();
    const first = store.save("first", {}, {}, running);
    store.save("second", {}, {}, running);
    const list = store.list();
    expect(list.ok && list.value.map((s) => s.name)).toEqual(["second", "first"]);
    expect(list.ok && "inputs" in list.value[0]).toBe(false);
    if (first.ok) store.rename(first.value.id, "first renamed");
    const after = store.list();
    expect(after.ok && after.value[0].name).toBe("first renamed");
  });

  it("duplicates with a new id, a copy name and the original versions", () => {
    const store = memoryStore();
    const original = store.save("Slab", inputs("P", 0.4), result("info", 13), { dataset: "d-1", engine: "0.1.0" });
    if (!original.ok) throw new Error("save failed");
    const copy = store.duplicate(original.value.id);
    expect(copy.ok).toBe(true);
    if (!copy.ok) return;
    expect(copy.value.id).not.toBe(original.value.id);
    expect(copy.value.name).toBe("Slab (copy)");
    expect(copy.value.versions).toEqual({ dataset: "d-1", engine: "0.1.0" });
    expect(copy.value.inputs).toEqual(original.value.inputs);
    expect(store.duplicate(original.value.id, "Slab B").ok && (store.list() as { value: unknown[] }).value.length).toBe(3);
  });

  it("renames and removes, and reports a missing id as not_found rather than throwing", () => {
    const store = memoryStore();
    const saved = store.save("A", {}, {}, running);
    if (!saved.ok) throw new Error("save failed");
    const renamed = store.rename(saved.value.id, "B");
    expect(renamed.ok && renamed.value.name).toBe("B");
    expect(store.remove(saved.value.id)).toEqual({ ok: true, value: { id: saved.value.id } });
    for (const outcome of [store.get(saved.value.id), store.rename(saved.value.id, "C"), store.remove(saved.value.id), store.duplicate(saved.value.id)]) {
      expect(outcome.ok).toBe(false);
      if (!outcome.ok) expect(outcome.error.code).toBe("not_found");
    }
  });

  it("refuses empty, over-long and control-character names with invalid_name naming the limit", () => {
    const store = memoryStore();
    for (const name of ["", "   ", "x".repeat(201), "a\u0000b"]) {
      const outcome = store.save(name, {}, {}, running);
      expect(outcome.ok).toBe(false);
      if (!outcome.ok) expect(outcome.error).toMatchObject({ code: "invalid_name", maxLength: 200 });
    }
    expect(store.save("x".repeat(200), {}, {}, running).ok).toBe(true);
  });

  it("refuses a record without versions", () => {
    const store = memoryStore();
    const outcome = store.save("A", {}, {}, { dataset: "", engine: "1" });
    expect(!outcome.ok && outcome.error.code).toBe("invalid_record");
  });

  it("compares two to four assessments: differing inputs, flags and key figures side by side", () => {
    const store = memoryStore();
    const a = store.save("A", inputs("P", 0.45), result("warning", 12.9), running);
    const b = store.save("B", inputs("P", 0.5), { ...result("caution", 12.5), flags: [] }, running);
    if (!a.ok || !b.ok) throw new Error("save failed");
    const comparison = store.compare([a.value.id, b.value.id]);
    expect(comparison.ok).toBe(true);
    if (!comparison.ok) return;
    expect(comparison.value.assessments.map((s) => s.name)).toEqual(["A", "B"]);
    expect(comparison.value.inputDifferences).toEqual([{ path: "mix.waterBinderRatio", values: [0.45, 0.5] }]);
    expect(comparison.value.flags).toEqual([{ id: "sulfate-attack", title: "Sulfate attack", severities: ["warning", null] }]);
    expect(comparison.value.keyFigures.find((k) => k.id === "pH")?.values).toEqual([12.9, 12.5]);
  });

  it("refuses to compare fewer than two, more than four, repeated or missing ids", () => {
    const store = memoryStore();
    const ids = Array.from({ length: 5 }, (_, i) => store.save(`n${i}`, {}, {}, running)).map((o) => (o.ok ? o.value.id : ""));
    for (const bad of [[ids[0]], ids, [ids[0], ids[0]]]) {
      const outcome = store.compare(bad);
      expect(!outcome.ok && outcome.error.code).toBe("invalid_compare");
    }
    const missing = store.compare([ids[0], "nope"]);
    expect(!missing.ok && missing.error.code).toBe("not_found");
    expect(store.compare(ids.slice(0, 4)).ok).toBe(true);
  });

  it("creates the database directory on demand and keeps records across reopening", () => {
    const directory = mkdtempSync(path.join(tmpdir(), "hydrastate-store-"));
    const file = path.join(directory, "nested", "store.sqlite");
    try {
      const first = openSqliteStore({ path: file, currentVersions: running });
      const saved = first.save("Kept", { a: 1 }, { b: 2 }, running);
      first.close();
      expect(existsSync(file)).toBe(true);
      const second = openSqliteStore({ path: file, currentVersions: { dataset: "d-3", engine: running.engine } });
      const reopened = saved.ok ? second.get(saved.value.id) : null;
      second.close();
      expect(reopened?.ok && [reopened.value.name, reopened.value.isCurrent, reopened.value.outdated]).toEqual(["Kept", false, ["dataset"]]);
    } finally {
      rmSync(directory, { recursive: true, force: true });
    }
  });
});
