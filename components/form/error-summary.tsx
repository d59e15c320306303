"use client";

import { fieldId, inputPathFor, type FormIssue } from "./form-errors";

/** The list of problems at the top of the form; each links to (and focuses) its field. */
export function ErrorSummary({ issues }: { issues: readonly FormIssue[] }) {
  if (issues.length === 0) return null;
  const focus = (path: string) => (event: React.MouseEvent<HTMLAnchorElement>) => {
    const target = document.getElementById(fieldId(inputPathFor(path)));
    if (target) {
      event.preventDefault();
      target.scrollIntoView?.({ block: "center" });
      (target as HTMLElement).focus();
    }
  };
  return (
    <div className="error-summary" role="alert" aria-labelledby="error-summary-title">
      <h3 id="error-summary-title">
        <span aria-hidden="true">⚠ </span>
        {issues.length === 1 ? "There is 1 problem with the input" : `There are ${issues.length} problems with the input`}
      </h3>
      <ul>
        {issues.map((issue) => (
          <li key={`${issue.path}:${issue.message}`}>
            <a href={`#${fieldId(inputPathFor(issue.path))}`} onClick={focus(issue.path)}>
              {issue.message}
            </a>
          </li>
        ))}
      </ul>
    </div>
  );
}
