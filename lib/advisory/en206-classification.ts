import type { ExposureInput } from "../schema/exposure-input";
import { describeBand, findBand, type ClassBand } from "./class-band";
import type { CharacteristicFinding, ClassAssignment } from "./exposure-class-types";
import { EN206, type En206Characteristic } from "./standards-data";
import { magnesiumFromMagnesiumSulfateMgPerL, soilSulfateMgPerKg } from "./exposure-quantities";

/**
 * Exposure classes of EN 206:2013+A2:2021 (Table 1, and Table 2 for chemical attack) from the
 * exposure input. Rules implemented as the standard states them:
 * - Table 2: the most onerous single characteristic determines the XA class; where two or more
 *   characteristics lead to that same class, the next higher class applies unless a special study shows
 *   otherwise; values beyond the XA3 limits are outside the table (special study).
 * - XC/XD/XS apply only to concrete with reinforcement or embedded metal; XF only to concrete wet while freezing.
 */

export type XaClass = "XA1" | "XA2" | "XA3";

export type En206ChemicalResult = {
  findings: CharacteristicFinding[];
  /** Governing XA class after the coincidence rule; null where no characteristic reaches XA1. */
  governingClass: XaClass | null;
  /** The characteristics whose own class equals the most onerous one. */
  governingCharacteristics: string[];
  /** True where two or more characteristics reached the same most onerous class and the class was raised. */
  raisedByCoincidence: boolean;
  /** True where a value lies beyond the XA3 limits of Table 2. */
  beyondTable: boolean;
  /** True where a sulfate characteristic (water or soil) is among the governing ones (Annex F SR-cement footnote). */
  sulfateGoverns: boolean;
};

export type En206Classification = {
  standard: string;
  classes: ClassAssignment[];
  chemical: En206ChemicalResult;
  notes: string[];
  jurisdictionNote: string;
};

const XA_ORDER: readonly XaClass[] = ["XA1", "XA2", "XA3"];
const xaRank = (c: string | null): number => (c === "beyond-table" ? 4 : c ? XA_ORDER.indexOf(c as XaClass) + 1 : 0);

const characteristic = (id: En206Characteristic["id"]): En206Characteristic => {
  const c = EN206.chemicalAttack.characteristics.find((x) => x.id === id);
  if (!c) throw new Error(`EN 206 data file lacks characteristic ${id}`);
  return c;
};

function finding(c: En206Characteristic, value: number, bands: readonly ClassBand[], derivedFrom?: string): CharacteristicFinding {
  const band = findBand(bands, value);
  return {
    characteristic: c.id,
    label: c.label,
    value,
    unit: c.unit,
    exposureClass: band?.exposureClass ?? null,
    band: band ? describeBand(band, c.unit) : undefined,
    derivedFrom,
    source: EN206.chemicalAttack.table,
  };
}

