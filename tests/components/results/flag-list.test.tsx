// @vitest-environment jsdom
import { describe, it, expect, afterEach } from "vitest";
import { cleanup, render, screen, within } from "@testing-library/react";
import { CautionList, FlagList } from "../../../components/results/flag-list";
import type { Flag } from "../../../lib/advisory/flag";

afterEach(cleanup);

const flag = (id: string, severity: Flag["severity"], firedFraction?: number): Flag => ({
  id,
  severity,
  title: `Title of ${id}`,
  explanation: `Explanation of ${id}`,
  basis: `Basis of ${id}`,
  actions: [`Check ${id}`],
  ...(firedFraction !== undefined ? { robustness: { firedFraction, samples: 200 } } : {}),
});

describe("flag list", () => {
  const flags = [flag("gypsum-formation", "info"), flag("sulfate-attack", "caution", 0.4), flag("delayed-ettringite-formation", "warning"), flag("thaumasite-formation", "caution", 0.9)];

  it("orders flags by severity, then by how often they fired", () => {
    render(<FlagList flags={flags} />);
    const items = within(screen.getByRole("list", { name: /risk flags/i })).getAllByRole("listitem").filter((li) => li.classList.contains("flag"));
    expect(items.map((li) => li.getAttribute("data-severity"))).toEqual(["warning", "caution", "caution", "info"]);
    expect(items[1].textContent).toContain("Title of thaumasite-formation");
    expect(items[2].textContent).toContain("Title of sulfate-attack");
  });

  it("tells the severity in words and an icon, not colour alone, with explanation, basis and actions", () => {
    render(<FlagList flags={[flag("delayed-ettringite-formation", "warning", 0.25)]} />);
    const heading = screen.getByRole("heading", { level: 4 });
    expect(heading.textContent).toMatch(/▲ Warning/);
    expect(heading.textContent).toContain("Title of delayed-ettringite-formation");
    expect(screen.getByText("Explanation of delayed-ettringite-formation")).toBeTruthy();
    expect(screen.getByText(/Basis of delayed-ettringite-formation/)).toBeTruthy();
    expect(screen.getByText("Check delayed-ettringite-formation")).toBeTruthy();
    expect(screen.getByText("A caution or warning in 25 % of 200 Monte Carlo samples.")).toBeTruthy();
  });

  it("says how many samples could not evaluate a flag", () => {
    render(<FlagList flags={[{ ...flag("chloride-binding-limit", "warning"), robustness: { firedFraction: 0.5, samples: 180, notEvaluated: 20 } }]} />);
    expect(screen.getByText("A caution or warning in 50 % of 180 Monte Carlo samples (20 more could not evaluate it: its scenario did not converge there).")).toBeTruthy();
  });

  it("says so when no flag is raised", () => {
    render(<FlagList flags={[]} />);
    expect(screen.getByText(/No risk flags were raised/)).toBeTruthy();
  });

  it("shows every caution", () => {
    render(<CautionList cautions={["first caution", "second caution"]} />);
    expect(screen.getAllByRole("listitem").map((li) => li.textContent)).toEqual(["first caution", "second caution"]);
  });
});
