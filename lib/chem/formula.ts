import { isKnownElement } from "./element-table";

/** Element stoichiometry and charge of one formula unit. */
export type ParsedFormula = { elements: Record<string, number>; charge: number };

export type FormulaErrorCode = "formula_syntax" | "unknown_element";

export type FormulaError = {
  code: FormulaErrorCode;
  formula: string;
  /** 0-based index into `formula` of the character where parsing failed. */
  position?: number;
  message: string;
};

export type FormulaResult = { ok: true; value: ParsedFormula } | { ok: false; error: FormulaError };

/** Phase suffixes that say nothing about stoichiometry (common practice in thermodynamic tables). */
const phaseSuffixPattern = /\((?:aq|g|s|l|cr|am)\)$/;
/** Trailing charge: `+`, `-`, `+2`, `-2`, `++`, `--` (the sign comes before the number: `Ca+2`, not `Ca2+`). */
const chargePattern = /(?:([+-])(\d+)|(\++)|(-+))$/;
/** Hydrate and adduct separators: middle dot, bullet and asterisk. */
const separatorPattern = /[·•*]/;

class FormulaSyntaxError extends Error {
  constructor(
    readonly code: FormulaErrorCode,
    readonly position: number,
    message: string,
  ) {
    super(message);
  }
}

/**
 * Parses a chemical formula into element counts and charge.
 *
 * Grammar (whitespace only around separators):
 *   formula   := part (sep part)* charge? phase?
 *   part      := number? group+          leading multiplier, e.g. `3CaO`, `2H2O`
 *   group     := Element number? | "(" group+ ")" number? | "[" group+ "]" number?
 *   number    := digits ("." digits)?    decimal subscripts, e.g. `(CaO)1.5(SiO2)1(H2O)2.5`
 *   sep       := "·" | "•" | "*"
 *   charge    := ("+" | "-") digits | "+"+ | "-"+
 *   phase     := "(aq)" | "(g)" | "(s)" | "(l)" | "(cr)" | "(am)"   ignored for stoichiometry
 *
 * Examples: `CaSO4·2H2O`, `3CaO·Al2O3·6H2O`, `Al(OH)4-`, `SO4-2`, `CO2(aq)`.
 * Cost O(n) in the formula length. Returns a typed error with the failing position; never throws.
 */
export function parseFormula(text: string): FormulaResult {
  try {
    return { ok: true, value: parseOrThrowSyntax(text) };
  } catch (caught) {
    if (caught instanceof FormulaSyntaxError) {
      return {
        ok: false,
        error: { code: caught.code, formula: text, position: caught.position, message: caught.message },
      };
    }
    throw caught;
  }
}

/** Parses a formula from trusted data (data files, code); throws an Error with the message on failure. */
export function parseFormulaOrThrow(text: string): ParsedFormula {
  const result = parseFormula(text);
  if (!result.ok) throw new Error(`parseFormula: ${result.error.message}`);
  return result.value;
}

function parseOrThrowSyntax(text: string): ParsedFormula {
  if (text.length === 0) throw new FormulaSyntaxError("formula_syntax", 0, "the formula is empty");

  let bodyEnd = text.length;
  const phaseMatch = phaseSuffixPattern.exec(text);
  if (phaseMatch) bodyEnd = phaseMatch.index;

  let charge = 0;
  const chargeMatch = chargePattern.exec(text.slice(0, bodyEnd));
  if (chargeMatch) {
    if (chargeMatch[1]) charge = (chargeMatch[1] === "+" ? 1 : -1) * Number(chargeMatch[2]);
    else if (chargeMatch[3]) charge = chargeMatch[3].length;
    else charge = -chargeMatch[4].length;
    bodyEnd = chargeMatch.index;
  }
  if (bodyEnd === 0) throw new FormulaSyntaxError("formula_syntax", 0, `"${text}" has no elements`);

  const parser = new Cursor(text, bodyEnd);
  const elements: Record<string, number> = {};
  parsePart(parser, elements);
  while (!parser.atEnd()) {
    parser.skipSpaces();
    if (!separatorPattern.test(parser.peek())) {
      throw new FormulaSyntaxError(
        "formula_syntax",
        parser.position,
        `unexpected "${parser.peek()}" at position ${parser.position} of "${text}"`,
      );
    }
    parser.advance();
    parser.skipSpaces();
    parsePart(parser, elements);
  }
  for (const symbol of Object.keys(elements)) if (elements[symbol] === 0) delete elements[symbol];
  if (Object.keys(elements).length === 0) throw new FormulaSyntaxError("formula_syntax", 0, `"${text}" has no elements`);
  return { elements, charge: charge === 0 ? 0 : charge };
}

