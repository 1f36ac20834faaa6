import { requireFinite, requirePositive } from './checks';
import {
  DEFAULT_INCH_DENOMINATOR,
  INCHES_PER_FOOT,
  type LengthUnit,
  MM_PER_INCH,
  MM_PER_UNIT_RATIO,
  UNICODE_FRACTIONS,
  UNIT_WORDS,
} from './units-data';

/** Thrown when typed text cannot be read as a length; the message quotes the part not understood. */
export class LengthParseError extends Error {
  override readonly name = 'LengthParseError';
}

/** The outcome of reading a length without throwing, for form validation. */
export type LengthParseResult = { ok: true; mm: number } | { ok: false; message: string };

/** Options for reading a length. */
export interface ParseLengthOptions {
  /** Unit for a bare number such as "762"; without it a bare number is refused as ambiguous. */
  defaultUnit?: LengthUnit;
}

interface Term {
  text: string;
  numerator: number;
  denominator: number;
  unit?: LengthUnit;
}

const EXAMPLES = `762 mm, 0.762 m, 30 in or 2' 6"`;
// A fraction (1/2), a whole number and a fraction (6 1/2 or 6-1/2), or a decimal (30, 0.762, .5).
const NUMBER = String.raw`\s*(?:(\d+)\/(\d+)|(\d+)(?:\s+|-)(\d+)\/(\d+)|(\d+)(?:\.(\d+))?|\.(\d+))`;
const UNIT = String.raw`\s*([a-z]+|'|")?`;
const SEPARATOR = String.raw`\s*-?`;

/** Matches `source` exactly at `at`, returning the match and where it ends. */
function matchAt(source: string, input: string, at: number): { match: RegExpExecArray; end: number } | undefined {
  const pattern = new RegExp(source, 'y');
  pattern.lastIndex = at;
  const match = pattern.exec(input);
  return match === null ? undefined : { match, end: pattern.lastIndex };
}

function normalise(text: string): string {
  let out = text.trim().toLowerCase();
  out = out
    .replace(/[’‘′`]{2}|''/g, '"')
    .replace(/[’‘′`]/g, "'")
    .replace(/[”“″]/g, '"');
  for (const [glyph, fraction] of Object.entries(UNICODE_FRACTIONS)) out = out.replaceAll(glyph, ` ${fraction}`);
  return out;
}

function readUnit(input: string, at: number, original: string): { unit?: LengthUnit; end: number } {
  const found = matchAt(UNIT, input, at);
  const word = found?.match[1];
  if (found === undefined || word === undefined) return { end: at };
  if (!Object.hasOwn(UNIT_WORDS, word)) {
    throw new LengthParseError(`"${word}" in "${original}" is not a unit we know; use mm, cm, m, in or ft.`);
  }
  return { unit: UNIT_WORDS[word], end: found.end };
}

function readNumber(match: RegExpExecArray): { numerator: number; denominator: number } {
  const [, fracN, fracD, whole, mixedN, mixedD, intPart, decimals, bareDecimals] = match;
  if (fracN !== undefined && fracD !== undefined) return { numerator: Number(fracN), denominator: Number(fracD) };
  if (whole !== undefined && mixedN !== undefined && mixedD !== undefined) {
    const d = Number(mixedD);
    return { numerator: Number(whole) * d + Number(mixedN), denominator: d };
  }
  const digits = bareDecimals ?? decimals ?? '';
  return { numerator: Number(`${intPart ?? '0'}${digits}`), denominator: 10 ** digits.length };
}

function readTerms(input: string, original: string): Term[] {
  const terms: Term[] = [];
  let at = 0;
  while (!/^\s*$/.test(input.slice(at))) {
    if (terms.length > 0) at = matchAt(SEPARATOR, input, at)?.end ?? at;
    const found = matchAt(NUMBER, input, at);
    if (found === undefined) {
      throw new LengthParseError(
        `Could not understand "${input.slice(at).trim()}" in "${original}"; write ${EXAMPLES}.`,
      );
    }
    const { numerator, denominator } = readNumber(found.match);
    if (denominator === 0 || !Number.isFinite(numerator) || !Number.isFinite(denominator)) {
      throw new LengthParseError(`"${found.match[0].trim()}" in "${original}" is not a usable number.`);
    }
    const { unit, end } = readUnit(input, found.end, original);
    terms.push({ text: input.slice(at, end).trim(), numerator, denominator, unit });
    at = end;
  }
  return terms;
}

