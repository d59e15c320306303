import { z } from "zod";
import en206 from "../data/standards/en-206-exposure.json";

/**
 * What the specification states about the concrete beyond the mix proportions, for the comparison with the limiting
 * values of the exposure classes (EN 206 Annex F Table F.1; ACI 318-19 Table 19.3.2.1). Optional: an item left out is
 * reported as "not assessed", never guessed.
 */

/** EN 206 compressive strength classes (Table 12), from the standards data file. */
export const strengthClasses = en206.strengthClasses.classes.map((c) => c.strengthClass) as [string, ...string[]];

/** ASTM sulfate-resistance designations of the cementitious materials: none, moderate (MS: C150 Type II, C595 (MS), C1157 MS), high (HS: Type V, (HS), HS; EN 197-1 SR cements read as HS). */
export const sulfateResistanceDesignations = ["none", "MS", "HS"] as const;

/** Specified strengths accepted, MPa: the span of the EN 206 classes, C8/10 to C100/115 (fck,cyl 8–100 MPa). */
export const SPECIFIED_STRENGTH_LIMITS_MPA = { min: 8, max: 100 } as const;

export const specificationInput = z
  .object({
    strengthClass: z.enum(strengthClasses, { error: `specification.strengthClass must be one of ${strengthClasses.join(", ")} (EN 206 Table 12)` }).optional(),
    /** Specified cylinder strength, MPa (ACI 318 f'c, or EN fck,cyl without a class); a class, when given, governs. */
    specifiedStrengthMPa: z
      .number({ error: "specification.specifiedStrengthMPa must be a number (MPa)" })
      .min(SPECIFIED_STRENGTH_LIMITS_MPA.min, { error: `specification.specifiedStrengthMPa must be between ${SPECIFIED_STRENGTH_LIMITS_MPA.min} and ${SPECIFIED_STRENGTH_LIMITS_MPA.max} MPa` })
      .max(SPECIFIED_STRENGTH_LIMITS_MPA.max, { error: `specification.specifiedStrengthMPa must be between ${SPECIFIED_STRENGTH_LIMITS_MPA.min} and ${SPECIFIED_STRENGTH_LIMITS_MPA.max} MPa` })
      .optional(),
    sulfateResistance: z.enum(sulfateResistanceDesignations, { error: `specification.sulfateResistance must be one of ${sulfateResistanceDesignations.join(", ")}` }).optional(),
    calciumChlorideAdmixture: z.boolean({ error: "specification.calciumChlorideAdmixture must be true or false" }).optional(),
    prestressed: z.boolean({ error: "specification.prestressed must be true or false" }).optional(),
  })
  .strict();

export type SpecificationInput = z.output<typeof specificationInput>;
