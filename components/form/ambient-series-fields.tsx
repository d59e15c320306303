"use client";

import { SeriesFields } from "./series-fields";

/** The schema's cap on `ambient.points` (lib/schema/curing-input.ts); the schema checks it again on submit. */
const MAX_AMBIENT_POINTS = 10000;

/**
 * An entered ambient temperature series: rows of hour after placement and air temperature (°C), typed or
 * pasted as two spreadsheet columns. The schema requires 2–10000 points with increasing hours.
 */
export function AmbientSeriesFields({ name = "curing.thermal.ambient.points" }: { name?: string }) {
  return (
    <SeriesFields
      name={name}
      className="ambient-series"
      columns={[
        { key: "timeH", label: "time", unit: "h", pasteName: "hour" },
        { key: "temperatureC", label: "air temperature", unit: "°C", pasteName: "°C" },
      ]}
      maxPoints={MAX_AMBIENT_POINTS}
      hint={`Hours after placement (0–2160 h, increasing) and air temperature (−40 to 60 °C); 2 to ${MAX_AMBIENT_POINTS} points, linear between them.`}
      rowLabel="Point"
      addLabel="Add a point"
      pasteSummary="Paste two columns from a spreadsheet"
      pasteLabel="Rows of hour and °C (tab, semicolon or comma separated; a header row is skipped)"
      fillLabel="Fill the series"
    />
  );
}
