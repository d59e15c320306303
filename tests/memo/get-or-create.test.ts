import { describe, expect, it } from "vitest";
import { getOrCreate } from "../../lib/memo/get-or-create";

describe("getOrCreate", () => {
  it("creates a value once per key and returns the stored one afterwards", () => {
    const map = new WeakMap<object, number[]>();
    const key = {};
    let created = 0;
    const first = getOrCreate(map, key, () => [++created]);
    const second = getOrCreate(map, key, () => [++created]);
    expect(second).toBe(first);
    expect(created).toBe(1);
    expect(getOrCreate(map, {}, () => [++created])).toEqual([2]);
  });

  it("returns a stored falsy value (0) instead of creating it again", () => {
    const map = new Map<string, number>();
    expect(getOrCreate(map, "a", () => 0)).toBe(0);
    expect(getOrCreate(map, "a", () => 1)).toBe(0);
  });
});
