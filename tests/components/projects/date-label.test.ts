import { describe, it, expect } from "vitest";
import { dateTimeLabel } from "../../../components/projects/date-label";

describe("the saved time of a project file", () => {
  it("reads YYYY-MM-DD HH:MM in local time (ISO 8601 order), the same in every country", () => {
    const local = new Date(2026, 11, 2, 3, 56, 35); // 2 December 2026, 03:56:35 local
    expect(dateTimeLabel(local.toISOString())).toBe("2026-12-02 03:56");
  });

  it("returns text that is not a time as it is", () => {
    expect(dateTimeLabel("not a date")).toBe("not a date");
  });
});