class Cursor {
  position = 0;
  constructor(
    readonly text: string,
    readonly end: number,
  ) {}
  atEnd(): boolean {
    return this.position >= this.end;
  }
  peek(): string {
    return this.atEnd() ? "" : this.text[this.position];
  }
  advance(): void {
    this.position += 1;
  }
  skipSpaces(): void {
    while (!this.atEnd() && /\s/.test(this.peek())) this.advance();
  }
}

/** `number? group+` added, times the multiplier, into `into`. */
function parsePart(cursor: Cursor, into: Record<string, number>): void {
  const start = cursor.position;
  const multiplier = readNumber(cursor) ?? 1;
  const counts = parseGroups(cursor, undefined);
  if (Object.keys(counts).length === 0) {
    throw new FormulaSyntaxError(
      "formula_syntax",
      cursor.position,
      `expected an element or "(" at position ${cursor.position} of "${cursor.text}"`,
    );
  }
  if (multiplier === 0) throw new FormulaSyntaxError("formula_syntax", start, `zero multiplier at position ${start} of "${cursor.text}"`);
  addInto(into, counts, multiplier);
}

/** Reads groups until the end of the part (a separator or the body end) or the given closing bracket. */
function parseGroups(cursor: Cursor, closing: ")" | "]" | undefined): Record<string, number> {
  const counts: Record<string, number> = {};
  for (;;) {
    if (cursor.atEnd()) {
      if (closing) {
        throw new FormulaSyntaxError("formula_syntax", cursor.position, `missing "${closing}" at position ${cursor.position} of "${cursor.text}"`);
      }
      return counts;
    }
    const character = cursor.peek();
    if (character === ")" || character === "]") {
      if (character !== closing) {
        throw new FormulaSyntaxError("formula_syntax", cursor.position, `unmatched "${character}" at position ${cursor.position} of "${cursor.text}"`);
      }
      return counts;
    }
    if (separatorPattern.test(character) || /\s/.test(character)) {
      if (closing) {
        throw new FormulaSyntaxError("formula_syntax", cursor.position, `separator "${character}" inside brackets at position ${cursor.position} of "${cursor.text}"`);
      }
      return counts;
    }
    if (character === "(" || character === "[") {
      const openPosition = cursor.position;
      cursor.advance();
      const inner = parseGroups(cursor, character === "(" ? ")" : "]");
      if (Object.keys(inner).length === 0) {
        throw new FormulaSyntaxError("formula_syntax", openPosition, `empty brackets at position ${openPosition} of "${cursor.text}"`);
      }
      cursor.advance(); // the closing bracket
      addInto(counts, inner, readNumber(cursor) ?? 1);
      continue;
    }
    if (/[A-Z]/.test(character)) {
      const symbolPosition = cursor.position;
      let symbol = character;
      cursor.advance();
      if (/[a-z]/.test(cursor.peek())) {
        symbol += cursor.peek();
        cursor.advance();
      }
      if (!isKnownElement(symbol)) {
        throw new FormulaSyntaxError(
          "unknown_element",
          symbolPosition,
          `unknown element "${symbol}" at position ${symbolPosition} of "${cursor.text}" (not in lib/data/elements.json)`,
        );
      }
      addInto(counts, { [symbol]: 1 }, readNumber(cursor) ?? 1);
      continue;
    }
    throw new FormulaSyntaxError("formula_syntax", cursor.position, `unexpected "${character}" at position ${cursor.position} of "${cursor.text}"`);
  }
}

/** Reads `digits ("." digits)?`, or returns undefined when no digit is next. */
function readNumber(cursor: Cursor): number | undefined {
  const start = cursor.position;
  while (/\d/.test(cursor.peek())) cursor.advance();
  if (cursor.position === start) return undefined;
  if (cursor.peek() === ".") {
    cursor.advance();
    const fractionStart = cursor.position;
    while (/\d/.test(cursor.peek())) cursor.advance();
    if (cursor.position === fractionStart) {
      throw new FormulaSyntaxError("formula_syntax", cursor.position, `a digit must follow "." at position ${cursor.position} of "${cursor.text}"`);
    }
  }
  return Number(cursor.text.slice(start, cursor.position));
}

function addInto(into: Record<string, number>, counts: Record<string, number>, multiplier: number): void {
  for (const [symbol, count] of Object.entries(counts)) {
    // Round away binary noise from decimal subscripts (1.5·2 etc.) at 1e-12.
    into[symbol] = Math.round(((into[symbol] ?? 0) + count * multiplier) * 1e12) / 1e12;
  }
}
