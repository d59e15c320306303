import type { AssessInputRaw } from "../lib/schema/assess-input";
import { assessmentStore } from "../lib/service/store-instance";

/**
 * The inputs of a saved assessment, to open them in the form (`/?from=<id>`), read on the server from the
 * store. Any failure gives null (the form then starts empty), never an error page.
 */
export async function loadSavedInputs(id: string): Promise<{ name: string; inputs: AssessInputRaw } | null> {
  try {
    const found = assessmentStore().get(id);
    return found.ok ? { name: found.value.name, inputs: found.value.inputs as AssessInputRaw } : null;
  } catch {
    return null;
  }
}
