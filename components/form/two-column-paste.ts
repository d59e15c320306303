/**
 * Parses rows pasted from a spreadsheet into pairs of numbers (e.g. hour and °C of an ambient series).
 * One row per line; two cells per row separated by a tab (a copied spreadsheet range), a semicolon or a comma.
 * With tabs or semicolons a decimal comma is accepted ("21,5"); with commas as separators the decimal mark must
 * be a point. A first line that is not numeric is taken as a header and skipped; blank lines are skipped.
 */
export type PastedPairs = { ok: true; rows: [number, number][] } | { ok: false; message: string };

const NUMBER_PATTERN = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

function cellNumber(cell: string, separator: string): number | undefined {
  const normalised = separator === "," ? cell.trim() : cell.trim().replace(",", ".");
  // A spreadsheet may write a minus sign as U+2212.
  const text = normalised.replace(/^\u2212/, "-");
  return NUMBER_PATTERN.test(text) ? Number(text) : undefined;
}

function separatorOf(line: string): string {
  return line.includes("\t") ? "\t" : line.includes(";") ? ";" : ",";
}

/** `columnNames` name the two columns in messages; at most `maxRows` rows are accepted. */
export function parseTwoColumnRows(text: string, columnNames: readonly [string, string], maxRows: number): PastedPairs {
  const lines = text.split(/\r?\n/).map((l) => l.trim());
  const rows: [number, number][] = [];
  let firstContentLine = true;
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i];
    if (line === "") continue;
    const separator = separatorOf(line);
    const cells = line.split(separator).map((c) => c.trim());
    const values = cells.map((c) => cellNumber(c, separator));
    if (firstContentLine && values.every((v) => v === undefined)) {
      firstContentLine = false;
      continue; // header row
    }
    firstContentLine = false;
    if (cells.length !== 2) return { ok: false, message: `Line ${i + 1} has ${cells.length} value${cells.length === 1 ? "" : "s"}; two are expected (${columnNames[0]}, ${columnNames[1]}).` };
    for (let c = 0; c < 2; c++) {
      if (values[c] === undefined) return { ok: false, message: `Line ${i + 1}: ${columnNames[c]} is not a number: "${cells[c]}".` };
    }
    rows.push([values[0]!, values[1]!]);
    if (rows.length > maxRows) return { ok: false, message: `The pasted text has more than ${maxRows} rows; at most ${maxRows} are accepted.` };
  }
  if (rows.length === 0) return { ok: false, message: "The pasted text has no rows of numbers." };
  return { ok: true, rows };
}
