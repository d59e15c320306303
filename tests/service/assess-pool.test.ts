import { describe, expect, it } from "vitest";
import { ASSESS_WORKERS_ENV, assessWorkersFrom, DEFAULT_ASSESS_WORKERS } from "../../lib/service/assess-pool";
import { DEFAULT_JOB_WORKERS, JOB_WORKERS_ENV, jobWorkersFrom } from "../../lib/service/assess-jobs";
import { sizeOrDefault } from "../../lib/service/computation-pool";

describe("the assessment pool's size from HYDRASTATE_ASSESS_WORKERS", () => {
  it("is the default when unset or empty, and the integer given within the limits", () => {
    expect(DEFAULT_ASSESS_WORKERS).toBe(1);
    expect(assessWorkersFrom(undefined)).toEqual({ ok: true, value: 1 });
    expect(assessWorkersFrom(" ")).toEqual({ ok: true, value: 1 });
    expect(assessWorkersFrom("2")).toEqual({ ok: true, value: 2 });
    expect(assessWorkersFrom("16")).toEqual({ ok: true, value: 16 });
  });

  it("is a typed error naming the variable and its limits for anything else", () => {
    for (const text of ["0", "17", "1.5", "two", "-1"])
      expect(assessWorkersFrom(text)).toEqual({ ok: false, error: { code: "invalid_pool_size", field: ASSESS_WORKERS_ENV, value: text, min: 1, max: 16 } });
  });
});

describe("the job pool's size from HYDRASTATE_JOB_WORKERS", () => {
  it("is 1 by default, the integer given within 1–16, and a typed error naming the variable otherwise", () => {
    expect(jobWorkersFrom(undefined)).toEqual({ ok: true, value: DEFAULT_JOB_WORKERS });
    expect(DEFAULT_JOB_WORKERS).toBe(1);
    expect(jobWorkersFrom("2")).toEqual({ ok: true, value: 2 });
    expect(jobWorkersFrom("0")).toEqual({ ok: false, error: { code: "invalid_pool_size", field: JOB_WORKERS_ENV, value: "0", min: 1, max: 16 } });
  });
});

describe("a pool's starting size from its parsed variable", () => {
  it("is the parsed value, or the default with one warning line naming the variable and its limits", () => {
    const lines: string[] = [];
    const original = console.error;
    console.error = (line: string) => void lines.push(line);
    try {
      expect(sizeOrDefault(jobWorkersFrom("3"), DEFAULT_JOB_WORKERS)).toBe(3);
      expect(lines).toEqual([]);
      expect(sizeOrDefault(jobWorkersFrom("lots"), DEFAULT_JOB_WORKERS)).toBe(DEFAULT_JOB_WORKERS);
    } finally {
      console.error = original;
    }
    expect(lines.map((l) => JSON.parse(l))).toEqual([{ level: "warn", code: "invalid_pool_size", field: JOB_WORKERS_ENV, value: "lots", min: 1, max: 16, using: 1 }]);
  });
});
