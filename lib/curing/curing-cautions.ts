/** The cautions every curing result carries: what kind of guide it is and who decides. */
export type CuringCaution = { id: string; text: string };

export const curingCautions: readonly CuringCaution[] = [
  {
    id: "curing-guide-only",
    text:
      "This is a planning guide: a 1-D heat model with a published hydration-heat regression and default material " +
      "properties. Real temperatures depend on the actual cement, mix, formwork, weather and placement sequence.",
  },
  {
    id: "curing-defer-to-standards",
    text:
      "Defer to ACI 207.1R/207.2R (mass concrete), ACI 305R (hot weather), ACI 306R (cold weather), ACI 308R " +
      "(curing), EN 13670 and the project specification, and to national annexes and local codes where they differ.",
  },
  {
    id: "curing-verify-by-monitoring",
    text:
      "Verify with temperature monitoring of the element (embedded sensors at core and surface) and with maturity " +
      "calibration of the actual mix (ASTM C1074) before using strengths for stripping, prestress transfer or loading.",
  },
  {
    id: "curing-responsible-engineer",
    text:
      "Decisions on stripping, loading, curing duration and thermal control rest with a responsible, licensed " +
      "engineer and with testing by a qualified laboratory.",
  },
  {
    id: "curing-early-strength",
    text:
      "The fib Model Code 2010 strength function has no setting offset: it gives a small but non-zero strength " +
      "within hours of placement and overstates strength before about one day of equivalent age. Treat early " +
      "stripping or transfer times as indicative and confirm with cube/cylinder or maturity-calibrated tests.",
  },
  {
    id: "curing-recalled-values",
    text:
      "Several regression coefficients and table values in the data files were recalled rather than read from " +
      "the source and are marked so; confirm them against the cited documents before tightening any decision.",
  },
];
