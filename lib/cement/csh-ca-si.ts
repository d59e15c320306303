import type { HydratedPaste } from "./hydrate-paste";

/**
 * Ca/Si of the C-S-H solution, Σ xᵢ·Caᵢ / Σ xᵢ·Siᵢ over its end-members. The ids carry both numbers of the formula
 * unit (csh-ca1.5-si0.6667): an average of the Ca numbers alone is the Ca/Si only when every end-member has one Si.
 */
export const caToSiOf = (paste: Pick<HydratedPaste, "assemblage">): number | null => {
  const csh = paste.assemblage.phases.find((p) => p.id === "csh");
  if (!csh?.members) return null;
  let calcium = 0;
  let silicon = 0;
  for (const m of csh.members) {
    const formula = /^csh-ca([\d.]+)-si([\d.]+)$/.exec(m.id);
    if (!formula) return null;
    calcium += m.moleFraction * Number(formula[1]);
    silicon += m.moleFraction * Number(formula[2]);
  }
  return silicon > 0 ? calcium / silicon : null;
};
