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

/**
 * For a field the schema takes as a number or `{ minC, maxC }` (the service temperature), the resolver reports a
 * failed range twice: once at the field, with the single-number branch's message, and again at the bound. When a
 * bound has its own error the field-level message is dropped, so the engineer sees only the one about the bound.
 * Returns a copy; the input is not changed.
 */
export function withoutUnionMessageBesideBounds<T>(errors: T, path: string, bounds: readonly string[] = ["minC", "maxC"]): T {
  const keys = path.split(".");
  let node: unknown = errors;
  for (const key of keys) node = node && typeof node === "object" ? (node as Record<string, unknown>)[key] : undefined;
  if (!node || typeof node !== "object" || !bounds.some((b) => (node as Record<string, unknown>)[b])) return errors;
  const copy = structuredCloneErrors(errors) as Record<string, unknown>;
  let target: Record<string, unknown> = copy;
  for (const key of keys) target = target[key] as Record<string, unknown>;
  delete target.message;
  delete target.type;
  delete target.types;
  return copy as T;
}

/** A copy of the plain objects of an error tree; DOM `ref`s are kept by reference (they cannot be cloned). */
function structuredCloneErrors(value: unknown): unknown {
  if (!value || typeof value !== "object" || (typeof Node !== "undefined" && value instanceof Node)) return value;
  if (Array.isArray(value)) return value.map(structuredCloneErrors);
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) out[k] = k === "ref" ? v : structuredCloneErrors(v);
  return out;
}
