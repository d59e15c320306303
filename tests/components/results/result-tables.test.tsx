// @vitest-environment jsdom
import { describe, it, expect, afterEach } from "vitest";
import { cleanup, render, screen, within } from "@testing-library/react";
import { ExposureClassTable, PoreSolutionTable, poreSolutionOf } from "../../../components/results/result-tables";

afterEach(cleanup);

describe("pore solution table", () => {
  const result = {
    assemblage: {
      pH: 13.41,
      ionicStrength: 0.31,
      solution: { species: [{ name: "H2O@", molality: 55.5, activity: 0.99 }, { name: "K+", molality: 0.21, activity: 0.15 }, { name: "OH-", molality: 0.27, activity: 0.18 }], elementMolality: { K: 0.21, Na: 0.08 } },
    },
  };

  it("reads pH, ionic strength and species from the equilibrium solution, without the solvent", () => {
    render(<PoreSolutionTable result={result} />);
    expect(screen.getByText(/pH 13.41; ionic strength 0.31 mol\/kg/)).toBeTruthy();
    const species = screen.getByRole("table", { name: /Main species/ });
    expect(within(species).queryByText("H2O@")).toBeNull();
    expect(within(species).getByText("K+")).toBeTruthy();
  });

  it("shows nothing for a result without an assemblage", () => {
    expect(poreSolutionOf({})).toBeNull();
    const { container } = render(<PoreSolutionTable result={{}} />);
    expect(container.textContent).toBe("");
  });
});

describe("exposure class table", () => {
  it("lists the classes of both standards and the mix verdicts in words", () => {
    const result = {
      exposure: {
        exposureClasses: {
          en206: { standard: "EN 206:2013+A2:2021", classes: [{ exposureClass: "XA2", description: "moderately aggressive", basis: "SO4 2400 mg/L", source: "EN 206 Table 2" }] },
          aci318: { standard: "ACI 318-19", classes: [{ exposureClass: "S2", description: "severe", basis: "SO4 2400 ppm", source: "ACI 318-19 Table 19.3.1.1" }] },
          jurisdictionStatement: "National annexes govern.",
        },
        compliance: { en206: [{ exposureClass: "XA2", description: "maximum w/c", limit: 0.5, actual: 0.55, pass: false }], aci318: [] },
      },
    };
    render(<ExposureClassTable result={result} />);
    expect(screen.getByRole("table", { name: "EN 206:2013+A2:2021" })).toBeTruthy();
    expect(screen.getByText("S2")).toBeTruthy();
    expect(screen.getByText("✗ does not meet")).toBeTruthy();
    expect(screen.getByText("National annexes govern.")).toBeTruthy();
  });
});

describe("pore solution of the assess service's result", () => {
  it("converts the element totals from mmol/kg to mol/kg and takes the species from the equilibrium", () => {
    const solution = poreSolutionOf({
      assemblage: {
        paste: {
          poreSolution: { pH: 13.5, ionicStrengthMolPerKg: 0.4, waterKg: 0.03, elementsMmolPerKg: { K: 250, Na: 90 } },
          assemblage: { solution: { species: [{ name: "OH-", molality: 0.3, activity: 0.2 }] } },
        },
      },
    })!;
    expect(solution.elementMolality).toEqual({ K: 0.25, Na: 0.09 });
    expect(solution.pH).toBe(13.5);
    expect(solution.ionicStrength).toBe(0.4);
    expect(solution.species.map((s) => s.name)).toEqual(["OH-"]);
  });
});
