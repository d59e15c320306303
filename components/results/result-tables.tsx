import { formatChartCell } from "./data-table";
import { scenarioFindings } from "../../lib/report/scenario-findings";

/**
 * Tables of a result: the pore solution and the exposure classes (EN 206 and ACI 318) with the compliance of
 * the mix. Read defensively (a saved result may come from an older engine): a part that is absent is not shown.
 */
type Loose = Record<string, unknown>;
const isObject = (v: unknown): v is Loose => v !== null && typeof v === "object" && !Array.isArray(v);

type Species = { name: string; molality: number; activity?: number };

/**
 * The pore solution: from `assemblage.paste` of the assess service (`poreSolution` with pH, ionic strength and
 * element totals in mmol/kg; species from the equilibrium `assemblage.solution`), or from a flat assemblage.
 * Element totals are returned in mol/kg.
 */
export function poreSolutionOf(result: unknown): { species: Species[]; pH: number | null; ionicStrength: number | null; elementMolality: Record<string, number> } | null {
  if (!isObject(result) || !isObject(result.assemblage)) return null;
  const a = isObject(result.assemblage.paste) ? result.assemblage.paste : result.assemblage;
  const equilibrium = [a.assemblage, a.equilibrium].find(isObject);
  const summary = isObject(a.poreSolution) ? a.poreSolution : undefined;
  const solution = [summary && Array.isArray(summary.species) ? summary : undefined, a.solution, equilibrium?.solution].find(isObject);
  if (!solution && !summary) return null;
  const species = solution && Array.isArray(solution.species)
    ? (solution.species.filter((s) => isObject(s) && typeof s.name === "string" && typeof s.molality === "number") as Species[])
    : [];
  const mmolPerMol = 1000;
  const elementMolality: Record<string, number> = {};
  if (summary && isObject(summary.elementsMmolPerKg)) {
    for (const [e, v] of Object.entries(summary.elementsMmolPerKg)) if (typeof v === "number") elementMolality[e] = v / mmolPerMol;
  } else if (solution && isObject(solution.elementMolality)) {
    for (const [e, v] of Object.entries(solution.elementMolality)) if (typeof v === "number") elementMolality[e] = v;
  }
  const firstNumber = (...values: unknown[]) => values.find((v) => typeof v === "number") as number | undefined;
  const pH = firstNumber(summary?.pH, a.pH, solution?.pH, equilibrium?.pH);
  const I = firstNumber(summary?.ionicStrengthMolPerKg, a.ionicStrength, solution?.ionicStrength, equilibrium?.ionicStrength);
  return { species, pH: pH ?? null, ionicStrength: I ?? null, elementMolality };
}

