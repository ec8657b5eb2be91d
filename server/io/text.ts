/**
 * Text helpers for importers: strict UTF-8 decoding with the place of the first bad byte, JSON parsing
 * with the line and column of a syntax error, and the line and column of a JSON path in the text.
 */
import { ImportError } from './errors.js';

const decoder = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false });

/** Offset of the first byte that is not part of well-formed UTF-8, or -1. */
export function firstInvalidUtf8(b: Uint8Array): number {
  let i = 0;
  const n = b.length;
  while (i < n) {
    const c = b[i]!;
    if (c < 0x80) {
      i++;
      continue;
    }
    let need: number;
    let min: number;
    let cp: number;
    if (c >= 0xc2 && c <= 0xdf) { need = 1; min = 0x80; cp = c & 0x1f; }
    else if (c >= 0xe0 && c <= 0xef) { need = 2; min = 0x800; cp = c & 0x0f; }
    else if (c >= 0xf0 && c <= 0xf4) { need = 3; min = 0x10000; cp = c & 0x07; }
    else return i;
    for (let k = 1; k <= need; k++) {
      const cc = b[i + k];
      if (cc === undefined || (cc & 0xc0) !== 0x80) return i;
      cp = (cp << 6) | (cc & 0x3f);
    }
    if (cp < min || cp > 0x10ffff || (cp >= 0xd800 && cp <= 0xdfff)) return i;
    i += need + 1;
  }
  return -1;
}

/** 1-based line and column of byte `offset`. */
function bytePlace(b: Uint8Array, offset: number): { line: number; char: number } {
  let line = 1;
  let start = 0;
  for (let i = 0; i < offset; i++) if (b[i] === 0x0a) { line++; start = i + 1; }
  return { line, char: offset - start + 1 };
}

/**
 * Decodes file bytes as UTF-8 (a leading byte-order mark is dropped). Rejects UTF-16 files, bytes that
 * are not UTF-8 and NUL characters, naming the line and column of the first bad byte. A string is
 * taken as already decoded (its BOM is dropped, NULs still rejected).
 */
export function decodeUtf8(input: string | Uint8Array, what: string): string {
  let text: string;
  if (typeof input === 'string') {
    text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  } else {
    if ((input[0] === 0xff && input[1] === 0xfe) || (input[0] === 0xfe && input[1] === 0xff)) {
      throw new ImportError(what, [{ line: 1, reason: 'the file is UTF-16 encoded; save it as UTF-8 and import again' }]);
    }
    try {
      text = decoder.decode(input);
    } catch {
      const at = firstInvalidUtf8(input);
      const { line, char } = bytePlace(input, Math.max(0, at));
      const hex = at >= 0 ? ` (byte 0x${input[at]!.toString(16).padStart(2, '0')})` : '';
      throw new ImportError(what, [{ line, column: char, reason: `the file is not valid UTF-8${hex}; save it as UTF-8 and import again` }]);
    }
  }
  const nul = text.indexOf('\u0000');
  if (nul >= 0) {
    const { line, char } = textPlace(text, nul);
    throw new ImportError(what, [{ line, column: char, reason: 'the file contains a NUL character; it is not a text file' }]);
  }
  return text;
}

/** 1-based line and column of character `offset` of `text`. */
export function textPlace(text: string, offset: number): { line: number; char: number } {
  let line = 1;
  let start = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < offset; i = text.indexOf('\n', i + 1)) {
    line++;
    start = i + 1;
  }
  return { line, char: offset - start + 1 };
}

