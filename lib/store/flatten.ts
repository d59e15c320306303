/**
 * Flattens a JSON value to leaf paths (`binder.cement.preset`, `binder.supplementaryMaterials.0.type`)
 * → leaf values, for the "inputs that differ" table of a comparison. Empty objects and arrays are leaves
 * (so that `[]` differs from a missing key); the order is first appearance.
 */
export function flattenPaths(value: unknown, prefix = "", out: Map<string, unknown> = new Map()): Map<string, unknown> {
  const isContainer = value !== null && typeof value === "object";
  const entries: [string, unknown][] = isContainer
    ? Array.isArray(value)
      ? value.map((item, index) => [String(index), item])
      : Object.entries(value as Record<string, unknown>)
    : [];
  if (!isContainer || entries.length === 0) {
    out.set(prefix || "(input)", value);
    return out;
  }
  for (const [key, item] of entries) flattenPaths(item, prefix ? `${prefix}.${key}` : key, out);
  return out;
}

/** Leaf equality for the diff: JSON identity (numbers, strings, booleans, null, empty containers). */
function sameLeaf(a: unknown, b: unknown): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

export type PathDifference = { path: string; values: unknown[] };

/**
 * Paths whose leaf value is not the same in every document; `values[i]` is the value in document i,
 * `undefined` where the path is absent there. Paths in first-appearance order across the documents.
 */
export function differingPaths(documents: readonly unknown[]): PathDifference[] {
  const flat = documents.map((document) => flattenPaths(document));
  const paths: string[] = [];
  const seen = new Set<string>();
  for (const map of flat) for (const path of map.keys()) if (!seen.has(path)) (seen.add(path), paths.push(path));
  const differences: PathDifference[] = [];
  for (const path of paths) {
    const values = flat.map((map) => map.get(path));
    const present = flat.map((map) => map.has(path));
    const allSame = present.every((p) => p === present[0]) && values.every((v) => sameLeaf(v, values[0]));
    if (!allSame) differences.push({ path, values });
  }
  return differences;
}
