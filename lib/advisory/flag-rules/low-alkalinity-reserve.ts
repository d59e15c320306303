import type { Flag } from "../flag";
import { advisoryThresholds } from "../thresholds";

const t = advisoryThresholds.lowAlkalinityReserve;

/** `low-alkalinity-reserve`: little portlandite left to buffer the pore solution (high-SCM binders, leaching). */
export function lowAlkalinityReserveFlag(paste: { portlanditeKgPerM3: number; carbonatableCaMolPerM3: number; pH: number | null }): Flag | undefined {
  if (paste.portlanditeKgPerM3 >= t.cautionPortlanditeKgPerM3.value) return undefined;
  return {
    id: "low-alkalinity-reserve",
    severity: "caution",
    title: "Low alkalinity reserve: little portlandite in the paste",
    explanation:
      `The assemblage holds ${paste.portlanditeKgPerM3.toFixed(1)} kg portlandite per m³ of concrete (below ${t.cautionPortlanditeKgPerM3.value} kg/m³); ` +
      `the pH (${paste.pH?.toFixed(2) ?? "—"}) is then buffered by C-S-H of lower Ca/Si and alkalis alone, and ${paste.carbonatableCaMolPerM3.toFixed(0)} mol/m³ of Ca remain to bind CO2.`,
    basis: `Screening value of this tool (${t.cautionPortlanditeKgPerM3.basis}); Lothenbach, Scrivener & Hooton 2011, Cem. Concr. Res. 41, 1244 (portlandite in blended cements).`,
    actions: ["Check carbonation depth against cover with EN 12390-12 or natural exposure data for this binder.", "Where reinforcement is present in XC3/XC4, consider a lower SCM content or more cover."],
  };
}