/** Strict JSON scanner used only to find where a text stops being JSON. */
class Scanner {
  i = 0;
  constructor(readonly t: string) {}
  fail(reason: string): never {
    throw new JsonSyntax(this.i, reason);
  }
  ws(): void {
    while (this.i < this.t.length) {
      const c = this.t.charCodeAt(this.i);
      if (c === 0x20 || c === 0x09 || c === 0x0a || c === 0x0d) this.i++;
      else break;
    }
  }
  peek(): string {
    if (this.i >= this.t.length) this.fail('the file ends in the middle of the JSON document (truncated?)');
    return this.t[this.i]!;
  }
  value(depth: number): void {
    if (depth > 500) this.fail('nested more than 500 levels deep');
    this.ws();
    const c = this.peek();
    if (c === '{') return this.object(depth);
    if (c === '[') return this.array(depth);
    if (c === '"') return this.string();
    if (c === '-' || (c >= '0' && c <= '9')) return this.number();
    for (const word of ['true', 'false', 'null']) {
      if (this.t.startsWith(word, this.i)) {
        this.i += word.length;
        return;
      }
    }
    this.fail(`unexpected ${describe(c)}; expected a value`);
  }
  object(depth: number): void {
    this.i++;
    this.ws();
    if (this.peek() === '}') { this.i++; return; }
    for (;;) {
      this.ws();
      if (this.peek() !== '"') this.fail(`unexpected ${describe(this.peek())}; expected a property name in double quotes`);
      this.string();
      this.ws();
      if (this.peek() !== ':') this.fail(`unexpected ${describe(this.peek())}; expected ':' after the property name`);
      this.i++;
      this.value(depth + 1);
      this.ws();
      const c = this.peek();
      if (c === ',') { this.i++; continue; }
      if (c === '}') { this.i++; return; }
      this.fail(`unexpected ${describe(c)}; expected ',' or '}'`);
    }
  }
  array(depth: number): void {
    this.i++;
    this.ws();
    if (this.peek() === ']') { this.i++; return; }
    for (;;) {
      this.value(depth + 1);
      this.ws();
      const c = this.peek();
      if (c === ',') { this.i++; continue; }
      if (c === ']') { this.i++; return; }
      this.fail(`unexpected ${describe(c)}; expected ',' or ']'`);
    }
  }
  string(): void {
    this.i++;
    for (;;) {
      const c = this.peek();
      if (c === '"') { this.i++; return; }
      if (c === '\\') {
        this.i++;
        const e = this.peek();
        if (e === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(this.t.slice(this.i + 1, this.i + 5))) this.fail('bad \\u escape; expected 4 hexadecimal digits');
          this.i += 5;
        } else if ('"\\/bfnrt'.includes(e)) this.i++;
        else this.fail(`bad escape \\${e}`);
        continue;
      }
      if (c.charCodeAt(0) < 0x20) this.fail('control character inside a string (a line break must be written \\n)');
      this.i++;
    }
  }
  number(): void {
    const m = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/.exec(this.t.slice(this.i, this.i + 400));
    if (!m || m[0] === '-') this.fail('malformed number');
    this.i += m[0].length;
  }
}

class JsonSyntax extends Error {
  constructor(
    readonly offset: number,
    readonly reason: string,
  ) {
    super(reason);
  }
}

function describe(c: string): string {
  return c === '\n' ? 'line break' : JSON.stringify(c);
}

/**
 * Deepest nesting of arrays and objects any JSON document read by Runwright may have. A study file
 * needs about 8 levels; the cap keeps a hostile document (thousands of `[`) from overflowing the stack
 * of the validators and of the error reply that echoes it.
 */
export const MAX_JSON_DEPTH = 64;

/**
 * Where `text` first opens an array or object deeper than `max` levels (0-based character offset,
 * 1-based line and column), or undefined. One pass without recursion; brackets inside strings do not
 * count. Works on any text (a syntax error elsewhere is left to the parser).
 */
export function jsonDepthExcess(text: string, max = MAX_JSON_DEPTH): { offset: number; line: number; char: number } | undefined {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c) i++; // backslash: skip the escaped character
      else if (c === 0x22) inString = false;
      continue;
    }
    if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) {
      depth++;
      if (depth > max) return { offset: i, ...textPlace(text, i) };
    } else if (c === 0x5d || c === 0x7d) depth = Math.max(0, depth - 1);
  }
  return undefined;
}

/** The message for a document nested deeper than MAX_JSON_DEPTH. */
export function jsonDepthMessage(at: { line: number; char: number }, max = MAX_JSON_DEPTH): string {
  return `nested more than ${max} levels deep (line ${at.line}, column ${at.char}); a Runwright document needs far fewer`;
}

/**
 * Parses JSON text. On a syntax error throws ImportError naming the line, the column and what was
 * expected there (a truncated file is reported at its end); a document nested deeper than
 * MAX_JSON_DEPTH is refused the same way before it is parsed.
 */
