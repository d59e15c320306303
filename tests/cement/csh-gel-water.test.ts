import { describe, it, expect } from "vitest";
import { gelWaterInCarriersMol, particleWaterPerSilicon } from "../../lib/cement/csh-gel-water";

// End-member formulas as element counts: (CaO)x(SiO2)y(H2O)z → Ca x, Si y, H 2z, O x + 2y + z.
const endMember = (ca: number, si: number, h2o: number) => ({ Ca: ca, Si: si, H: 2 * h2o, O: ca + 2 * si + h2o });
const elements: Record<string, Record<string, number>> = {
  "csh-ca1.6667-si1": endMember(1.6667, 1, 2.1),
  "csh-ca0.8333-si1": endMember(0.8333, 1, 1.3333),
  "csh-ca1.5-si0.6667": endMember(1.5, 0.6667, 2.5),
  "csh-ca0.6667-si1": endMember(0.6667, 1, 1.5),
};
const elementsOf = (id: string) => elements[id] ?? {};

describe("the water of the C-S-H solid particle", () => {
  it("is 1.3333 H2O/Si at Ca/Si 0.8333 and 2.1 at 1.6667 (the end-members of Kulik & Kersten 2001, gel-pores.json), linear between and constant outside", () => {
    expect(particleWaterPerSilicon(0.8333)).toBeCloseTo(1.3333, 12);
    expect(particleWaterPerSilicon(1.6667)).toBeCloseTo(2.1, 12);
    expect(particleWaterPerSilicon(1.25)).toBeCloseTo(1.3333 + (0.7667 * (1.25 - 0.8333)) / 0.8334, 12);
    expect(particleWaterPerSilicon(0.5)).toBe(1.3333);
    expect(particleWaterPerSilicon(2.25)).toBe(2.1);
  });
});

describe("the gel water inside the C-S-H end-members", () => {
  it("is zero for end-members on the particle line", () => {
    const assemblage = { phases: [{ id: "csh", moles: 1, members: [{ id: "csh-ca1.6667-si1", moles: 0.7 }, { id: "csh-ca0.8333-si1", moles: 0.3 }] }] };
    expect(gelWaterInCarriersMol(assemblage as never, elementsOf)).toBeCloseTo(0, 12);
  });

  it("counts the water above the line: 2.5 − 2.1 × 0.6667 = 1.1 mol per mol of the Ca/Si 2.25 end-member, 1.5 − 1.3333 per mol of the Ca/Si 0.67 one (by hand)", () => {
    const assemblage = { phases: [{ id: "csh", moles: 3, members: [{ id: "csh-ca1.5-si0.6667", moles: 2 }, { id: "csh-ca0.6667-si1", moles: 1 }] }, { id: "portlandite", moles: 5 }] };
    expect(gelWaterInCarriersMol(assemblage as never, elementsOf)).toBeCloseTo(2 * (2.5 - 2.1 * 0.6667) + (1.5 - 1.3333), 10);
  });
});
