import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { differingPaths, flattenPaths } from "../../lib/store/flatten";

describe("flattenPaths", () => {
  it("gives dotted paths with array indices to each leaf", () => {
    const flat = flattenPaths({ binder: { cement: { preset: "CEM I" }, supplementaryMaterials: [{ type: "slag", massPercentOfBinder: 30 }] }, mix: { waterBinderRatio: 0.45 } });
    expect([...flat.entries()]).toEqual([
      ["binder.cement.preset", "CEM I"],
      ["binder.supplementaryMaterials.0.type", "slag"],
      ["binder.supplementaryMaterials.0.massPercentOfBinder", 30],
      ["mix.waterBinderRatio", 0.45],
    ]);
  });

  it("keeps empty arrays and objects as leaves", () => {
    expect([...flattenPaths({ a: [], b: {} }).entries()]).toEqual([["a", []], ["b", {}]]);
  });
});

describe("differingPaths", () => {
  it("lists only the paths whose values differ, with each document's value", () => {
    const a = { mix: { waterBinderRatio: 0.45, binderKgPerM3: 350 }, project: { name: "A" } };
    const b = { mix: { waterBinderRatio: 0.5, binderKgPerM3: 350 }, project: { name: "B" }, curing: { maxTemperatureC: 60 } };
    expect(differingPaths([a, b])).toEqual([
      { path: "mix.waterBinderRatio", values: [0.45, 0.5] },
      { path: "project.name", values: ["A", "B"] },
      { path: "curing.maxTemperatureC", values: [undefined, 60] },
    ]);
  });

  it("finds no difference between a document and itself (property)", () => {
    fc.assert(fc.property(fc.jsonValue(), (value) => differingPaths([value, structuredClone(value), value]).length === 0));
  });

  it("finds a difference whenever one leaf changes (property)", () => {
    fc.assert(
      fc.property(fc.dictionary(fc.string({ minLength: 1 }).filter((k) => !k.includes(".")), fc.integer()), fc.integer(), (record, bump) => {
        const keys = Object.keys(record);
        if (keys.length === 0 || bump === 0) return true;
        const changed = { ...record, [keys[0]]: record[keys[0]] + bump };
        return differingPaths([record, changed]).some((d) => d.path === keys[0]);
      }),
    );
  });
});
