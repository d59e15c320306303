import { describe, it, expect } from "vitest";
import { loadDataset } from "../../lib/data/load-dataset";
import { reactionBalance } from "../../lib/data/reaction-balance";

const loaded = loadDataset();
if (!loaded.ok) throw new Error(loaded.error.message);
const dataset = loaded.value;
const reactionDefined = dataset.species.filter((s) => s.logK);

describe("reactionBalance", () => {
  it("finds the reaction-defined starter entries (and checks those of every other data file too)", () => {
    const starter = reactionDefined.filter((s) => s.family.startsWith("starter-"));
    expect(starter.map((s) => s.id).sort()).toEqual(["CaCO3(aq)", "CaHCO3+", "CaOH+", "CaSO4(aq)"]);
  });

  // Conservation of elements and charge in every reaction (common practice: a reaction must balance).
  it.each(reactionDefined.map((s) => [s.id, s] as const))("balances elements and charge in the reaction of %s", (_id, species) => {
    const balance = reactionBalance(dataset, species);
    expect(balance.ok).toBe(true);
    if (!balance.ok) return;
    for (const residual of Object.values(balance.value.elementResidual)) expect(Math.abs(residual)).toBeLessThan(1e-9);
    expect(Math.abs(balance.value.chargeResidual)).toBeLessThan(1e-9);
  });

  it("reports an unbalanced reaction", () => {
    const calciumOnly = { ...reactionDefined[0], logK: { reaction: { "Ca+2": 1 }, log10K25: 0, deltaHJPerMol: 0, deltaCpJPerMolK: 0 } };
    const balance = reactionBalance(dataset, calciumOnly);
    expect(balance.ok).toBe(true);
    if (balance.ok) {
      const residuals = [...Object.values(balance.value.elementResidual), balance.value.chargeResidual];
      expect(residuals.some((r) => Math.abs(r) > 0.5)).toBe(true);
    }
  });

  it("reports a reference to a species that is not in the data set", () => {
    const dangling = { ...reactionDefined[0], logK: { reaction: { "Zz+9": 1 }, log10K25: 0, deltaHJPerMol: 0, deltaCpJPerMolK: 0 } };
    expect(reactionBalance(dataset, dangling)).toMatchObject({ ok: false, error: { code: "missing_reference", missingId: "Zz+9" } });
  });
});