export function PoreSolutionTable({ result, maxSpecies = 15 }: { result: unknown; maxSpecies?: number }) {
  const solution = poreSolutionOf(result);
  if (!solution) return null;
  const species = solution.species.filter((s) => s.name !== "H2O" && s.name !== "H2O@").slice(0, maxSpecies);
  const elements = Object.entries(solution.elementMolality).sort((a, b) => b[1] - a[1]);
  return (
    <section className="result-section" aria-labelledby="pore-solution-title">
      <h3 id="pore-solution-title">Pore solution</h3>
      <p>
        pH {solution.pH !== null ? formatChartCell(solution.pH) : "–"}; ionic strength {solution.ionicStrength !== null ? `${formatChartCell(solution.ionicStrength)} mol/kg` : "–"}.
      </p>
      <div className="two-tables">
        {elements.length > 0 ? (
          <table className="data-table">
            <caption>Dissolved elements (total)</caption>
            <thead>
              <tr>
                <th scope="col">Element</th>
                <th scope="col">Molality (mol/kg water)</th>
              </tr>
            </thead>
            <tbody>
              {elements.map(([e, m]) => (
                <tr key={e}>
                  <th scope="row">{e}</th>
                  <td>{formatChartCell(m)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : null}
        {species.length > 0 ? (
          <table className="data-table">
            <caption>Main species (largest {species.length})</caption>
            <thead>
              <tr>
                <th scope="col">Species</th>
                <th scope="col">Molality (mol/kg water)</th>
                <th scope="col">Activity (–)</th>
              </tr>
            </thead>
            <tbody>
              {species.map((s) => (
                <tr key={s.name}>
                  <th scope="row">{s.name}</th>
                  <td>{formatChartCell(s.molality)}</td>
                  <td>{formatChartCell(s.activity ?? null)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : null}
      </div>
    </section>
  );
}

type ClassRow = { exposureClass: string; description?: string; basis?: string; source?: string };
type ComplianceRow = { exposureClass: string; description: string; limit: unknown; actual: unknown; unit?: string; pass: boolean | null; source?: string };

export function exposureOf(result: unknown): { standards: { title: string; classes: ClassRow[] }[]; compliance: { title: string; items: ComplianceRow[] }[]; statement?: string } | null {
  if (!isObject(result)) return null;
  const exposure = isObject(result.exposure) ? result.exposure : result;
  const classes = isObject(exposure.exposureClasses) ? exposure.exposureClasses : undefined;
  if (!classes) return null;
  const standards: { title: string; classes: ClassRow[] }[] = [];
  for (const [key, title] of [["en206", "EN 206"], ["aci318", "ACI 318-19"]] as const) {
    const part = classes[key];
    if (isObject(part) && Array.isArray(part.classes))
      standards.push({ title: typeof part.standard === "string" ? part.standard : title, classes: part.classes.filter((c) => isObject(c) && typeof c.exposureClass === "string") as ClassRow[] });
  }
  const compliance: { title: string; items: ComplianceRow[] }[] = [];
  if (isObject(exposure.compliance))
    for (const [key, title] of [["en206", "EN 206"], ["aci318", "ACI 318-19"]] as const) {
      const items = exposure.compliance[key];
      if (Array.isArray(items)) compliance.push({ title, items: items.filter((i) => isObject(i) && typeof i.description === "string") as ComplianceRow[] });
    }
  return { standards, compliance, statement: typeof classes.jurisdictionStatement === "string" ? classes.jurisdictionStatement : undefined };
}

const verdict = (pass: boolean | null) => (pass === true ? "✓ meets" : pass === false ? "✗ does not meet" : "– not assessed");
const show = (v: unknown, unit?: string) => (v === null || v === undefined ? "–" : `${typeof v === "boolean" ? (v ? "yes" : "no") : formatChartCell(v as number | string)}${unit ? ` ${unit}` : ""}`);

export function ExposureClassTable({ result }: { result: unknown }) {
  const exposure = exposureOf(result);
  if (!exposure) return null;
  return (
    <section className="result-section" aria-labelledby="exposure-title">
      <h3 id="exposure-title">Exposure classes</h3>
      {exposure.standards.map((s) => (
        <table className="data-table" key={s.title}>
          <caption>{s.title}</caption>
          <thead>
            <tr>
              <th scope="col">Class</th>
              <th scope="col">Description</th>
              <th scope="col">Why</th>
              <th scope="col">Source</th>
            </tr>
          </thead>
          <tbody>
            {s.classes.map((c) => (
              <tr key={c.exposureClass}>
                <th scope="row">{c.exposureClass}</th>
                <td>{c.description ?? ""}</td>
                <td>{c.basis ?? ""}</td>
                <td>{c.source ?? ""}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ))}
      {exposure.compliance.map((c) => (
        <table className="data-table" key={`compliance-${c.title}`}>
          <caption>Mix against the limiting values of {c.title}</caption>
          <thead>
            <tr>
              <th scope="col">Class</th>
              <th scope="col">Requirement</th>
              <th scope="col">Limit</th>
              <th scope="col">This mix</th>
              <th scope="col">Verdict</th>
            </tr>
          </thead>
          <tbody>
            {c.items.map((i, index) => (
              <tr key={`${i.exposureClass}-${index}`}>
                <th scope="row">{i.exposureClass}</th>
                <td>{i.description}</td>
                <td>{show(i.limit, i.unit)}</td>
                <td>{show(i.actual, i.unit)}</td>
                <td>{verdict(i.pass)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ))}
      {exposure.statement ? <p className="hint">{exposure.statement}</p> : null}
    </section>
  );
}

/** What each durability scenario found (`lib/report/scenario-findings.ts`), whether or not a flag fired. */
export function ScenarioFindingsTable({ result }: { result: unknown }) {
  const findings = scenarioFindings(result);
  if (findings.length === 0) return null;
  return (
    <section className="result-section" aria-labelledby="findings-title">
      <h3 id="findings-title">What the durability scenarios found</h3>
      <table className="data-table">
        <thead>
          <tr>
            <th scope="col">Scenario</th>
            <th scope="col">Quantity</th>
            <th scope="col">Value</th>
          </tr>
        </thead>
        <tbody>
          {findings.map((f, i) => (
            <tr key={`${f.scenario}-${f.quantity}`}>
              {i === 0 || findings[i - 1].scenario !== f.scenario ? <th scope="row">{f.scenario}</th> : <td />}
              <td>{f.quantity}</td>
              <td>
                {formatChartCell(f.value)}
                {f.unit ? ` ${f.unit}` : ""}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
