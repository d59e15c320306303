// @vitest-environment jsdom
import { describe, it, expect, vi, afterEach } from "vitest";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { AssessmentForm } from "../../../components/form/assessment-form";
import { serviceTemperatureModeOf } from "../../../components/form/service-temperature-fields";
import { culvertDemo } from "../../../lib/demo/culvert-demo";
import { describedText, loadDemo, submit, type } from "./new-inputs-helpers";

afterEach(cleanup);

async function chooseRange() {
  fireEvent.click(screen.getByLabelText("a range (min/max)"));
  return screen.findByLabelText(/Lowest service temperature/);
}

describe("service temperature as a single value or a range", () => {
  it("keeps a single value a number in the submitted input", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    expect((screen.getByLabelText(/^Service temperature/) as HTMLInputElement).value).toBe(String(culvertDemo.exposure.serviceTemperatureC));
    type(/^Service temperature/, "12");
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].exposure.serviceTemperatureC).toBe(12);
  });

  it("submits min and max as { minC, maxC }, with °C beside both", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    const min = await chooseRange();
    expect(screen.queryByLabelText(/^Service temperature/)).toBeNull();
    expect(min.parentElement!.querySelector(".unit")!.textContent).toBe("°C");
    type(/Lowest service temperature/, "-5");
    type(/Highest service temperature/, "30");
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].exposure.serviceTemperatureC).toEqual({ minC: -5, maxC: 30 });
  });

  it("names the limit when a bound is outside −60 to 80 °C and when the lowest exceeds the highest (exposure schema)", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    await chooseRange();
    type(/Lowest service temperature/, "20");
    type(/Highest service temperature/, "95");
    submit();
    const summary = await screen.findByRole("alert");
    expect(within(summary).getByText("serviceTemperatureC.maxC must be at most 80 °C")).toBeTruthy();
    const max = screen.getByLabelText(/Highest service temperature/);
    expect(max.getAttribute("aria-invalid")).toBe("true");
    expect(describedText(max)).toContain("serviceTemperatureC.maxC must be at most 80 °C");

    type(/Highest service temperature/, "10");
    submit();
    await waitFor(() => expect(describedText(screen.getByLabelText(/Lowest service temperature/))).toContain("serviceTemperatureC.minC must not exceed serviceTemperatureC.maxC"));
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it("reports a missing bound at that bound only, and leaves out a range with neither bound", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    await chooseRange();
    type(/Highest service temperature/, "25");
    submit();
    const summary = await screen.findByRole("alert");
    const link = within(summary).getByText("serviceTemperatureC.minC must be a number in °C") as HTMLAnchorElement;
    expect(document.getElementById(link.getAttribute("href")!.slice(1))).toBe(screen.getByLabelText(/Lowest service temperature/));
    // The single-value branch's message would mislead beside a range (see withoutUnionMessageBesideBounds).
    expect(within(summary).queryByText("serviceTemperatureC must be a number in °C")).toBeNull();
    type(/Highest service temperature/, "");
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].exposure.serviceTemperatureC).toBeUndefined();
  });

  it("opens a saved range in range mode", async () => {
    const initial = structuredClone(culvertDemo);
    (initial.exposure as Record<string, unknown>).serviceTemperatureC = { minC: 2, maxC: 28 };
    render(<AssessmentForm onSubmit={vi.fn()} initialValues={initial} />);
    expect(((await screen.findByLabelText(/Lowest service temperature/)) as HTMLInputElement).value).toBe("2");
    expect(serviceTemperatureModeOf(15)).toBe("single");
    expect(serviceTemperatureModeOf(undefined)).toBe("single");
  });

  it("switches back to one value with an empty input, and a loaded single value shows the single input", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await chooseRange();
    type(/Lowest service temperature/, "4");
    fireEvent.click(screen.getByLabelText("one mean value"));
    expect(((await screen.findByLabelText(/^Service temperature/)) as HTMLInputElement).value).toBe("");
    await chooseRange();
    await loadDemo();
    expect(((await screen.findByLabelText(/^Service temperature/)) as HTMLInputElement).value).toBe(String(culvertDemo.exposure.serviceTemperatureC));
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].exposure.serviceTemperatureC).toBe(culvertDemo.exposure.serviceTemperatureC);
  });
});
