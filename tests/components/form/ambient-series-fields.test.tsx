// @vitest-environment jsdom
import { describe, it, expect, vi, afterEach } from "vitest";
import { cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { AssessmentForm } from "../../../components/form/assessment-form";
import { describedText, loadDemo, submit, type } from "./new-inputs-helpers";

afterEach(cleanup);

async function chooseSeries() {
  await loadDemo();
  fireEvent.click(screen.getByLabelText("entered series (hour, °C)"));
  await screen.findByRole("button", { name: "Add a point" });
}

function paste(text: string) {
  fireEvent.click(screen.getByText("Paste two columns from a spreadsheet"));
  fireEvent.change(screen.getByLabelText(/Rows of hour and °C/), { target: { value: text } });
  fireEvent.click(screen.getByRole("button", { name: "Fill the series" }));
}

describe("ambient temperature as an entered series", () => {
  it("offers constant, daily cycle and entered series, with hour and °C beside each point", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    await chooseSeries();
    expect(screen.getByLabelText("constant")).toBeTruthy();
    expect(screen.getByLabelText("daily cycle")).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Add a point" }));
    const time = await screen.findByLabelText(/Point 1: time/);
    expect(time.parentElement!.querySelector(".unit")!.textContent).toBe("h");
    expect(screen.getByLabelText(/Point 1: air temperature/).parentElement!.querySelector(".unit")!.textContent).toBe("°C");
  });

  it("fills the rows from two pasted spreadsheet columns and submits them as { kind: series, points }", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await chooseSeries();
    paste("Hour\tAir °C\n0\t18\n6\t12,5\n12\t26\n24\t17");
    expect(await screen.findByText("Filled 4 points from the pasted columns.")).toBeTruthy();
    expect((screen.getByLabelText(/Point 2: air temperature/) as HTMLInputElement).value).toBe("12.5");
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.ambient).toEqual({
      kind: "series",
      points: [
        { timeH: 0, temperatureC: 18 },
        { timeH: 6, temperatureC: 12.5 },
        { timeH: 12, temperatureC: 26 },
        { timeH: 24, temperatureC: 17 },
      ],
    });
  });

  it("submits typed points and drops a row left wholly empty", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await chooseSeries();
    for (let i = 0; i < 3; i++) fireEvent.click(screen.getByRole("button", { name: "Add a point" }));
    await screen.findByLabelText(/Point 3: time/);
    type(/Point 1: time/, "0");
    type(/Point 1: air temperature/, "5");
    type(/Point 2: time/, "48");
    type(/Point 2: air temperature/, "-3");
    submit();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0].curing.thermal.ambient.points).toEqual([
      { timeH: 0, temperatureC: 5 },
      { timeH: 48, temperatureC: -3 },
    ]);
  });

  it("names the temperature limit beside the point (−40 to 60 °C, curing schema)", async () => {
    const onSubmit = vi.fn();
    render(<AssessmentForm onSubmit={onSubmit} />);
    await chooseSeries();
    paste("0\t20\n12\t75");
    await screen.findByLabelText(/Point 2: air temperature/);
    submit();
    const summary = await screen.findByRole("alert");
    const message = "ambient.points[].temperatureC must be between -40 and 60 °C";
    expect(within(summary).getByText(message)).toBeTruthy();
    const input = screen.getByLabelText(/Point 2: air temperature/);
    expect(input.getAttribute("aria-invalid")).toBe("true");
    expect(describedText(input)).toContain(message);
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it("says when the hours do not increase and when there are fewer than two points, linked to the series", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    await chooseSeries();
    paste("0\t20\n12\t22\n6\t21");
    await screen.findByLabelText(/Point 3: time/);
    submit();
    const summary = await screen.findByRole("alert");
    const link = within(summary).getByText("ambient.points timeH must increase") as HTMLAnchorElement;
    const target = document.getElementById(link.getAttribute("href")!.slice(1))!;
    expect(target.className).toBe("ambient-series");
    expect(describedText(target)).toContain("ambient.points timeH must increase");

    paste("0\t20");
    await waitFor(() => expect(screen.queryByLabelText(/Point 2: time/)).toBeNull());
    submit();
    await waitFor(() => expect(within(screen.getByRole("alert")).getByText("ambient.points must have at least 2 points")).toBeTruthy());
  });

  it("reports a pasted cell that is not a number and leaves the rows as they were", async () => {
    render(<AssessmentForm onSubmit={vi.fn()} />);
    await chooseSeries();
    paste("0\t20\n6\twarm");
    expect(await screen.findByText('Line 2: °C is not a number: "warm".')).toBeTruthy();
    expect(screen.queryByLabelText(/Point 1: time/)).toBeNull();
  });
});
