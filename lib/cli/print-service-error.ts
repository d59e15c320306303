import type { ServiceError } from "../service/outcome";

/**
 * Writes a service error for the command line: one line per invalid field (exit code 2), or the code and
 * message of a failed computation (exit code 1). Returns the exit code.
 */
export function printServiceError(error: ServiceError): number {
  if (error.kind === "validation") {
    for (const issue of error.issues) process.stderr.write(`${issue.path}: ${issue.message}\n`);
    return 2;
  }
  process.stderr.write(`${error.code}: ${error.message}\n`);
  return 1;
}
