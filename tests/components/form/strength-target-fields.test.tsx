// @vitest-environment jsdom
import { describe, it, expect, vi, afterEach } from "vitest";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { AssessmentForm } from "../../../components/form/assessment-form";
import { MAX_STRENGTH_TARGETS } from "../../../components/form/strength-target-fields";
import { describedText, loadDemo, submit, type } from "./new-inputs-helpers";

afterEach(cleanup);

const addTarget = () => fireEvent.click(screen.getByRole("button", { name: "Add a strength target" }));

describe("strength targets", () => {
  it("submits labelled targets in MPa as curing.thermal.strengthTargets", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    expect(screen.getByRole("group", { name: "Strength targets" })).toBeTruthy();
    addTarget();
    addTarget();
    const strength = await screen.findByLabelText(/Target 2: strength/);
    expect(strength.parentElement!.querySelector(".unit")!.textContent).toBe("MPa");
    type(/Target 1: purpose/, "stripping");
    type(/Target 1: strength/, "10");
    type(/Target 2: purpose/, "prestress transfer");
    type(/Target 2: strength/, "25");
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.strengthTargets).toEqual([
      { label: "stripping", strengthMPa: 10 },
      { label: "prestress transfer", strengthMPa: 25 },
    ]);
  });

  it("names the 0.5–150 MPa limit beside the strength and asks for the purpose (curing schema)", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    addTarget();
    await screen.findByLabelText(/Target 1: strength/);
    type(/Target 1: strength/, "200");
    submit();
    const summary = await screen.findByRole("alert");
    const message = "strengthTargets[].strengthMPa must be between 0.5 and 150 MPa";
    expect(within(summary).getByText(message)).toBeTruthy();
    expect(within(summary).getByText("strengthTargets[].label must be text")).toBeTruthy();
    const input = screen.getByLabelText(/Target 1: strength/);
    expect(input.getAttribute("aria-invalid")).toBe("true");
    expect(describedText(input)).toContain(message);
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it("drops an untouched row, removes a row, and stops adding at the schema's 10 targets", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await loadDemo();
    for (let i = 0; i < MAX_STRENGTH_TARGETS; i++) addTarget();
    await screen.findByLabelText(/Target 10: strength/);
    expect((screen.getByRole("button", { name: "Add a strength target" }) as HTMLButtonElement).disabled).toBe(true);
    expect(screen.getByText("The limit of 10 targets is reached.")).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Remove target 10" }));
    await waitFor(() => expect(screen.queryByLabelText(/Target 10: strength/)).toBeNull());
    expect((screen.getByRole("button", { name: "Add a strength target" }) as HTMLButtonElement).disabled).toBe(false);
    type(/Target 3: purpose/, "loading");
    type(/Target 3: strength/, "30");
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.strengthTargets).toEqual([{ label: "loading", strengthMPa: 30 }]);
  });
});
