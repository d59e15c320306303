import { describe, expect, it } from "vitest";
import { processWide } from "../../lib/service/process-wide";

describe("processWide", () => {
  it("creates the value once, on first use, and shares it between handles of the same name (two bundled routes)", () => {
    let created = 0;
    const name = `hydrastate.test.${Math.random()}`;
    const first = processWide(name, () => ({ n: ++created }));
    const second = processWide(name, () => ({ n: ++created }));
    expect(created).toBe(0);
    const value = first.get();
    expect(second.get()).toBe(value);
    expect(created).toBe(1);
  });

  it("replaces the value and returns the previous one; after clearing, the next get creates a new one", () => {
    let created = 0;
    const holder = processWide(`hydrastate.test.${Math.random()}`, () => ({ n: ++created }));
    const original = holder.get();
    const replacement = { n: 100 };
    expect(holder.replace(replacement)).toBe(original);
    expect(holder.get()).toBe(replacement);
    expect(holder.replace(undefined)).toBe(replacement);
    expect(holder.get()).toEqual({ n: 2 });
  });
});
