"use client";

import { useEffect } from "react";
import { useFormContext } from "react-hook-form";
import maturityStrength from "../../lib/data/curing/maturity-strength.json";
import { NumberField } from "./fields";
import { SeriesFields } from "./series-fields";

/** The schema's cap on `heatCurve.points` (lib/schema/curing-input.ts); the schema checks it again on submit. */
const MAX_HEAT_POINTS = 10000;

/**
 * Starting values of an entered heat curve, from the maturity data (lib/data/curing/maturity-strength.json):
 * the 20 °C reference temperature (EN 12390-2 specimen curing) and the 40 kJ/mol apparent activation energy
 * (ASTM C1074 appendix; Carino & Lew 2001 report 33–50 kJ/mol for plain Portland cements). Both are recalled
 * values in that file; the engineer replaces them with the calorimetry's own.
 */
export const heatCurveDefaults = {
  referenceTemperatureC: maturityStrength.referenceTemperatureC.default,
  activationEnergyJPerMol: maturityStrength.activationEnergyJPerMol.default,
} as const;

const [lowActivationJPerMol, highActivationJPerMol] = maturityStrength.activationEnergyJPerMol.range;

/**
 * A measured heat-of-hydration curve (e.g. isothermal calorimetry) replacing the default heat model: rows of
 * equivalent age at the reference temperature (h) and cumulative heat per gram of binder (J/g), typed or pasted
 * as two spreadsheet columns, with the calorimetry's temperature and the apparent activation energy that moves
 * the curve to other temperatures. The schema requires 2–10000 points, ages increasing, heat not decreasing.
 */
export function HeatCurveFields({ name = "curing.thermal.heatCurve" }: { name?: string }) {
  const { getValues, setValue } = useFormContext();
  useEffect(() => {
    // Filled once when the part is opened; a loaded input keeps its own values.
    for (const [key, value] of Object.entries(heatCurveDefaults)) {
      if (getValues(`${name}.${key}`) === undefined) setValue(`${name}.${key}`, value);
    }
  }, [getValues, setValue, name]);
  return (
    <div className="heat-curve">
      <div className="row">
        <NumberField
          name={`${name}.referenceTemperatureC`}
          label="Calorimetry temperature"
          unit="°C"
          required
          hint={`0–60 °C; the temperature at which the curve was measured (its ages are equivalent ages at this temperature). Default ${heatCurveDefaults.referenceTemperatureC} °C, standard specimen curing (EN 12390-2).`}
        />
        <NumberField
          name={`${name}.activationEnergyJPerMol`}
          label="Apparent activation energy"
          unit="J/mol"
          required
          hint={`10000–80000 J/mol; moves the curve to the element's temperature (Arrhenius). Default ${heatCurveDefaults.activationEnergyJPerMol} J/mol (ASTM C1074 appendix, about 40–45 kJ/mol for Type I cement; Carino & Lew 2001: ${lowActivationJPerMol}–${highActivationJPerMol} J/mol for plain Portland cements, higher with slag; from memory).`}
        />
      </div>
      <SeriesFields
        name={`${name}.points`}
        className="heat-curve-points"
        columns={[
          { key: "equivalentAgeH", label: "equivalent age", unit: "h", pasteName: "hour" },
          { key: "cumulativeHeatJPerG", label: "cumulative heat", unit: "J/g", pasteName: "J/g" },
        ]}
        maxPoints={MAX_HEAT_POINTS}
        hint={`Equivalent age at the calorimetry temperature (0–100000 h, increasing) and heat released per gram of binder since mixing (0–1000 J/g, not decreasing; 1 J/g = 1 kJ/kg); 2 to ${MAX_HEAT_POINTS} points, linear between them. Start at 0 h, 0 J/g.`}
        rowLabel="Heat point"
        addLabel="Add a heat point"
        pasteSummary="Paste the heat curve from a spreadsheet"
        pasteLabel="Rows of hour and J/g (tab, semicolon or comma separated; a header row is skipped)"
        fillLabel="Fill the heat curve"
      />
    </div>
  );
}
