import { formatCell, type ReportTable } from "./report-model";
import { valueAt } from "./key-figures";
import { scenarioFindings } from "./scenario-findings";

/**
 * The tables of an assessment result besides its charts: what each durability scenario found, exposure classes
 * (EN 206 and ACI 318, each with its basis and source), the limiting values checked against the mix, and the pore
 * solution. Read
 * defensively from saved JSON; a table whose data are absent is left out.
 */
type Loose = Record<string, unknown>;
const isObject = (v: unknown): v is Loose => v !== null && typeof v === "object" && !Array.isArray(v);
const text = (v: unknown) => (typeof v === "string" ? v : formatCell(v));

function exposureClassTable(result: unknown): ReportTable | null {
  const rows: string[][] = [];
  for (const key of ["en206", "aci318"]) {
    const part = valueAt(result, ["exposureClasses", key]);
    if (!isObject(part) || !Array.isArray(part.classes)) continue;
    for (const c of part.classes) if (isObject(c)) rows.push([text(part.standard), text(c.exposureClass), text(c.description), text(c.basis), text(c.source)]);
  }
  if (rows.length === 0) return null;
  const statement = valueAt(result, ["exposureClasses", "jurisdictionStatement"]);
  return { title: "Exposure classes", columns: ["Standard", "Class", "Description", "Basis", "Source"], rows, note: typeof statement === "string" ? statement : undefined };
}

function complianceTable(result: unknown): ReportTable | null {
  const rows: string[][] = [];
  for (const key of ["en206", "aci318"]) {
    const checks = valueAt(result, ["compliance", key]);
    if (!Array.isArray(checks)) continue;
    for (const c of checks) {
      if (!isObject(c)) continue;
      const unit = typeof c.unit === "string" ? ` ${c.unit}` : "";
      const verdict = c.pass === true ? "met" : c.pass === false ? "NOT MET" : "not checked (no value given)";
      rows.push([text(c.exposureClass), text(c.description), `${formatCell(c.limit)}${unit}`, c.actual === null || c.actual === undefined ? "" : `${formatCell(c.actual)}${unit}`, verdict, text(c.source)]);
    }
  }
  return rows.length === 0 ? null : { title: "Limiting values of the exposure classes", columns: ["Class", "Requirement", "Limit", "Mix", "Result", "Source"], rows };
}

function poreSolutionTable(result: unknown): ReportTable | null {
  const solution = valueAt(result, ["assemblage", "paste", "poreSolution"]);
  if (!isObject(solution) || !isObject(solution.elementsMmolPerKg)) return null;
  const rows = Object.entries(solution.elementsMmolPerKg).map(([element, value]) => [element, formatCell(value)]);
  if (typeof solution.pH === "number") rows.unshift(["pH", formatCell(solution.pH)]);
  if (typeof solution.ionicStrengthMolPerKg === "number") rows.push(["ionic strength (mol/kg)", formatCell(solution.ionicStrengthMolPerKg)]);
  return { title: "Pore solution at equilibrium", columns: ["Quantity", "mmol/kg water (unless stated)"], rows };
}

function scenarioFindingsTable(result: unknown): ReportTable | null {
  const findings = scenarioFindings(result);
  if (findings.length === 0) return null;
  return { title: "What the durability scenarios found", columns: ["Scenario", "Quantity", "Value", "Unit"], rows: findings.map((f) => [f.scenario, f.quantity, formatCell(f.value), f.unit]) };
}

export function resultTables(result: unknown): ReportTable[] {
  return [scenarioFindingsTable(result), exposureClassTable(result), complianceTable(result), poreSolutionTable(result)].filter((t): t is ReportTable => t !== null);
}