/** Table 2 of EN 206 applied to every characteristic present in the input. */
export function classifyEn206ChemicalAttack(e: ExposureInput, notes: string[] = []): En206ChemicalResult {
  const findings: CharacteristicFinding[] = [];
  const sulfate = characteristic("groundwater-sulfate");
  if (e.sulfateMgPerL !== undefined) findings.push(finding(sulfate, e.sulfateMgPerL, sulfate.bands));
  if (e.waterPH !== undefined) findings.push(finding(characteristic("groundwater-ph"), e.waterPH, characteristic("groundwater-ph").bands));
  if (e.aggressiveCo2MgPerL !== undefined) {
    const c = characteristic("groundwater-aggressive-co2");
    findings.push(finding(c, e.aggressiveCo2MgPerL, c.bands));
  }
  if (e.ammoniumMgPerL !== undefined) {
    const c = characteristic("groundwater-ammonium");
    findings.push(finding(c, e.ammoniumMgPerL, c.bands));
  }
  const magnesium = characteristic("groundwater-magnesium");
  if (e.magnesiumMgPerL !== undefined) findings.push(finding(magnesium, e.magnesiumMgPerL, magnesium.bands));
  else if (e.sulfateCation === "Mg" && e.sulfateMgPerL !== undefined) {
    findings.push(
      finding(magnesium, magnesiumFromMagnesiumSulfateMgPerL(e.sulfateMgPerL), magnesium.bands, "sulfate taken as all MgSO4 (Mg/SO4 mass ratio 24.305/96.06, IUPAC atomic weights)"),
    );
  }
  const soil = soilSulfateMgPerKg(e);
  if (soil !== undefined) {
    const c = characteristic("soil-sulfate");
    const accumulation = e.wetting === "wet-dry" && c.accumulation;
    findings.push(finding(c, soil.valueMgPerKg, accumulation ? c.accumulation!.bands : c.bands, soil.derivedFrom));
    if (accumulation) notes.push(`Soil sulfate: wetting and drying assumed to accumulate sulfate — ${c.accumulation!.note}`);
    if (e.soilSulfateExtraction === "water-soluble")
      notes.push("EN 206 Table 2 uses total (acid-soluble) soil sulfate; a water-soluble value can be lower and may under-classify.");
  }
  if (e.soilAcidityBaumannGullyMlPerKg !== undefined) {
    const c = characteristic("soil-acidity");
    findings.push(finding(c, e.soilAcidityBaumannGullyMlPerKg, c.bands));
  }

  const top = Math.max(0, ...findings.map((f) => xaRank(f.exposureClass)));
  const governing = findings.filter((f) => f.exposureClass !== null && xaRank(f.exposureClass) === top);
  const beyondTable = top === 4;
  let governingClass: XaClass | null = top === 0 ? null : XA_ORDER[Math.min(top, 3) - 1];
  let raisedByCoincidence = false;
  if (governingClass && !beyondTable && governing.length >= 2) {
    raisedByCoincidence = true;
    if (governingClass === "XA3") notes.push("Two or more characteristics reach XA3: a special study of the exposure is needed (EN 206 Table 2).");
    else governingClass = XA_ORDER[XA_ORDER.indexOf(governingClass) + 1];
  }
  if (beyondTable) notes.push(EN206.chemicalAttack.beyondTableNote);
  const temperatures = e.serviceTemperatureC;
  if (findings.length > 0 && temperatures !== undefined) {
    const { minC, maxC } = typeof temperatures === "number" ? { minC: temperatures, maxC: temperatures } : temperatures;
    if (minC < 5 || maxC > 25) notes.push(`Table 2 applies at water/soil temperatures of 5–25 °C; the service range ${minC}–${maxC} °C lies partly outside it.`);
  }
  return {
    findings,
    governingClass,
    governingCharacteristics: governing.map((f) => f.characteristic),
    raisedByCoincidence,
    beyondTable,
    sulfateGoverns: governing.some((f) => f.characteristic === "groundwater-sulfate" || f.characteristic === "soil-sulfate"),
  };
}

const describe = (cls: string): string => EN206.exposureClasses.classes[cls] ?? cls;
const TABLE1 = EN206.exposureClasses.table;

function assign(exposureClass: string, family: string, basis: string, source = TABLE1): ClassAssignment {
  return { exposureClass, family, description: describe(exposureClass), basis, source };
}

type Saturation = "moderate" | "high" | "not-wet";

function freezingSaturation(e: ExposureInput): Saturation | undefined {
  if (e.freezing?.waterSaturation) return e.freezing.waterSaturation;
  switch (e.wetting) {
    case "permanently-wet":
    case "wet-rarely-dry":
    case "wet-dry":
      return "high";
    case "unsheltered":
      return "moderate";
    case "sheltered":
    case "dry":
      return "not-wet";
    default:
      return undefined;
  }
}

