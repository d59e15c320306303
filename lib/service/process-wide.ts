/**
 * One value per server process, created on first use and kept on `globalThis` under a registered symbol: Next
 * bundles each route separately, so a module-level variable would give every route (and every reloaded route
 * module) its own store, job registry or worker pool.
 */
export type ProcessWide<T> = {
  /** The value, created on the first call. */
  get(): T;
  /** Replaces the value (tests); returns the previous one, which the caller closes if it must. */
  replace(value: T | undefined): T | undefined;
};

export function processWide<T>(name: string, create: () => T): ProcessWide<T> {
  const key = Symbol.for(name);
  const holder = globalThis as unknown as Record<symbol, T | undefined>;
  return {
    get() {
      holder[key] ??= create();
      return holder[key];
    },
    replace(value) {
      const previous = holder[key];
      holder[key] = value;
      return previous;
    },
  };
}
