import type { ExposureInput } from "../schema/exposure-input";
import { describeBand, findBand } from "./class-band";
import type { CharacteristicFinding, ClassAssignment } from "./exposure-class-types";
import { seawaterZoneOf } from "./en206-classification";
import { soilSulfateMassPercent } from "./exposure-quantities";
import { ACI318 } from "./standards-data";

/**
 * Exposure categories and classes of ACI 318-19 Table 19.3.1.1 (F, S, W, C) from the exposure input.
 * S: the more severe of the soil and water classes governs; seawater is S1 at least.
 */

export type Aci318Classification = {
  standard: string;
  classes: ClassAssignment[];
  sulfateFindings: CharacteristicFinding[];
  notes: string[];
  jurisdictionNote: string;
};

const TABLE = ACI318.categories.table;
const describe = (cls: string): string => ACI318.categories.classes[cls] ?? cls;
const assign = (exposureClass: string, basis: string, source = TABLE): ClassAssignment => ({
  exposureClass,
  family: exposureClass[0],
  description: describe(exposureClass),
  basis,
  source,
});
const sRank = (c: string): number => ["S0", "S1", "S2", "S3"].indexOf(c);

/** Category S from soil and water sulfate (and seawater). */
export function classifyAci318Sulfate(e: ExposureInput, notes: string[] = []): { assignment: ClassAssignment; findings: CharacteristicFinding[] } {
  const findings: CharacteristicFinding[] = [];
  const { soil, water, table } = ACI318.sulfate;
  if (e.sulfateMgPerL !== undefined) {
    const b = findBand(water.bands, e.sulfateMgPerL);
    findings.push({
      characteristic: "water-sulfate",
      label: water.label,
      value: e.sulfateMgPerL,
      unit: water.unit,
      exposureClass: b?.exposureClass ?? null,
      band: b ? describeBand(b, water.unit) : undefined,
      derivedFrom: "mg/L taken as ppm",
      source: table,
    });
  }
  const soilPercent = soilSulfateMassPercent(e);
  if (soilPercent) {
    const b = findBand(soil.bands, soilPercent.valueMassPercent);
    findings.push({
      characteristic: "soil-sulfate",
      label: soil.label,
      value: soilPercent.valueMassPercent,
      unit: soil.unit,
      exposureClass: b?.exposureClass ?? null,
      band: b ? describeBand(b, soil.unit) : undefined,
      derivedFrom: soilPercent.derivedFrom,
      source: table,
    });
    if (e.soilSulfateExtraction === "acid-soluble")
      notes.push("ACI 318 uses water-soluble soil sulfate (ASTM C1580); an acid-soluble (total) value is higher and classifies conservatively.");
  }
  const seawater = seawaterZoneOf(e) !== undefined;
  let governing = "S0";
  for (const f of findings) if (f.exposureClass && sRank(f.exposureClass) > sRank(governing)) governing = f.exposureClass;
  if (seawater && sRank(governing) < sRank(ACI318.sulfate.seawaterClass)) governing = ACI318.sulfate.seawaterClass;
  if (findings.length === 0 && !seawater) notes.push("No sulfate analysis entered: S0 assumed.");
  if (sRank(governing) >= 1) notes.push(ACI318.sulfate.ppmNote);
  const basis = [
    ...findings.map((f) => `${f.label} ${f.value} ${f.unit} → ${f.exposureClass} (${f.band})`),
    ...(seawater ? ["seawater → S1 at least"] : []),
  ];
  if (findings.length > 1) basis.push("the more severe class governs");
  return { assignment: assign(governing, basis.join("; ") || "no sulfate entered", table), findings };
}

function chlorideSource(e: ExposureInput): string | undefined {
  if (e.deIcingSalts) return "deicing chemicals";
  if (seawaterZoneOf(e)) return "seawater";
  if ((e.chlorideMgPerL ?? 0) > 0) return `chloride ${e.chlorideMgPerL} mg/L in water`;
  return undefined;
}

/** All four ACI 318 exposure categories. */
export function classifyAci318(e: ExposureInput): Aci318Classification {
  const notes: string[] = [];
  const classes: ClassAssignment[] = [];
  const wetting = e.wetting;
  const inContactWithWater =
    wetting !== undefined
      ? !(wetting === "dry" || wetting === "sheltered")
      : e.sulfateMgPerL !== undefined || (e.chlorideMgPerL ?? 0) > 0 || seawaterZoneOf(e) !== undefined;

  // F — freezing and thawing
  if (!e.freezing?.exposed) classes.push(assign("F0", "not exposed to freezing and thawing"));
  else {
    const saturation = e.freezing.waterSaturation ?? (wetting === "unsheltered" || wetting === "sheltered" ? "moderate" : wetting === "dry" ? "none" : "high");
    if (saturation === "none") {
      classes.push(assign("F0", "freezing, but dry in service"));
      notes.push("Freezing with dry service conditions: F0 assigned; confirm that the concrete cannot become wet.");
    } else if (e.deIcingSalts) {
      classes.push(assign("F3", "freezing and thawing with deicing chemicals"));
      if (saturation === "moderate") notes.push("F3 assigned for deicing chemicals although the water exposure was given as limited (conservative).");
    } else classes.push(assign(saturation === "high" ? "F2" : "F1", `freezing and thawing, ${saturation === "high" ? "frequent" : "limited"} exposure to water`));
    if (seawaterZoneOf(e)) notes.push("Sea water with freezing: ACI 318 F3 names deicing chemicals only; consider F3 where sea spray wets the concrete.");
  }

  // S — sulfate
  const sulfate = classifyAci318Sulfate(e, notes);
  classes.push(sulfate.assignment);

  // W — in contact with water
  if (!inContactWithWater) classes.push(assign("W0", wetting ? `wetting "${wetting}"` : "no water contact indicated"));
  else classes.push(assign(e.lowPermeabilityRequired ? "W2" : "W1", `in contact with water${e.lowPermeabilityRequired ? ", low permeability required" : ""}`));
  if (!wetting) notes.push("Wetting regime not given: W and C derived from the water chemistry entered.");

  // C — corrosion protection of reinforcement
  const chloride = chlorideSource(e);
  if (wetting === "dry") classes.push(assign("C0", "dry or protected from moisture"));
  else if (chloride) classes.push(assign("C2", `moisture and an external chloride source (${chloride})`));
  else classes.push(assign("C1", wetting ? `exposed to moisture (wetting "${wetting}"), no external chlorides` : "moisture assumed, no external chlorides"));
  if (!e.reinforced) notes.push("No reinforcement: category C limits on chloride ion content concern embedded metal.");

  return { standard: ACI318.standard, classes, sulfateFindings: sulfate.findings, notes, jurisdictionNote: ACI318.jurisdictionNote };
}