export function parseJsonText(text: string, what: string): unknown {
  const deep = jsonDepthExcess(text);
  if (deep) throw new ImportError(what, [{ line: deep.line, column: deep.char, reason: `not accepted: ${jsonDepthMessage(deep)}` }]);
  try {
    return JSON.parse(text) as unknown;
  } catch (e) {
    let offset = text.length;
    let reason = (e as Error).message;
    try {
      const s = new Scanner(text);
      s.value(0);
      s.ws();
      if (s.i < text.length) s.fail(`unexpected ${describe(text[s.i]!)} after the end of the JSON document`);
    } catch (err) {
      if (!(err instanceof JsonSyntax)) throw err;
      offset = err.offset;
      reason = err.reason;
    }
    const { line, char } = textPlace(text, offset);
    throw new ImportError(what, [{ line, column: char, reason: `not valid JSON: ${reason}` }]);
  }
}

/**
 * 1-based line and column where the value at `path` starts in JSON `text` (already known to parse).
 * When a key is absent, the place of the object that should hold it.
 */
export function locateJsonPath(text: string, path: readonly PropertyKey[]): { line: number; char: number } {
  const s = new Scanner(text);
  const skip = (): void => s.value(0);
  try {
    s.ws();
    for (const key of path) {
      s.ws();
      const start = s.i;
      if (typeof key === 'number') {
        if (s.peek() !== '[') break;
        s.i++;
        let k = 0;
        s.ws();
        if (s.peek() === ']') { s.i = start; break; }
        while (k < key) {
          skip();
          s.ws();
          if (s.peek() !== ',') { s.i = start; return textPlace(text, start); }
          s.i++;
          k++;
        }
        s.ws();
      } else {
        if (s.peek() !== '{') break;
        s.i++;
        let found = false;
        for (;;) {
          s.ws();
          if (s.peek() === '}') break;
          const keyStart = s.i;
          s.string();
          const name = JSON.parse(text.slice(keyStart, s.i)) as string;
          s.ws();
          s.i++; // ':'
          s.ws();
          if (name === String(key)) { found = true; break; }
          skip();
          s.ws();
          if (s.peek() === ',') s.i++;
        }
        if (!found) { s.i = start; break; }
      }
    }
  } catch {
    // fall through with the current position
  }
  return textPlace(text, Math.min(s.i, text.length));
}

/**
 * For each element of the array at `prefix` (object keys from the top) of JSON `text` (already known
 * to parse), the 1-based line and column where the value of its `key` starts (the element's own
 * start when it has no such key). One pass over the text, for the messages of large imports.
 */
export function locateArrayItemKeys(text: string, prefix: readonly string[], key: string): { line: number; char: number }[] {
  const s = new Scanner(text);
  const offsets: number[] = [];
  s.ws();
  for (const k of prefix) {
    if (s.peek() !== '{') return [];
    s.i++;
    for (;;) {
      s.ws();
      if (s.peek() === '}') return [];
      const keyStart = s.i;
      s.string();
      const name = JSON.parse(text.slice(keyStart, s.i)) as string;
      s.ws();
      s.i++; // ':'
      s.ws();
      if (name === k) break;
      s.value(0);
      s.ws();
      if (s.peek() === ',') s.i++;
    }
  }
  if (s.peek() !== '[') return [];
  s.i++;
  for (;;) {
    s.ws();
    if (s.peek() === ']') break;
    const start = s.i;
    let at = start;
    if (s.peek() === '{') {
      s.i++;
      for (;;) {
        s.ws();
        if (s.peek() === '}') { s.i++; break; }
        const keyStart = s.i;
        s.string();
        const name = JSON.parse(text.slice(keyStart, s.i)) as string;
        s.ws();
        s.i++; // ':'
        s.ws();
        if (name === key && at === start) at = s.i;
        s.value(1);
        s.ws();
        if (s.peek() === ',') s.i++;
      }
    } else s.value(0);
    offsets.push(at);
    s.ws();
    if (s.peek() === ',') s.i++;
  }
  // Offsets ascend: one walk over the line breaks places them all.
  const out: { line: number; char: number }[] = [];
  let line = 1;
  let lineStart = 0;
  let nl = text.indexOf('\n');
  for (const off of offsets) {
    while (nl >= 0 && nl < off) {
      line++;
      lineStart = nl + 1;
      nl = text.indexOf('\n', nl + 1);
    }
    out.push({ line, char: off - lineStart + 1 });
  }
  return out;
}
