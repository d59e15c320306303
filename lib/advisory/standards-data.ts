import { z } from "zod";
import en206Json from "../data/standards/en-206-exposure.json";
import aci318Json from "../data/standards/aci-318-exposure.json";

/** Form of the exposure-standard data files in `lib/data/standards/`, checked when loaded. */

const band = z.object({
  exposureClass: z.string(),
  min: z.number().nullable(),
  minInclusive: z.boolean(),
  max: z.number().nullable(),
  maxInclusive: z.boolean(),
});

const provenance = z.object({ sources: z.array(z.string()).min(1), generatedBy: z.string(), date: z.string() });

const en206Characteristic = z.object({
  id: z.enum([
    "groundwater-sulfate",
    "groundwater-ph",
    "groundwater-aggressive-co2",
    "groundwater-ammonium",
    "groundwater-magnesium",
    "soil-sulfate",
    "soil-acidity",
  ]),
  label: z.string(),
  unit: z.string(),
  testMethod: z.string(),
  recalledFromMemory: z.boolean(),
  bands: z.array(band).min(1),
  accumulation: z.object({ appliesWhen: z.string(), note: z.string(), bands: z.array(band).min(1) }).optional(),
  note: z.string().optional(),
});

const en206Limits = z.object({
  maxWaterCementRatio: z.number().nullable(),
  minStrengthClass: z.string(),
  minCementContentKgPerM3: z.number().nullable(),
  minAirContentPercent: z.number().nullable(),
  sulfateResistingCement: z.boolean(),
  freezeThawResistantAggregate: z.boolean(),
  recalledFromMemory: z.boolean(),
});

export const en206DataFile = z.object({
  standard: z.string(),
  title: z.string(),
  provenance,
  jurisdictionNote: z.string(),
  chemicalAttack: z.object({
    table: z.string(),
    scope: z.string(),
    governingRule: z.string(),
    beyondTableNote: z.string(),
    characteristics: z.array(en206Characteristic),
  }),
  exposureClasses: z.object({ table: z.string(), recalledFromMemory: z.boolean(), classes: z.record(z.string(), z.string()) }),
  limitingValues: z.object({
    table: z.string(),
    note: z.string(),
    classes: z.record(z.string(), en206Limits),
    sulfateResistingNote: z.string(),
  }),
  strengthClasses: z.object({
    table: z.string(),
    recalledFromMemory: z.boolean(),
    classes: z.array(z.object({ strengthClass: z.string(), fckCylinderMPa: z.number(), fckCubeMPa: z.number() })),
  }),
});

const aciSulfateMedium = z.object({
  label: z.string(),
  unit: z.string(),
  testMethod: z.string(),
  recalledFromMemory: z.boolean(),
  bands: z.array(band).min(1),
});

const aciRequirement = z.object({
  maxWaterCementitiousRatio: z.number().nullable(),
  minFcMPa: z.number(),
  minFcPsi: z.number(),
  airEntrainmentRequired: z.boolean().optional(),
  limitsOnSupplementaryMaterials: z.string().optional(),
  sulfateResistance: z.enum(["none", "MS", "HS"]).optional(),
  requiresPozzolanOrSlag: z.boolean().optional(),
  cementitiousTypes: z.array(z.string()).optional(),
  alternative: z
    .object({
      maxWaterCementitiousRatio: z.number(),
      minFcMPa: z.number(),
      minFcPsi: z.number(),
      requiresPozzolanOrSlag: z.boolean(),
      cementitiousTypes: z.array(z.string()),
    })
    .optional(),
  calciumChlorideAdmixture: z.enum(["no restriction", "not permitted"]).optional(),
  maxChlorideIonPercentOfCementitious: z.object({ nonprestressed: z.number(), prestressed: z.number() }).optional(),
  note: z.string().optional(),
  recalledFromMemory: z.boolean(),
});

export const aci318DataFile = z.object({
  standard: z.string(),
  title: z.string(),
  provenance,
  jurisdictionNote: z.string(),
  sulfate: z.object({
    table: z.string(),
    governingRule: z.string(),
    soil: aciSulfateMedium,
    water: aciSulfateMedium,
    seawaterClass: z.string(),
    ppmNote: z.string(),
  }),
  categories: z.object({ table: z.string(), recalledFromMemory: z.boolean(), classes: z.record(z.string(), z.string()) }),
  requirements: z.object({ table: z.string(), note: z.string(), classes: z.record(z.string(), aciRequirement) }),
});

export type En206Data = z.infer<typeof en206DataFile>;
export type En206Characteristic = z.infer<typeof en206Characteristic>;
export type En206Limits = z.infer<typeof en206Limits>;
export type Aci318Data = z.infer<typeof aci318DataFile>;
export type Aci318Requirement = z.infer<typeof aciRequirement>;

/** The EN 206 data, checked against its schema once at load. */
export const EN206: En206Data = en206DataFile.parse(en206Json);
/** The ACI 318 data, checked against its schema once at load. */
export const ACI318: Aci318Data = aci318DataFile.parse(aci318Json);
