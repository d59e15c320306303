// @vitest-environment jsdom
import { describe, it, expect, vi, afterEach } from "vitest";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { AssessmentForm } from "../../../components/form/assessment-form";
import { booleanChoiceOrUndefined } from "../../../components/form/limit-override-fields";
import { culvertDemo } from "../../../lib/demo/culvert-demo";
import type { AssessInputRaw } from "../../../lib/schema/assess-input";
import { describedText, loadDemo, submit, type } from "./new-inputs-helpers";

afterEach(cleanup);

const peakLabel = /Peak temperature limit \(delayed ettringite\)/;
const differenceLabel = /Core–surface difference limit/;
const freezingLabel = /Strength before first freezing/;
const evaporationLabel = /Evaporation threshold/;
const unitOf = (label: RegExp) => screen.getByLabelText(label).parentElement!.querySelector(".unit")!.textContent;

describe("advisory limit overrides in the form", () => {
  it("shows each limit with its unit and its default with the source (70 °C, Taylor, Famy & Scrivener 2001; 20 °C; 5 MPa, EN 13670)", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    await loadDemo();
    expect(screen.getByRole("group", { name: "Advisory limits (optional overrides)" })).toBeTruthy();
    expect(unitOf(peakLabel)).toBe("°C");
    expect(unitOf(differenceLabel)).toBe("°C");
    expect(unitOf(freezingLabel)).toBe("MPa");
    // DEF above about 70 °C: Taylor, Famy & Scrivener (2001) Cem. Concr. Res. 31, 683.
    expect(describedText(screen.getByLabelText(peakLabel))).toMatch(/^40–100 °C\. Default 70 °C.*Taylor, Famy & Scrivener 2001/);
    // About 20 °C core–surface difference: common practice (ACI 207.1R uses 19 °C / 35 °F).
    expect(describedText(screen.getByLabelText(differenceLabel))).toMatch(/^5–50 °C\. Default 20 °C/);
    // About 5 MPa before freezing: EN 13670 practice; ACI 306R 3.5 MPa (500 psi) as the alternative.
    const freezingHint = describedText(screen.getByLabelText(freezingLabel));
    expect(freezingHint).toMatch(/^1–20 MPa\. Default 5 MPa.*EN 13670/);
    expect(freezingHint).toContain("Alternative 3.5 MPa");
    // ACI 305R: 1.0 kg/m² h caution rate; 0.5 kg/m² h for low w/cm or silica fume.
    const evaporation = screen.getByLabelText(evaporationLabel) as HTMLSelectElement;
    expect(evaporation.value).toBe("");
    expect(within(evaporation).getByRole("option", { name: /from the mix.*w\/b below 0.4/ })).toBeTruthy();
    expect(within(evaporation).getByRole("option", { name: /normal \(1 kg\/m² h\)/ })).toBeTruthy();
    expect(within(evaporation).getByRole("option", { name: /low \(0.5 kg\/m² h\)/ })).toBeTruthy();
  });

  it("submits no override when the fields are left empty, so the data-file defaults apply", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.limits).toEqual({});
  });

  it("submits typed overrides as curing.thermal.limits", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    type(peakLabel, "65");
    type(differenceLabel, "15");
    type(freezingLabel, "3,5");
    fireEvent.change(screen.getByLabelText(evaporationLabel), { target: { value: "true" } });
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.limits).toEqual({
      ettringiteStabilityTemperatureC: 65,
      maxDifferenceC: 15,
      freezingStrengthMPa: 3.5,
      lowWaterBinderOrSilicaFume: true,
    });
  });

  it("names each limit beside its field and in the summary when an override is out of range (curing schema)", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    type(peakLabel, "30");
    type(differenceLabel, "60");
    type(freezingLabel, "0.5");
    submit();
    const summary = await screen.findByRole("alert");
    const messages: [RegExp, string][] = [
      [peakLabel, "limits.ettringiteStabilityTemperatureC must be between 40 and 100 °C"],
      [differenceLabel, "limits.maxDifferenceC must be between 5 and 50 °C"],
      [freezingLabel, "limits.freezingStrengthMPa must be between 1 and 20 MPa"],
    ];
    for (const [label, message] of messages) {
      expect(within(summary).getByText(message)).toBeTruthy();
      const input = screen.getByLabelText(label);
      expect(input.getAttribute("aria-invalid")).toBe("true");
      expect(describedText(input)).toContain(message);
    }
    // The summary link moves the keyboard focus to the field.
    fireEvent.click(within(summary).getByText(messages[1][1]));
    expect(document.activeElement).toBe(screen.getByLabelText(differenceLabel));
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it("opens a saved input with its overrides, a 'normal' evaporation threshold included", async () => {
    const saved = structuredClone(culvertDemo) as AssessInputRaw & { curing: { thermal: Record<string, unknown> } };
    saved.curing.thermal.limits = { maxDifferenceC: 25, lowWaterBinderOrSilicaFume: false };
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} initialValues={saved} />);
    expect((screen.getByLabelText(differenceLabel) as HTMLInputElement).value).toBe("25");
    expect((screen.getByLabelText(evaporationLabel) as HTMLSelectElement).value).toBe("false");
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.limits).toEqual({ maxDifferenceC: 25, lowWaterBinderOrSilicaFume: false });
  });

  it("maps the threshold choice to the schema's boolean, and the empty choice to no override", () => {
    expect(booleanChoiceOrUndefined("true")).toBe(true);
    expect(booleanChoiceOrUndefined("false")).toBe(false);
    expect(booleanChoiceOrUndefined(false)).toBe(false);
    expect(booleanChoiceOrUndefined("")).toBeUndefined();
    expect(booleanChoiceOrUndefined(undefined)).toBeUndefined();
  });
});