/** Seawater zone entered, or derived from the wetting regime; undefined where there is no sea water. */
export function seawaterZoneOf(e: ExposureInput): "airborne" | "submerged" | "tidal-splash-spray" | undefined {
  if (e.seawater === undefined || e.seawater === false) return undefined;
  if (e.seawater !== true) return e.seawater;
  switch (e.wetting) {
    case "permanently-wet":
      return "submerged";
    case "sheltered":
    case "dry":
      return "airborne";
    default:
      return "tidal-splash-spray"; // wet-dry, unsheltered, wet-rarely-dry, or not given: the most onerous zone
  }
}

/** All EN 206 exposure classes the input supports. */
export function classifyEn206(e: ExposureInput): En206Classification {
  const notes: string[] = [];
  const classes: ClassAssignment[] = [];
  const wetting = e.wetting;

  if (e.reinforced) {
    const xc: Record<NonNullable<ExposureInput["wetting"]>, string> = {
      dry: "XC1",
      "permanently-wet": "XC1",
      "wet-rarely-dry": "XC2",
      sheltered: "XC3",
      unsheltered: "XC4",
      "wet-dry": "XC4",
    };
    if (wetting) classes.push(assign(xc[wetting], "XC", `wetting "${wetting}"`));
    else notes.push("XC not classified: give the wetting regime.");

    const zone = seawaterZoneOf(e);
    if (zone) {
      const xs = { airborne: "XS1", submerged: "XS2", "tidal-splash-spray": "XS3" }[zone];
      classes.push(assign(xs, "XS", e.seawater === true ? `sea water, zone "${zone}" derived from wetting "${wetting ?? "not given"}"` : `sea water, zone "${zone}"`));
    }
    const otherChloride = e.deIcingSalts === true || (!zone && (e.chlorideMgPerL ?? 0) > 0);
    if (otherChloride) {
      const xd = !wetting || wetting === "wet-dry" || wetting === "unsheltered" ? "XD3" : wetting === "permanently-wet" || wetting === "wet-rarely-dry" ? "XD2" : "XD1";
      const source = e.deIcingSalts ? "de-icing salts" : `chloride ${e.chlorideMgPerL} mg/L in water`;
      classes.push(assign(xd, "XD", `${source}, wetting "${wetting ?? "not given (most onerous assumed)"}"`));
      if (!e.deIcingSalts) notes.push("EN 206 sets no chloride concentration for XD: any chloride entered for the contact water is treated as a chloride source.");
    }
  } else {
    notes.push("No reinforcement or embedded metal: XC, XD and XS do not apply.");
  }

  if (e.freezing?.exposed) {
    const saturation = freezingSaturation(e);
    const salts = e.deIcingSalts === true || seawaterZoneOf(e) !== undefined;
    if (saturation === "moderate" || saturation === "high") {
      const xf = saturation === "moderate" ? (salts ? "XF2" : "XF1") : salts ? "XF4" : "XF3";
      classes.push(assign(xf, "XF", `freeze–thaw, ${saturation} water saturation${salts ? ", with de-icing agent or sea water" : ""}`));
    } else if (saturation === "not-wet") notes.push("Freezing without wetting: EN 206 XF applies to concrete exposed to freeze–thaw whilst wet; no XF class assigned.");
    else notes.push("XF not classified: give freezing.waterSaturation or the wetting regime.");
  }

  const chemical = classifyEn206ChemicalAttack(e, notes);
  if (chemical.governingClass) {
    const parts = chemical.findings
      .filter((f) => f.exposureClass)
      .map((f) => `${f.label} ${f.value} ${f.unit} → ${f.exposureClass} (${f.band})`);
    if (chemical.raisedByCoincidence) parts.push(`two or more characteristics reach the same class: raised to ${chemical.governingClass}`);
    classes.push(assign(chemical.governingClass, "XA", parts.join("; "), EN206.chemicalAttack.table));
  }

  if (classes.length === 0) classes.push(assign("X0", "X0", e.reinforced ? "no aggressive exposure identified" : "no reinforcement, no freeze–thaw or chemical attack identified"));

  return { standard: EN206.standard, classes, chemical, notes, jurisdictionNote: EN206.jurisdictionNote };
}
