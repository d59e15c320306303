// @vitest-environment jsdom
import { describe, it, expect, vi, afterEach } from "vitest";
import { cleanup, render, screen, within } from "@testing-library/react";
import { CompareView } from "../../../components/projects/compare-view";
import { compareAssessments } from "../../../lib/store/compare";
import type { SavedAssessment } from "../../../lib/store/assessment-store";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** A saved record for the comparison (typical inputs invented for the test, not computed results). */
function saved(id: string, suppressedPhases: string[], allowedPhases: string[]): SavedAssessment {
  return {
    id,
    name: `Wall ${id}`,
    projectName: "Quay wall",
    createdAt: "2026-12-01T10:00:00.000Z",
    updatedAt: "2026-12-01T10:00:00.000Z",
    versions: { dataset: "d", engine: "e" },
    isCurrent: true,
    outdated: [],
    inputs: { mix: { waterBinderRatio: id === "a" ? 0.45 : 0.5 }, options: { sweepPoints: 20, suppressedPhases, allowedPhases } },
    result: { flags: [], assemblage: { pH: 13.1 } },
  };
}

function serveComparison(records: SavedAssessment[]) {
  const body = JSON.stringify(compareAssessments(records));
  vi.stubGlobal("fetch", vi.fn(async () => new Response(body, { status: 200, headers: { "content-type": "application/json" } })));
}

describe("the compare page's inputs that differ", () => {
  it("names the suppressed and allowed phases by their readable names (C-S-H, Monosulfate (12 H2O): common practice), never by id", async () => {
    serveComparison([saved("a", ["csh"], []), saved("b", ["monosulfate-12"], ["friedel-salt"])]);
    render(<CompareView ids={["a", "b"]} />);
    const table = await screen.findByRole("region", { name: "Inputs that differ (scrollable)" });
    const row = within(table).getByText("options.suppressedPhases.0").closest("tr")!;
    const cells = within(row).getAllByRole("cell").map((c) => c.textContent);
    expect(cells).toEqual(["C-S-H", "Monosulfate (12 H2O) (differs)"]);
    const allowed = within(table).getByText("options.allowedPhases.0").closest("tr")!;
    // Absent in the first record: the JSON of the API carries it as null, shown as "–".
    expect(within(allowed).getAllByRole("cell").map((c) => c.textContent)).toEqual(["–", "Friedel's salt (differs)"]);
    const text = table.textContent ?? "";
    for (const id of ["monosulfate-12", "friedel-salt"]) expect(text).not.toContain(id);
    expect(text).not.toMatch(/(?<![A-Za-z-])csh(?![A-Za-z-])/);
    // Values that are not phases keep their form.
    const wb = within(table).getByText("mix.waterBinderRatio").closest("tr")!;
    expect(within(wb).getAllByRole("cell").map((c) => c.textContent)).toEqual(["0.45", "0.5 (differs)"]);
  });
});
