import { describe, it, expect } from "vitest";
import { parseTwoColumnRows } from "../../../components/form/two-column-paste";

const names = ["hour", "°C"] as const;

describe("two columns pasted from a spreadsheet", () => {
  it("reads tab-separated rows as a copied spreadsheet range gives them, skipping a header row", () => {
    expect(parseTwoColumnRows("Hour\tAir °C\n0\t18.5\n6\t14\r\n12\t24\n", names, 100)).toEqual({ ok: true, rows: [[0, 18.5], [6, 14], [12, 24]] });
  });

  it("accepts a decimal comma with semicolons or tabs, and a minus sign typed as U+2212", () => {
    expect(parseTwoColumnRows("0;−2,5\n24;3,25", names, 100)).toEqual({ ok: true, rows: [[0, -2.5], [24, 3.25]] });
    expect(parseTwoColumnRows("0\t1,5", names, 100)).toEqual({ ok: true, rows: [[0, 1.5]] });
  });

  it("takes commas as the separator when there is no tab or semicolon", () => {
    expect(parseTwoColumnRows("0,20\n1.5,21.5", names, 100)).toEqual({ ok: true, rows: [[0, 20], [1.5, 21.5]] });
  });

  it("names the line and the column of a cell that is not a number", () => {
    const parsed = parseTwoColumnRows("0\t20\n6\twarm", names, 100);
    expect(parsed).toEqual({ ok: false, message: 'Line 2: °C is not a number: "warm".' });
  });

  it("asks for two values on each row", () => {
    const parsed = parseTwoColumnRows("0\t20\t5", names, 100);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.message).toBe("Line 1 has 3 values; two are expected (hour, °C).");
  });

  it("refuses more rows than the limit and text without numbers", () => {
    const parsed = parseTwoColumnRows("0\t1\n1\t2\n2\t3", names, 2);
    expect(parsed).toEqual({ ok: false, message: "The pasted text has more than 2 rows; at most 2 are accepted." });
    expect(parseTwoColumnRows("  \n", names, 2)).toEqual({ ok: false, message: "The pasted text has no rows of numbers." });
  });
});
