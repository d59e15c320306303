// @vitest-environment jsdom
import { describe, it, expect, vi, afterEach } from "vitest";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { AssessmentForm } from "../../../components/form/assessment-form";
import { culvertDemo } from "../../../lib/demo/culvert-demo";

afterEach(cleanup);

function type(label: RegExp | string, value: string) {
  const input = screen.getByLabelText(label) as HTMLInputElement;
  fireEvent.input(input, { target: { value } });
  return input;
}

describe("assessment form validation", () => {
  it("shows the schema's message naming the limit beside the field and in the summary (w/b 0.25–0.80, binder schema)", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    type(/Project name/, "Test wall");
    type(/^Thickness/, "0.3");
    type(/Water\/binder ratio/, "0.95");
    type(/Binder content/, "350");
    fireEvent.click(screen.getByRole("button", { name: /run the assessment/i }));
    const summary = await screen.findByRole("alert");
    expect(within(summary).getByText("waterBinderRatio must be between 0.25 and 0.80")).toBeTruthy();
    const input = screen.getByLabelText(/Water\/binder ratio/);
    expect(input.getAttribute("aria-invalid")).toBe("true");
    const describedBy = input.getAttribute("aria-describedby")!.split(" ");
    const errorText = describedBy.map((id) => document.getElementById(id)?.textContent ?? "").join(" ");
    expect(errorText).toContain("waterBinderRatio must be between 0.25 and 0.80");
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it("links each summary entry to its field", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    type(/Binder content/, "900");
    fireEvent.click(screen.getByRole("button", { name: /run the assessment/i }));
    const summary = await screen.findByRole("alert");
    const link = within(summary).getByText("binderContentKgPerM3 must be between 200 and 700 kg/m³") as HTMLAnchorElement;
    const target = document.getElementById(link.getAttribute("href")!.slice(1));
    expect(target).toBe(screen.getByLabelText(/Binder content/));
    fireEvent.click(link);
    expect(document.activeElement).toBe(target);
  });

  it("names required fields that were left empty", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    fireEvent.click(screen.getByRole("button", { name: /run the assessment/i }));
    const summary = await screen.findByRole("alert");
    expect(within(summary).getByText("project.name is required")).toBeTruthy();
    expect(within(summary).getByText("waterBinderRatio is required")).toBeTruthy();
  });

  it("submits the demo scenario as a valid input one click away, labelled as a demo", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    fireEvent.click(screen.getByRole("button", { name: /load the demo scenario/i }));
    expect(await screen.findByText(/Demo scenario \(invented numbers\)/)).toBeTruthy();
    expect((screen.getByLabelText(/Project name/) as HTMLInputElement).value).toBe(culvertDemo.project!.name);
    fireEvent.click(screen.getByRole("button", { name: /run the assessment/i }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    const input = onSubmit.mock.calls[0][0];
    expect(input.mix.waterBinderRatio).toBe(0.45);
    expect(input.exposure.sulfateMgPerL).toBe(1800);
    expect(input.exposure.coverMm).toBe(50);
    expect(input.binder.supplementaryMaterials).toHaveLength(1);
    // The thermal model takes thickness, binder content and w/b from the sections above, not typed twice.
    expect(input.curing.thermal.element.thicknessM).toBe(0.45);
    expect(input.curing.thermal.concrete).toMatchObject({ binderKgPerM3: 360, waterBinderRatio: 0.45, fcm28MPa: 43 });
    expect(input.curing.thermal.ambient).toEqual({ kind: "daily-sine", meanC: 22, amplitudeC: 6 });
    expect(input.specification).toMatchObject({ strengthClass: "C35/45" });
  });

  it("submits the specification for the exposure-class limits (strength class, sulfate resistance, calcium chloride) and leaves unstated items out", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    type(/Project name/, "Spec wall");
    type(/^Thickness/, "0.3");
    type(/Water\/binder ratio/, "0.45");
    type(/Binder content/, "360");
    fireEvent.change(screen.getByLabelText(/^Strength class/), { target: { value: "C40/50" } });
    fireEvent.change(screen.getByLabelText(/Sulfate resistance of the binder/), { target: { value: "HS" } });
    fireEvent.change(screen.getByLabelText(/Calcium chloride admixture/), { target: { value: "no" } });
    fireEvent.click(screen.getByRole("button", { name: /run the assessment/i }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    const specification = onSubmit.mock.calls[0][0].specification;
    expect(specification).toMatchObject({ strengthClass: "C40/50", sulfateResistance: "HS", calciumChlorideAdmixture: false });
    expect(specification.specifiedStrengthMPa).toBeUndefined();
  });

  it("reopens a saved input with its yes/no selects showing the saved answers (booleans in the schema)", () => {
    const saved = { ...culvertDemo, exposure: { ...culvertDemo.exposure, seawater: true }, specification: { calciumChlorideAdmixture: true } };
    render(<AssessmentForm onSubmit={vi.fn()} initialValues={saved} />);
    expect((screen.getByLabelText(/Calcium chloride admixture/) as HTMLSelectElement).value).toBe("yes");
    expect((screen.getByLabelText(/^Sea water/) as HTMLSelectElement).value).toBe("yes");
  });

  it("says inside the supplementary-materials group, and in the summary linked to it, that a blended cement type takes no further materials", async () => {
    const onSubmit = vi.fn();
    const blended = { ...culvertDemo, binder: { ...culvertDemo.binder, cement: { kind: "preset" as const, presetId: "en197-cem-iii-a" } } };
    render(<AssessmentForm onSubmit={onSubmit} initialValues={blended} />);
    fireEvent.click(screen.getByRole("button", { name: /run the assessment/i }));
    const summary = await screen.findByRole("alert");
    const message = /^supplementaryMaterials must be empty with the blended cement CEM III\/A 42\.5 N \(EN 197-1\), which already contains slag 50 %/;
    const link = within(summary).getByText(message) as HTMLAnchorElement;
    const group = document.getElementById(link.getAttribute("href")!.slice(1))!;
    expect(group.tagName).toBe("FIELDSET");
    expect(within(group).getByText(message)).toBeTruthy();
    fireEvent.click(link);
    expect(document.activeElement).toBe(group);
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it("groups the sections in fieldsets with legends in the order an engineer fills them", () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    const legends = Array.from(document.querySelectorAll("fieldset.section > legend")).map((l) => l.textContent);
    expect(legends).toEqual(["1. Project and element", "2. Binder", "3. Mix", "4. Age", "5. Exposure", "6. Curing and climate", "7. Run options"]);
  });

  it("shows the thermal model's fields when chosen, and a second face when the faces differ", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    expect(screen.queryByLabelText(/^Placement temperature/)).toBeNull();
    fireEvent.click(screen.getByLabelText("Compute it with the element thermal model"));
    expect(await screen.findByLabelText(/^Placement temperature/)).toBeTruthy();
    expect(screen.queryByText("Formwork and insulation (face B)")).toBeNull();
    fireEvent.change(screen.getByLabelText("Faces"), { target: { value: "two-faces" } });
    expect(await screen.findByText("Formwork and insulation (face B)")).toBeTruthy();
  });
});
