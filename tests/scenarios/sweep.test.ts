import { describe, it, expect } from "vitest";
import { typicalCemIPaste } from "./typical-cem-i-paste";
import { createRng } from "../../lib/advisory/random";
import { bookedPaste, linearDoses, newWarmStartBook, readingBook, recordPaste, sweepPaste, type ScenarioBase } from "../../lib/scenarios/sweep";
import { supersaturatedSolid } from "../../lib/scenarios/temperature-history";
import { sampleDataset } from "../../lib/service/perturbed-dataset";

/**
 * The warm-start book of the Monte Carlo path. These are checks of the engine against itself (a warm start must not
 * change the minimum it reaches), not of the science: the reference is the same sweep without the book.
 * Paste: typical CEM I preset, w/b 0.5, 350 kg/m³, 28 days at 20 °C (typical, not a specific cement).
 */
const { dataset, base } = typicalCemIPaste();
/** Sodium sulfate taken up, mol per 100 g binder (with no water: a test path, not the scenario's). */
const doses = linearDoses(0.02, 5);
const addSulfate = (dose: number) => ({ addedElementsMol: { Na: 2 * dose, S: dose, O: 4 * dose } });

function sweep(b: ScenarioBase) {
  const r = sweepPaste(b, doses, addSulfate, "test");
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return r.value;
}

describe("the warm-start book of Monte Carlo samples", () => {
  const book = newWarmStartBook();
  const reference = sweep({ ...base, book });

  it("records one paste per point of the chain, and gives it back only when read", () => {
    expect(book.chains.get("test")?.map((e) => e.point)).toEqual(doses);
    expect(bookedPaste(book, "test", doses[2])).toBeUndefined();
    expect(bookedPaste(readingBook(book), "test", doses[2])).toBe(reference[2].paste);
    // The nearest point of the chain when asked for one it did not visit.
    expect(bookedPaste(readingBook(book), "test", doses[2] * 1.01, true)).toBe(reference[2].paste);
    expect(bookedPaste(readingBook(book), "other", doses[2], true)).toBeUndefined();
    recordPaste(readingBook(book), "test", 1, reference[0].paste);
    expect(book.chains.get("test")).toHaveLength(doses.length);
  });

  it("reaches the same minimum from the booked points as the chain did (like with like: same data, only the start differs)", () => {
    const read = sweep({ ...base, book: readingBook(book) });
    read.forEach(({ paste }, i) => {
      expect(paste.assemblage.warmStarted).toBe(true);
      expect(paste.assemblage.phases.map((p) => p.id)).toEqual(reference[i].paste.assemblage.phases.map((p) => p.id));
      for (const [id, volume] of Object.entries(reference[i].paste.volumes)) expect(paste.volumes[id], `${id} at point ${i}`).toBeCloseTo(volume, 6);
      // Starting at the solution itself, Newton has nothing left to do beyond a step or two.
      expect(paste.assemblage.iterations).toBeLessThanOrEqual(reference[i].paste.assemblage.iterations);
    });
  });

  it("still ends at the sample's own minimum when the data are perturbed: no allowed solid is left supersaturated", () => {
    const sampled = sampleDataset(dataset, createRng(3, 0));
    expect(sampled).not.toBe(dataset);
    for (const { paste } of sweep({ ...base, dataset: sampled, book: readingBook(book) })) expect(supersaturatedSolid(paste, base)).toBeUndefined();
  });

  it("starts the first point from the base's converged paste when one is given", () => {
    const first = sweep({ ...base, warmFrom: reference[0].paste })[0].paste;
    expect(first.assemblage.warmStarted).toBe(true);
    for (const [id, volume] of Object.entries(reference[0].paste.volumes)) expect(first.volumes[id], id).toBeCloseTo(volume, 6);
  });
});
