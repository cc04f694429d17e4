// What a person types as a length ("60½", "60 1/2", "152,4 cm") → exact integer micrometres, and back.
// Pure: runs on the server and in the browser (live preview while an entrant types).
//
// Exactness: nothing here multiplies a parsed float by 25,400. Text is read as an integer numerator
// over a power of ten (or over 2, 4, 8, 16 for fractions) and converted with integer arithmetic.
// Halves, quarters, eighths of an inch, hundredths of an inch and every cm value to 0.01 cm are
// exact integers in µm. Two cases are not, and are rounded half-up to the micrometre (the same
// rounding as inchesToUm in units.ts), far below what a tape measure reads:
//   - odd sixteenths: 1/16 in = 1,587.5 µm → 1,588 µm;
//   - thousandths of an inch: 0.001 in = 25.4 µm (60.001 in = 1,524,025.4 µm → 1,524,025 µm).
import { UM_PER_CM, UM_PER_INCH } from "./units";

export type LengthUnit = "in" | "cm";
export type ParsedLength = { ok: true; um: number } | { ok: false; message: string };

/** Our own sanity limit: no quilt is near 1,000 in (25.4 m); beyond it a digit was surely mistyped. */
export const MAX_LENGTH_UM = 1_000 * UM_PER_INCH;

const VULGAR: Record<string, [number, number]> = {
  "½": [1, 2], "¼": [1, 4], "¾": [3, 4], "⅛": [1, 8], "⅜": [3, 8], "⅝": [5, 8], "⅞": [7, 8],
};
// Fraction characters a tape measure never shows: thirds, fifths, sixths, sevenths, ninths, tenths.
const OTHER_VULGAR = /[⅓⅔⅕⅖⅗⅘⅙⅚⅐⅑⅒]/;
const EIGHTHS_CHAR = ["", "⅛", "¼", "⅜", "½", "⅝", "¾", "⅞"];
const TAPE_DENOMINATORS = new Set([2, 4, 8, 16]);

const fail = (message: string): ParsedLength => ({ ok: false, message });

/** Rounds num/den (both non-negative integers) half-up to an integer. */
function roundHalfUp(num: number, den: number): number {
  return Math.floor((2 * num + den) / (2 * den));
}

function tidy(text: string): string {
  return text
    .normalize("NFC")
    .replace(/[\u00a0\u2007\u2009\u202f]/g, " ") // non-breaking and thin spaces
    .replace(/[\u2044\u2215]/g, "/") // fraction slash, division slash
    .replace(/\s+/g, " ")
    .trim();
}

function tooLong(unit: LengthUnit): ParsedLength {
  return fail(unit === "in"
    ? "That's over 1,000 in (about 25 m), longer than any quilt: check the number."
    : "That's over 2,540 cm (1,000 in), longer than any quilt: check the number.");
}

function checked(um: number, unit: LengthUnit): ParsedLength {
  if (um <= 0) return fail("A length must be more than 0.");
  if (um > MAX_LENGTH_UM) return tooLong(unit);
  return { ok: true, um };
}

/** Reads a length typed in inches or centimetres; `unit` is the unit the field is set to. */
export function parseLength(text: string, unit: LengthUnit): ParsedLength {
  const t = tidy(text);
  const example = unit === "in" ? "60, 60.5, 60½ or 60 1/2" : "152.4 or 152,4";
  if (t === "") return fail(`Enter a length, e.g. ${example}.`);
  if (/^[-−–]/.test(t)) return fail("A length can't be negative.");
  if (/\d\s*(ft|feet|foot|'|′|’)$/i.test(t) || /\d\s*(ft|feet|foot|'|′|’)\s*\d/i.test(t)) {
    return fail(unit === "in" ? "Give the whole length in inches, e.g. 60 rather than 5 ft." : "Give the length in centimetres, e.g. 152.4.");
  }
  if (/\d\s*mm$/i.test(t)) return fail(unit === "in" ? "That looks like millimetres: give inches, e.g. 60½." : "That looks like millimetres: give centimetres, e.g. 152.4 (not 1524 mm).");
  if (/\d\s*m$/i.test(t)) return fail(`That looks like metres: give ${unit === "in" ? "inches" : "centimetres"}.`);
  return unit === "in" ? parseInches(t) : parseCentimetres(t);
}

