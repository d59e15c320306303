import { runningVersions } from "@/lib/service/versions";
import { readDossier } from "@/lib/validation/dossier";

export const dynamic = "force-dynamic";
export const metadata = { title: "Validation dossier — Hydrastate" };

function formatNumber(value: number): string {
  return Number.isInteger(value) ? String(value) : Number(value.toPrecision(5)).toString();
}

/**
 * Every published-value check of the test suite, as recorded by the checks themselves when the suite ran
 * (`tests/artifacts/validation-dossier.json`, generated, not typed by hand), with the versions it ran on.
 */
export default function ValidationPage() {
  const dossier = readDossier();
  const running = runningVersions();
  return (
    <>
      <h1>Validation dossier</h1>
      <p className="lead">
        Each row is a check in the test suite that compares a computed value with a published one: the quantity, the conditions, the source,
        the reference value, the computed value, the tolerance and whether it passed. The table is generated from the checks when the suite
        runs, never typed by hand.
      </p>
      {!dossier ? (
        <p role="status">
          The validation dossier has not been generated yet — run <code>npm test</code>, then reload this page.
        </p>
      ) : (
        <>
          <dl className="key-figures">
            <dt>Generated</dt>
            <dd>{dossier.generatedAt}</dd>
            <dt>Checks</dt>
            <dd>
              {dossier.summary.checks} in {dossier.summary.testFiles} test files: {dossier.summary.passed} passed, {dossier.summary.failed} failed
            </dd>
            <dt>Data set</dt>
            <dd>
              {dossier.versions.dataset}
              {dossier.versions.dataset !== running.dataset ? ` (the running data set is ${running.dataset}: run the suite again)` : " (running today)"}
            </dd>
            <dt>Engine</dt>
            <dd>
              {dossier.versions.engine}
              {dossier.versions.engine !== running.engine ? ` (the running engine is ${running.engine}: run the suite again)` : " (running today)"}
            </dd>
          </dl>
          {dossier.mixedVersions.length > 0 && (
            <p role="note">Recorded with other versions in an earlier run: {dossier.mixedVersions.join(", ")}.</p>
          )}
          <div className="data-table">
            <table>
              <caption>Published-value checks</caption>
              <thead>
                <tr>
                  <th scope="col">Quantity</th>
                  <th scope="col">Conditions</th>
                  <th scope="col">Source</th>
                  <th scope="col">Reference</th>
                  <th scope="col">Computed</th>
                  <th scope="col">Tolerance</th>
                  <th scope="col">Result</th>
                  <th scope="col">Test</th>
                </tr>
              </thead>
              <tbody>
                {dossier.checks.map((check) => (
                  <tr key={`${check.testFile}:${check.testName}:${check.id}`}>
                    <th scope="row">{check.quantity}</th>
                    <td>{check.conditions}</td>
                    <td>{check.source}</td>
                    <td>
                      {formatNumber(check.reference)} {check.unit}
                    </td>
                    <td>
                      {formatNumber(check.computed)} {check.unit}
                    </td>
                    <td>{check.relative ? `${formatNumber(check.tolerance * 100)} %` : `± ${formatNumber(check.tolerance)} ${check.unit}`}</td>
                    <td>{check.passed ? "✓ pass" : "✗ FAIL"}</td>
                    <td>
                      <code>{check.testFile}</code>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </>
  );
}
