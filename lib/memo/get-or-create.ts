/**
 * The value a map holds for a key, created and stored on first use: the one pattern behind the per-data-set and
 * per-problem-structure caches of the engine and the binder model (WeakMaps keyed by an object, so that a cache
 * entry goes with the data set or structure it was built for).
 */
export function getOrCreate<K extends object, V>(map: WeakMap<K, V>, key: K, create: () => V): V;
export function getOrCreate<K, V>(map: Map<K, V>, key: K, create: () => V): V;
export function getOrCreate<K extends object, V>(map: Map<K, V> | WeakMap<K, V>, key: K, create: () => V): V {
  if (map.has(key)) return map.get(key) as V;
  const value = create();
  map.set(key, value);
  return value;
}
