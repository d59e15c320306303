import { phaseVolumesChart } from "../../lib/charts/phase-volumes";
import { scenarioSweepChart } from "../../lib/charts/scenario-sweep";
import type { SavedAssessment } from "../../lib/store/assessment-store";

/**
 * A saved assessment for report tests. The numbers are typical, invented for the test (not computed
 * results): the tests check that the report carries them through, not that they are right.
 */
export const sampleSaved: SavedAssessment = {
  id: "a1",
  name: "Harbour wall W3 — sulfate check",
  projectName: "Quay Extension Phase 2",
  createdAt: "2026-12-01T10:00:00.000Z",
  updatedAt: "2026-12-01T10:00:00.000Z",
  versions: { dataset: "abc123", engine: "0.1.0" },
  isCurrent: true,
  outdated: [],
  inputs: {
    project: { name: "Quay Extension Phase 2", reference: "QE2-W3", element: { type: "wall", thicknessM: 0.6, coverMm: 50 } },
    binder: { cement: { preset: "CEM I 42.5 N" }, supplementaryMaterials: [{ type: "slag", massPercentOfBinder: 40 }] },
    mix: { waterBinderRatio: 0.45, binderKgPerM3: 360 },
    options: { sweepPoints: 10, suppressedPhases: ["thaumasite"], allowedPhases: [] },
  },
  result: {
    assemblage: { pH: 13.1 },
    flags: [
      { id: "gypsum-formation", severity: "caution", title: "Gypsum may form", explanation: "Typical explanation.", basis: "common practice", actions: ["Check the sulfate dose."] },
      { id: "sulfate-attack", severity: "warning", title: "Sulfate attack: ettringite expansion possible", explanation: "Typical explanation −1.2 ≤ SI.", basis: "EN 206 Table 2", actions: ["Use a sulfate-resisting cement."], robustness: { firedFraction: 0.84, samples: 200 } },
    ],
    cautions: ["This is a thermodynamic guide (typical caution text for the test).", "Design decisions rest with the applicable codes and a licensed engineer."],
    versions: { dataset: "abc123", engine: "0.1.0" },
  },
};

export const sampleCharts = [
  phaseVolumesChart([{ label: "28 d at 20 °C", phaseVolumesCm3: { "C-S-H": 30, portlandite: 8, ettringite: 6 }, poreSolutionCm3: 12, emptyPorosityCm3: 3 }]),
  scenarioSweepChart({
    id: "sulfate",
    title: "Sulfate ingress",
    doseLabel: "SO4 added",
    doseUnit: "g/100 g binder",
    points: [0, 1, 2, 3].map((dose) => ({ dose, phaseVolumesCm3: { ettringite: 6 + dose * 2, gypsum: Math.max(0, dose - 1.5) * 3 }, pH: 13.1 - dose * 0.1 })),
  }),
];

export const sampleFiles = [{ family: "cement", title: "AFt phases", provenance: { sources: ["Perkins & Palmer 1999, Geochim. Cosmochim. Acta 63, 1969"], generatedBy: "hand", date: "2026-11-20" } }];
