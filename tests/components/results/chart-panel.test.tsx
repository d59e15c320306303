// @vitest-environment jsdom
import { describe, it, expect, afterEach, beforeAll, vi } from "vitest";
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { ChartPanel } from "../../../components/results/chart-panel";
import { elementTemperatureChart } from "../../../lib/charts/element-temperature";

beforeAll(() => {
  // jsdom has no layout: ResizeObserver is absent (recharts' ResponsiveContainer asks for it).
  globalThis.ResizeObserver ??= class {
    observe() {}
    unobserve() {}
    disconnect() {}
  } as unknown as typeof ResizeObserver;
});
afterEach(cleanup);

const chart = elementTemperatureChart({ timesH: [0, 12, 24], coreC: [18, 55, 61.5], surfaceC: [18, 30, 28] }, { maxTemperatureC: 70 });

describe("chart panel", () => {
  it("shows the title, and a data table with units in the headings when asked", () => {
    render(<ChartPanel chart={chart} />);
    expect(screen.getByRole("heading", { name: "Element temperature" })).toBeTruthy();
    expect(screen.getByText("Limit lines (dashed): Maximum 70 °C (70 °C).")).toBeTruthy();
    expect(screen.queryByRole("table")).toBeNull();
    const toggle = screen.getByRole("button", { name: "Show data table" });
    expect(toggle.getAttribute("aria-expanded")).toBe("false");
    fireEvent.click(toggle);
    const table = screen.getByRole("table");
    const headings = within(table).getAllByRole("columnheader").map((h) => h.textContent);
    expect(headings).toEqual(["Time after placement (h)", "Core (°C)", "Surface (°C)", "Core − surface (°C)"]);
    expect(within(table).getAllByRole("row")).toHaveLength(1 + 3);
    expect(screen.getByRole("button", { name: "Hide data table" }).getAttribute("aria-expanded")).toBe("true");
  });

  it("downloads the chart's CSV under the chart's file name", async () => {
    const created: Blob[] = [];
    const createObjectURL = vi.fn((blob: Blob) => (created.push(blob), "blob:test"));
    Object.assign(URL, { createObjectURL, revokeObjectURL: vi.fn() });
    const clicks: string[] = [];
    const click = vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) {
      clicks.push(this.download);
    });
    render(<ChartPanel chart={chart} />);
    fireEvent.click(screen.getByRole("button", { name: "Download CSV" }));
    expect(clicks).toEqual(["hydrastate-element-temperature.csv"]);
    const text = await created[0].text();
    expect(text.split("\r\n")[0]).toBe("Time after placement (h),Core (°C),Surface (°C),Core − surface (°C)");
    expect(text.split("\r\n")[2]).toBe("12,55,30,25");
    click.mockRestore();
  });
});
