import cementPresets from "../../lib/data/binders/cement-presets.json";
import scmPresets from "../../lib/data/binders/scm-presets.json";
import surfaceCovers from "../../lib/data/curing/surface-covers.json";
import { elementTypes } from "../../lib/schema/assess-input";
import { scmTypes } from "../../lib/schema/binder-input";
import { strengthClasses } from "../../lib/schema/specification-input";
import type { Choice } from "./fields";

/** Choices of the form's selects, from the schema and the data files (never typed twice). */
export const elementTypeChoices: Choice[] = elementTypes.map((t) => ({ value: t, label: t.replace(/-/g, " ") }));

export const cementPresetChoices: Choice[] = cementPresets.presets.map((p) => ({ value: p.id, label: `${p.name} (${p.standard}; ${p.label})` }));

export const scmTypeChoices: Choice[] = scmTypes.map((t) => ({ value: t, label: t.replace(/-/g, " ") }));

export const scmPresetChoices: Choice[] = scmPresets.presets.map((p) => ({ value: p.id, label: `${p.name} (${p.label})` }));

export const scmPresetForType = (type: string): string | undefined => scmPresets.presets.find((p) => p.type === type)?.id;

export const coverChoices: Choice[] = surfaceCovers.covers.map((c) => ({ value: c.id, label: c.name }));

export const wettingChoices: Choice[] = [
  { value: "permanently-wet", label: "permanently wet (submerged, buried below water table)" },
  { value: "wet-rarely-dry", label: "wet, rarely dry" },
  { value: "wet-dry", label: "cyclic wet and dry" },
  { value: "unsheltered", label: "outdoors, exposed to rain" },
  { value: "sheltered", label: "outdoors, sheltered from rain" },
  { value: "dry", label: "dry (indoors, low humidity)" },
];

export const cationChoices: Choice[] = [
  { value: "Na", label: "sodium (Na₂SO₄)" },
  { value: "Mg", label: "magnesium (MgSO₄)" },
  { value: "Ca", label: "calcium (CaSO₄)" },
  { value: "K", label: "potassium (K₂SO₄)" },
];

export const seawaterChoices: Choice[] = [
  { value: "yes", label: "yes (zone from the wetting regime)" },
  { value: "airborne", label: "airborne salt, not in contact" },
  { value: "submerged", label: "permanently submerged" },
  { value: "tidal-splash-spray", label: "tidal, splash and spray zone" },
];

/** The seawater select's value in the schema's terms ("yes" → true). */
export const seawaterValue = (v: unknown): boolean | string | undefined => (v === "" || v === undefined || v === null ? undefined : v === "yes" ? true : String(v));

export const strengthClassChoices: Choice[] = strengthClasses.map((c) => ({ value: c, label: c }));

export const sulfateResistanceChoices: Choice[] = [
  { value: "none", label: "none (e.g. CEM I, ASTM C150 Type I)" },
  { value: "MS", label: "moderate, MS (ASTM C150 Type II, C595 (MS), C1157 MS)" },
  { value: "HS", label: "high, HS (ASTM C150 Type V, C595 (HS), C1157 HS; EN 197-1 SR)" },
];

export const yesNoChoices: Choice[] = [
  { value: "no", label: "no" },
  { value: "yes", label: "yes" },
];

/** A yes/no select's value for the schema: true, false, or undefined when not stated. */
export const yesNoOrUndefined = (value: unknown): boolean | undefined => (value === "yes" || value === true ? true : value === "no" || value === false ? false : undefined);
