import { culvertDemo } from "../../lib/demo/culvert-demo";
import { runAssessment, type AssessmentResult } from "../../lib/service/assess";

/** The demo scenario's assessment as the service computes it today (the report must read the real shape). */
let cached: Promise<AssessmentResult> | undefined;
export function demoResult(): Promise<AssessmentResult> {
  cached ??= runAssessment(culvertDemo).then((outcome) => {
    if (!outcome.ok) throw new Error(`demo assessment failed: ${JSON.stringify(outcome.error)}`);
    return outcome.value;
  });
  return cached;
}
