/**
 * The PDF's built-in Helvetica encodes text in WinAnsi (Windows-1252): characters outside it would print as
 * wrong glyphs. This maps the symbols Hydrastate uses to WinAnsi equivalents or spelled-out text.
 */
const REPLACEMENTS: Record<string, string> = {
  "−": "-",
  "≤": "<=",
  "≥": ">=",
  "≈": "~",
  "×": "x",
  "Δ": "Delta ",
  "Ω": "Omega",
  "μ": "µ",
  "γ": "gamma",
  "λ": "lambda",
  "σ": "sigma",
  "√": "sqrt",
  "→": "->",
  "←": "<-",
  "⁻": "-",
  "⁺": "+",
  "₀": "0", "₁": "1", "₂": "2", "₃": "3", "₄": "4", "₅": "5", "₆": "6", "₇": "7", "₈": "8", "₉": "9",
  "⁰": "0", "⁴": "4", "⁵": "5", "⁶": "6", "⁷": "7", "⁸": "8", "⁹": "9",
  "\u2009": " ", "\u202f": " ", "\u00a0": " ",
};

/** Windows-1252 characters above U+00FF. */
const WIN_ANSI_EXTRA = new Set("€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ");

function isWinAnsi(char: string): boolean {
  const code = char.codePointAt(0)!;
  return (code >= 0x20 && code <= 0x7e) || (code >= 0xa0 && code <= 0xff) || code === 0x0a || WIN_ANSI_EXTRA.has(char);
}

/** Text printable with the built-in PDF fonts: known symbols replaced, anything else outside WinAnsi → "?". */
export function pdfSafe(text: string): string {
  let out = "";
  for (const char of text) out += isWinAnsi(char) ? char : (REPLACEMENTS[char] ?? "?");
  return out;
}