function parseInches(t: string): ParsedLength {
  if (/\d\s*cm\.?$/i.test(t)) return fail("That's in centimetres: switch the unit to cm, or give inches.");
  const s = t.replace(/\s*(?:"|″|”|''|in\.?|inch(?:es)?)$/i, "").trim();
  const garbage = fail(`"${t.slice(0, 24)}" isn't a length: type inches like 60, 60.5, 60½ or 60 1/2.`);
  if (s === "") return garbage;
  if (OTHER_VULGAR.test(s)) return fail(notOnTape());
  if (/^\d*,\d+$/.test(s)) return fail("Write inch decimals with a point (60.5) or as a fraction (60½).");

  let m = /^(\d*)\.(\d*)$/.exec(s) ?? /^(\d+)()$/.exec(s);
  if (m) {
    const [, whole = "", decimals = ""] = m;
    if (whole === "" && decimals === "") return garbage;
    if (decimals.length > 3) return fail("Give at most 3 decimals of an inch (60.125); for sixteenths write a fraction, e.g. 60 1/16.");
    const digits = stripZeros(whole);
    if (digits.length > 4) return tooLong("in");
    // thousandths of an inch × 25.4 µm, rounded half-up (exact for up to 2 decimals).
    const thousandths = Number(digits || "0") * 1000 + Number(decimals.padEnd(3, "0"));
    return checked(roundHalfUp(thousandths * 254, 10), "in");
  }

  m = /^(\d+)? ?([½¼¾⅛⅜⅝⅞])$/.exec(s);
  if (m) {
    const [, whole = "0", char = ""] = m;
    const [num, den] = VULGAR[char] ?? [0, 1];
    return fraction(whole, num, den);
  }

  m = /^(?:(\d+)(?: ?- ?| ))?(\d+) ?\/ ?(\d+)$/.exec(s);
  if (m) {
    const [, whole = "0", num = "0", den = "1"] = m;
    if (Number(den) === 0) return fail("A fraction can't have 0 below the line.");
    if (!TAPE_DENOMINATORS.has(Number(den))) return fail(notOnTape(`1/${Number(den)}`));
    if (num.length > 4) return garbage;
    return fraction(whole, Number(num), Number(den));
  }
  return garbage;
}

function notOnTape(what?: string): string {
  const which = what ? ` (${what} of an inch isn't one)` : "";
  return `Measure to the nearest ⅛ in: use halves, quarters, eighths or sixteenths${which}, e.g. 60⅜ or 60 3/8.`;
}

function fraction(wholeText: string, num: number, den: number): ParsedLength {
  const digits = stripZeros(wholeText);
  if (digits.length > 4) return tooLong("in");
  const whole = Number(digits || "0");
  if (num >= den) {
    const w = whole + Math.floor(num / den);
    const rest = num % den;
    const suggestion = rest ? `${w} ${rest}/${den}` : `${w}`;
    return fail(`${num}/${den} is a whole inch or more: write ${suggestion}.`);
  }
  // (whole + num/den) in × 25,400 µm; only odd sixteenths leave a half micrometre (rounded up).
  return checked(roundHalfUp((whole * den + num) * UM_PER_INCH, den), "in");
}

function parseCentimetres(t: string): ParsedLength {
  if (/\d\s*(?:"|″|”|''|in\.?|inch(?:es)?)$/i.test(t)) return fail("That's in inches: switch the unit to inches, or give centimetres.");
  const s = t.replace(/\s*cm\.?$/i, "").trim();
  if (/[½¼¾⅛⅜⅝⅞⅓⅔⅕⅖⅗⅘⅙⅚⅐⅑⅒/]/.test(s)) return fail("Give centimetres as a decimal, e.g. 152.5, not a fraction.");
  const m = /^(\d*)[.,](\d*)$/.exec(s) ?? /^(\d+)()$/.exec(s);
  if (!m) return fail(`"${t.slice(0, 24)}" isn't a length: type centimetres like 152.4 or 152,4.`);
  const [, whole = "", decimals = ""] = m;
  if (whole === "" && decimals === "") return fail(`"${t.slice(0, 24)}" isn't a length: type centimetres like 152.4 or 152,4.`);
  if (decimals.length > 2) return fail("Give centimetres to at most 2 decimals (0.1 mm), e.g. 152.45.");
  const digits = stripZeros(whole);
  if (digits.length > 5) return tooLong("cm");
  // hundredths of a centimetre are 100 µm each: always exact.
  const hundredths = Number(digits || "0") * 100 + Number(decimals.padEnd(2, "0"));
  return checked(hundredths * (UM_PER_CM / 100), "cm");
}

function stripZeros(digits: string): string {
  return digits.replace(/^0+(?=\d)/, "");
}

/**
 * A string parseLength accepts, for putting a stored length back into a field. Inches: exact
 * eighths as "60½", other sixteenths as "60 3/16", anything else as decimal inches to 0.001 in.
 * Centimetres: to 0.01 cm ("152.4"). parseLength(formatForInput(um, unit), unit) gives um back
 * for every value parseLength itself produces in that unit; other values (a length typed in cm
 * shown in inches, say) come back as the nearest value the field can hold.
 */
export function formatForInput(um: number, unit: LengthUnit): string {
  if (!Number.isFinite(um) || um <= 0) return "";
  const n = Math.round(um);
  if (unit === "cm") {
    const hundredths = Math.max(1, roundHalfUp(n, UM_PER_CM / 100));
    return trimDecimal(hundredths, 2);
  }
  if ((n * 8) % UM_PER_INCH === 0) {
    const eighths = (n * 8) / UM_PER_INCH;
    const whole = Math.floor(eighths / 8);
    const char = EIGHTHS_CHAR[eighths % 8] ?? "";
    return whole === 0 ? char : `${whole}${char}`;
  }
  const sixteenths = Math.round((n * 16) / UM_PER_INCH);
  if (roundHalfUp(sixteenths * UM_PER_INCH, 16) === n) {
    const whole = Math.floor(sixteenths / 16);
    const rest = `${sixteenths % 16}/16`;
    return whole === 0 ? rest : `${whole} ${rest}`;
  }
  const thousandths = Math.max(1, Math.round((n * 10) / 254));
  return trimDecimal(thousandths, 3);
}

/** 152_40, 2 → "152.4"; 60_000, 3 → "60". */
function trimDecimal(scaled: number, places: number): string {
  const s = String(scaled).padStart(places + 1, "0");
  const whole = s.slice(0, -places);
  const decimals = s.slice(-places).replace(/0+$/, "");
  return decimals ? `${whole}.${decimals}` : whole;
}

// Sizes derived from width × length, all in integer µm (µm² for area). The largest sides the
// parser accepts (1,000 in = 25,400,000 µm) give an area of 6.45 × 10^14 µm², below 2^53, so the
// products are exact JavaScript numbers.
export const perimeterUm = (widthUm: number, lengthUm: number): number => 2 * (widthUm + lengthUm);
export const areaUm2 = (widthUm: number, lengthUm: number): number => widthUm * lengthUm;
export const longestSideUm = (widthUm: number, lengthUm: number): number => Math.max(widthUm, lengthUm);
export const shortestSideUm = (widthUm: number, lengthUm: number): number => Math.min(widthUm, lengthUm);
