import { describe, it, expect } from "vitest";
import { analysisTotalMassPercent, checkAnalysisTotal } from "../../lib/cement/analysis-total";

describe("total of a chemical analysis", () => {
  it("counts LOI once, does not add free lime or CO2 on top of it, and adds Cl", () => {
    expect(analysisTotalMassPercent({ CaO: 64, SiO2: 21, Al2O3: 5, Fe2O3: 3, SO3: 3, MgO: 1.5, LOI: 2, CO2: 1.2, freeLime: 1, Cl: 0.05 })).toBeCloseTo(99.55, 12);
    expect(analysisTotalMassPercent({ CaO: 64, CO2: 1.2 })).toBeCloseTo(65.2, 12);
  });

  it("warns outside 97–101 % and not inside (the acceptance range of issue 4, common practice)", () => {
    expect(checkAnalysisTotal({ CaO: 96 }, "cement")).toMatchObject({ code: "analysis_total_out_of_range", totalMassPercent: 96 });
    expect(checkAnalysisTotal({ CaO: 101.5 }, "cement")?.code).toBe("analysis_total_out_of_range");
    expect(checkAnalysisTotal({ CaO: 99 }, "cement")).toBeUndefined();
  });
});
