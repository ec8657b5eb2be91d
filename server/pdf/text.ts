/**
 * Text for the PDF's built-in Helvetica and Courier fonts. These standard fonts draw only the
 * WinAnsi (Windows-1252) character set; anything else would come out as a blank or a wrong glyph.
 * Every string the appendix draws passes through `pdfText`, the one place where symbols outside that
 * set are written out (σ → sigma, ≥ → >=, − → -, √ → sqrt, ...).
 */

/** Unicode code points (other than 32–126 and 160–255) that WinAnsi maps, as pdfkit's AFM fonts do. */
const WIN_ANSI_EXTRA = new Set([
  0x0152, 0x0153, 0x0160, 0x0161, 0x0178, 0x017d, 0x017e, 0x0192, 0x02c6, 0x02dc, 0x2013, 0x2014, 0x2018, 0x2019,
  0x201a, 0x201c, 0x201d, 0x201e, 0x2020, 0x2021, 0x2022, 0x2026, 0x2030, 0x2039, 0x203a, 0x20ac, 0x2122,
]);

/** Whether one character can be drawn with the standard fonts. */
export function isWinAnsi(ch: string): boolean {
  const c = ch.codePointAt(0)!;
  return (c >= 32 && c <= 126) || (c >= 160 && c <= 255) || WIN_ANSI_EXTRA.has(c) || c === 10;
}

/** Multi-character sequences replaced first (a letter with a combining mark). */
const SEQUENCES: readonly (readonly [string, string])[] = [
  ['T\u0304', 'T_mean'],
];

/** Replacements for characters outside WinAnsi. */
const SUBSTITUTES: Readonly<Record<string, string>> = {
  // Greek
  'α': 'alpha', 'β': 'beta', 'γ': 'gamma', 'δ': 'delta', 'ε': 'epsilon', 'η': 'eta', 'θ': 'theta',
  'κ': 'kappa', 'λ': 'lambda', 'μ': '\u00b5', 'ν': 'nu', 'π': 'pi', 'ρ': 'rho', 'σ': 'sigma', 'τ': 'tau',
  'φ': 'phi', 'ϕ': 'phi', 'ω': 'omega', 'Δ': 'delta ', 'Φ': 'Phi', 'Λ': 'Lambda', 'Σ': 'sum ', 'Ω': 'Omega',
  // Mathematics
  '≥': '>=', '≤': '<=', '≈': '~', '≠': '!=', '−': '-', '√': 'sqrt', '∫': 'integral ', '∞': 'infinity',
  '→': '->', '←': '<-', '↔': '<->', '′': "'", '″': '"', '∝': 'proportional to', '∈': 'in', '⋅': '\u00b7',
  // Super- and subscripts WinAnsi lacks (¹ ² ³ are present)
  '⁰': '^0', '⁴': '^4', '⁵': '^5', '⁶': '^6', '⁷': '^7', '⁸': '^8', '⁹': '^9', '⁻': '^-', '⁺': '^+',
  '₀': '0', '₁': '1', '₂': '2', '₃': '3', '₄': '4', '₅': '5', '₆': '6', '₇': '7', '₈': '8', '₉': '9',
  // Spaces and marks
  '\u2009': ' ', '\u202f': ' ', '\u2002': ' ', '\u2003': ' ', '\u200b': '', '\u2010': '-',
  '\u2011': '-', '\u0304': '', '\u2713': 'yes', '\u2717': 'no',
};

/** The text with every character the standard fonts cannot draw replaced; unknown ones become "?". */
export function pdfText(text: string): string {
  let s = text;
  for (const [from, to] of SEQUENCES) s = s.split(from).join(to);
  let out = '';
  for (const ch of s) {
    if (ch === '\t') out += ' ';
    else if (ch === '\r') continue;
    else if (isWinAnsi(ch)) out += ch;
    else out += SUBSTITUTES[ch] ?? '?';
  }
  return out;
}

/** Characters of `text` that neither WinAnsi nor the substitutions cover (those would print as "?"). */
export function uncovered(text: string): string[] {
  const s = SEQUENCES.reduce((acc, [from, to]) => acc.split(from).join(to), text);
  return [...new Set([...s].filter((ch) => ch !== '\t' && ch !== '\r' && !isWinAnsi(ch) && SUBSTITUTES[ch] === undefined))];
}
