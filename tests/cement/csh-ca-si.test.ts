import { describe, it, expect } from "vitest";
import { caToSiOf } from "../../lib/cement/csh-ca-si";
import type { HydratedPaste } from "../../lib/cement/hydrate-paste";

describe("the Ca/Si of the C-S-H solution", () => {
  const pasteWith = (members: { id: string; moleFraction: number }[]) => ({ assemblage: { phases: [{ id: "csh", members }] } }) as unknown as HydratedPaste;

  it("weighs Ca and Si by mole fraction over end-members of one Si: 0.8 × 1.67 + 0.2 × 0.83 = 1.502 (by hand)", () => {
    expect(caToSiOf(pasteWith([{ id: "csh-ca1.67-si1", moleFraction: 0.8 }, { id: "csh-ca0.83-si1", moleFraction: 0.2 }]))).toBeCloseTo(1.502, 10);
  });

  it("divides by the Si of end-members with fewer Si per formula unit: (0.5 × 1.5 + 0.5 × 1.3333) / (0.5 × 0.6667 + 0.5 × 1) = 1.70 (by hand), not the 1.42 of the Ca numbers alone", () => {
    expect(caToSiOf(pasteWith([{ id: "csh-ca1.5-si0.6667", moleFraction: 0.5 }, { id: "csh-ca1.3333-si1", moleFraction: 0.5 }]))).toBeCloseTo(1.41665 / 0.83335, 10);
  });

  it("gives null without C-S-H", () => {
    expect(caToSiOf({ assemblage: { phases: [] } } as unknown as HydratedPaste)).toBeNull();
  });
});
