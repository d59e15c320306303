// @vitest-environment jsdom
import { describe, it, expect, vi, afterEach } from "vitest";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { AssessmentForm } from "../../../components/form/assessment-form";
import { culvertDemo } from "../../../lib/demo/culvert-demo";
import type { AssessInputRaw } from "../../../lib/schema/assess-input";
import { describedText, loadDemo, submit, type } from "./new-inputs-helpers";

afterEach(cleanup);

const heatCurveBox = () => screen.getByLabelText(/Use a measured heat curve/) as HTMLInputElement;

async function openHeatCurve() {
  await loadDemo();
  fireEvent.click(heatCurveBox());
  await screen.findByRole("button", { name: "Add a heat point" });
}

function paste(text: string) {
  fireEvent.click(screen.getByText("Paste the heat curve from a spreadsheet"));
  fireEvent.change(screen.getByLabelText(/Rows of hour and J\/g/), { target: { value: text } });
  fireEvent.click(screen.getByRole("button", { name: "Fill the heat curve" }));
}

const unitOf = (label: RegExp) => screen.getByLabelText(label).parentElement!.querySelector(".unit")!.textContent;

// A typical isothermal calorimetry curve of a CEM I at 20 °C (invented, for the form only): equivalent age h, J/g.
const typicalCurve = "Age (h)\tHeat (J/g)\n0\t0\n12\t120\n24\t215,5\n72\t300\n168\t340";

