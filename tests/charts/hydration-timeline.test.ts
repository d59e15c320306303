import { describe, it, expect } from "vitest";
import { hydrationTimelineChart, type TimelinePointVolumes } from "../../lib/charts/hydration-timeline";

describe("hydration timeline chart", () => {
  const points: TimelinePointVolumes[] = [
    { ageDays: 28, phaseVolumesCm3: { "C-S-H": 22, alite: 2 } },
    { ageDays: 1, phaseVolumesCm3: { "C-S-H": 9, alite: 18 } },
    { ageDays: 0, phaseVolumesCm3: { alite: 30 } },
  ];

  it("uses a logarithmic age axis in days and drops ages that cannot sit on it", () => {
    const chart = hydrationTimelineChart(points);
    expect(chart.x).toMatchObject({ scale: "log", unit: "d" });
    expect(chart.rows.map((r) => r.ageDays)).toEqual([1, 28]);
  });

  it("keeps the volume of every phase at every age", () => {
    const chart = hydrationTimelineChart(points);
    const alite = chart.series.find((s) => s.label === "alite")!;
    expect(chart.rows.map((r) => r[alite.key])).toEqual([18, 2]);
  });
});
