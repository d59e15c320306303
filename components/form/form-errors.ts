/**
 * Flattens react-hook-form's nested error object into `{ path, message }` in document order, for the error
 * summary at the top of the form. Array-level errors (`root`) are reported at the array's path.
 */
export type FormIssue = { path: string; message: string };

type ErrorNode = { message?: unknown; type?: unknown; ref?: unknown; [key: string]: unknown };

export function flattenFormErrors(errors: unknown, prefix = ""): FormIssue[] {
  const issues: FormIssue[] = [];
  if (!errors || typeof errors !== "object") return issues;
  const node = errors as ErrorNode;
  if (typeof node.message === "string" && node.message) issues.push({ path: prefix, message: node.message });
  // Integer keys (array items) come first in JS objects; the array-level `root` error reads better before them.
  const entries = Object.entries(node).sort(([a], [b]) => (a === "root" ? -1 : b === "root" ? 1 : 0));
  for (const [key, child] of entries) {
    // An error leaf carries `message`, `type`, `ref` (the DOM element) and maybe `types`; fields named `type` are objects.
    if (key === "message") continue;
    if ((key === "ref" || key === "types") && typeof node.message === "string") continue;
    if (!child || typeof child !== "object") continue;
    const path = key === "root" ? prefix : prefix ? `${prefix}.${key}` : key;
    issues.push(...flattenFormErrors(child, path));
  }
  return issues.filter((issue, index) => issues.findIndex((other) => other.path === issue.path && other.message === issue.message) === index);
}

/** The DOM id of the input for a form path: `mix.waterBinderRatio` → `f-mix-waterBinderRatio`. */
export function fieldId(path: string): string {
  return `f-${path.replace(/[^A-Za-z0-9]+/g, "-")}`;
}

/**
 * Paths the schema checks but the form fills in from other fields (the thermal model's copy of the mix and
 * element): an error there is linked to the field the user typed.
 */
const DERIVED_FIELD_SOURCES: Record<string, string> = {
  "curing.thermal.element.thicknessM": "project.element.thicknessM",
  "curing.thermal.concrete.binderKgPerM3": "mix.binderContentKgPerM3",
  "curing.thermal.concrete.waterBinderRatio": "mix.waterBinderRatio",
  "exposure.coverMm": "project.element.coverMm",
};

/** The path of the input to focus for an issue path. */
export function inputPathFor(path: string): string {
  return DERIVED_FIELD_SOURCES[path] ?? path;
}