/** A term in millimetres as a ratio of whole numbers. */
function termRatio(term: Term, unit: LengthUnit): [number, number] {
  const [n, d] = MM_PER_UNIT_RATIO[unit];
  return [term.numerator * n, term.denominator * d];
}

function noUnit(term: Term, original: string): LengthParseError {
  return new LengthParseError(
    `"${term.text}" in "${original}" has no unit; add mm, cm, m, in or ft (e.g. ${EXAMPLES}).`,
  );
}

function combine(terms: Term[], original: string, defaultUnit?: LengthUnit): number {
  const [first, second, third] = terms;
  if (first === undefined) throw new LengthParseError(`Enter a length, such as ${EXAMPLES}.`);
  if (third !== undefined) throw new LengthParseError(`"${original}" has too many numbers; write ${EXAMPLES}.`);
  if (second === undefined) {
    const unit = first.unit ?? defaultUnit;
    if (unit === undefined) throw noUnit(first, original);
    const [n, d] = termRatio(first, unit);
    return n / d;
  }
  if (first.unit === undefined) throw noUnit(first, original);
  if (first.unit !== 'ft' || (second.unit !== undefined && second.unit !== 'in')) {
    throw new LengthParseError(`"${original}" mixes units; only feet followed by inches can be combined, as in 2' 6".`);
  }
  const [n1, d1] = termRatio(first, 'ft');
  const [n2, d2] = termRatio(second, 'in');
  return (n1 * d2 + n2 * d1) / (d1 * d2);
}

/**
 * Reads a typed length into millimetres: "762 mm", "76.2 cm", "0.762 m", "30in", "2' 6\"", "2 ft 6 in", "2'-6 1/2\"",
 * "6½ in". Inches are exactly 25.4 mm. Throws a {@link LengthParseError} that quotes what was not understood.
 */
export function parseLength(text: string, options: ParseLengthOptions = {}): number {
  if (text.includes(',')) {
    throw new LengthParseError(`"${text}" has a comma; use a point for decimals (0.762 m) and no thousands separator.`);
  }
  const input = normalise(text);
  if (input.startsWith('-')) throw new LengthParseError(`"${text}" is negative; a length must be zero or more.`);
  return combine(readTerms(input, text.trim()), text.trim(), options.defaultUnit);
}

/** Like {@link parseLength}, but returns the message instead of throwing, for a form field's validation. */
export function tryParseLength(text: string, options: ParseLengthOptions = {}): LengthParseResult {
  try {
    return { ok: true, mm: parseLength(text, options) };
  } catch (error) {
    if (error instanceof LengthParseError) return { ok: false, message: error.message };
    throw error;
  }
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Options for showing a length in feet and inches. */
export interface FeetInchesOptions {
  /** The finest fraction of an inch shown (default 16, i.e. nearest 1/16 in). */
  denominator?: number;
  /** Show whole feet (2' 6") or inches only (30"); default true. */
  feet?: boolean;
}

/** Shows millimetres as feet and inches to the nearest 1/16 in: 762 → `2' 6"`, 165.1 → `6 1/2"`. */
export function formatFeetInches(mm: number, options: FeetInchesOptions = {}): string {
  const { denominator = DEFAULT_INCH_DENOMINATOR, feet = true } = options;
  requireFinite(mm, 'Length', 'millimetres');
  requirePositive(denominator, 'Fraction of an inch', 'parts');
  const steps = Math.round((Math.abs(mm) * denominator) / MM_PER_INCH);
  const stepsPerFoot = INCHES_PER_FOOT * denominator;
  const wholeFeet = feet ? Math.floor(steps / stepsPerFoot) : 0;
  const rest = steps - wholeFeet * stepsPerFoot;
  const wholeInches = Math.floor(rest / denominator);
  const part = rest - wholeInches * denominator;
  const divisor = gcd(part, denominator);
  const fraction = part === 0 ? '' : `${part / divisor}/${denominator / divisor}`;
  const inches = fraction === '' ? `${wholeInches}` : wholeInches === 0 ? fraction : `${wholeInches} ${fraction}`;
  const sign = mm < 0 && steps > 0 ? '-' : '';
  return wholeFeet > 0 ? `${sign}${wholeFeet}' ${inches}"` : `${sign}${inches}"`;
}

/** Shows millimetres as millimetres, rounded to `decimals` places: 762.04 → `762 mm`. */
export function formatMillimetres(mm: number, decimals = 0): string {
  requireFinite(mm, 'Length', 'millimetres');
  const text = mm.toFixed(decimals);
  return `${Number(text) === 0 ? text.replace('-', '') : text} mm`;
}