describe("a measured heat-of-hydration curve in the form", () => {
  it("is off by default, so the heat model is used and no heatCurve is submitted", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    expect(heatCurveBox().checked).toBe(false);
    expect(screen.queryByLabelText(/Calorimetry temperature/)).toBeNull();
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.heatCurve).toBeUndefined();
  });

  it("shows units beside every field and fills the defaults with their sources (20 °C, EN 12390-2; 40000 J/mol, ASTM C1074)", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    await openHeatCurve();
    const temperature = screen.getByLabelText(/Calorimetry temperature/) as HTMLInputElement;
    const activation = screen.getByLabelText(/Apparent activation energy/) as HTMLInputElement;
    await waitFor(() => expect(temperature.value).toBe("20"));
    expect(activation.value).toBe("40000");
    expect(unitOf(/Calorimetry temperature/)).toBe("°C");
    expect(unitOf(/Apparent activation energy/)).toBe("J/mol");
    // The limits the curing schema sets (lib/schema/curing-input.ts) and the defaults' sources are in the hints.
    expect(describedText(temperature)).toContain("0–60 °C");
    expect(describedText(temperature)).toContain("EN 12390-2");
    expect(describedText(activation)).toContain("10000–80000 J/mol");
    expect(describedText(activation)).toContain("ASTM C1074");
    fireEvent.click(screen.getByRole("button", { name: "Add a heat point" }));
    await screen.findByLabelText(/Heat point 1: equivalent age/);
    expect(unitOf(/Heat point 1: equivalent age/)).toBe("h");
    expect(unitOf(/Heat point 1: cumulative heat/)).toBe("J/g");
  });

  it("fills the points from two pasted spreadsheet columns (decimal comma accepted) and submits the schema's shape", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await openHeatCurve();
    paste(typicalCurve);
    expect(await screen.findByText("Filled 5 points from the pasted columns.")).toBeTruthy();
    expect((screen.getByLabelText(/Heat point 3: cumulative heat/) as HTMLInputElement).value).toBe("215.5");
    type(/Apparent activation energy/, "42000");
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.heatCurve).toEqual({
      points: [
        { equivalentAgeH: 0, cumulativeHeatJPerG: 0 },
        { equivalentAgeH: 12, cumulativeHeatJPerG: 120 },
        { equivalentAgeH: 24, cumulativeHeatJPerG: 215.5 },
        { equivalentAgeH: 72, cumulativeHeatJPerG: 300 },
        { equivalentAgeH: 168, cumulativeHeatJPerG: 340 },
      ],
      referenceTemperatureC: 20,
      activationEnergyJPerMol: 42000,
    });
  });

  it("names the 0–1000 J/g and 10000–80000 J/mol limits beside the fields and in the summary (curing schema)", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await openHeatCurve();
    paste("0\t0\n24\t1200");
    await screen.findByLabelText(/Heat point 2: cumulative heat/);
    type(/Apparent activation energy/, "5000");
    submit();
    const summary = await screen.findByRole("alert");
    const heatMessage = "heatCurve.points[].cumulativeHeatJPerG must be between 0 and 1000 J/g";
    const activationMessage = "heatCurve.activationEnergyJPerMol must be between 10000 and 80000 J/mol";
    expect(within(summary).getByText(heatMessage)).toBeTruthy();
    expect(within(summary).getByText(activationMessage)).toBeTruthy();
    const heat = screen.getByLabelText(/Heat point 2: cumulative heat/);
    expect(heat.getAttribute("aria-invalid")).toBe("true");
    expect(describedText(heat)).toContain(heatMessage);
    expect(describedText(screen.getByLabelText(/Apparent activation energy/))).toContain(activationMessage);
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it("says when the heat decreases or the ages do not increase, linked from the summary to the list, which takes focus", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    await openHeatCurve();
    paste("0\t0\n24\t200\n48\t150");
    await screen.findByLabelText(/Heat point 3: cumulative heat/);
    submit();
    const summary = await screen.findByRole("alert");
    const link = within(summary).getByText("heatCurve.points cumulativeHeatJPerG must not decrease") as HTMLAnchorElement;
    const target = document.getElementById(link.getAttribute("href")!.slice(1))!;
    expect(target.className).toBe("heat-curve-points");
    expect(describedText(target)).toContain("heatCurve.points cumulativeHeatJPerG must not decrease");
    fireEvent.click(link);
    expect(document.activeElement).toBe(target);

    paste("0\t0\n24\t200\n24\t250");
    await waitFor(() => expect((screen.getByLabelText(/Heat point 3: cumulative heat/) as HTMLInputElement).value).toBe("250"));
    submit();
    await waitFor(() => expect(within(screen.getByRole("alert")).getByText("heatCurve.points equivalentAgeH must increase")).toBeTruthy());
  });

  it("reports a pasted row with three values and keeps the points as they were", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    await openHeatCurve();
    paste("0\t0\t5");
    expect(await screen.findByText("Line 1 has 3 values; two are expected (hour, J/g).")).toBeTruthy();
    expect(screen.queryByLabelText(/Heat point 1: equivalent age/)).toBeNull();
  });

  it("drops a row left wholly empty and leaves the curve out again when the box is unticked", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await openHeatCurve();
    paste("0\t0\n48\t260");
    await screen.findByLabelText(/Heat point 2: equivalent age/);
    fireEvent.click(screen.getByRole("button", { name: "Add a heat point" }));
    await screen.findByLabelText(/Heat point 3: equivalent age/);
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.heatCurve.points).toHaveLength(2);

    fireEvent.click(heatCurveBox());
    await waitFor(() => expect(screen.queryByLabelText(/Calorimetry temperature/)).toBeNull());
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(2));
    expect(onSubmit.mock.calls[1][0].curing.thermal.heatCurve).toBeUndefined();
  });

  it("opens a saved input with its heat curve shown and its own temperature and activation energy kept", async () => {
    const saved = structuredClone(culvertDemo) as AssessInputRaw & { curing: { thermal: Record<string, unknown> } };
    saved.curing.thermal.heatCurve = {
      points: [
        { equivalentAgeH: 0, cumulativeHeatJPerG: 0 },
        { equivalentAgeH: 100, cumulativeHeatJPerG: 310 },
      ],
      referenceTemperatureC: 23,
      activationEnergyJPerMol: 35000,
    };
    render(<AssessmentForm onSubmit={vi.fn()} initialValues={saved} />);
    expect(heatCurveBox().checked).toBe(true);
    expect((screen.getByLabelText(/Calorimetry temperature/) as HTMLInputElement).value).toBe("23");
    expect((screen.getByLabelText(/Apparent activation energy/) as HTMLInputElement).value).toBe("35000");
    expect((screen.getByLabelText(/Heat point 2: cumulative heat/) as HTMLInputElement).value).toBe("310");
  });
});
