// Lengths in integer micrometres and their display in inches and centimetres.
// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959; NIST SP 811 App. B),
// so 1 in = 25,400 µm and every inch fraction down to 1/16 in (1,587.5 µm → see note) and
// every length typed in mm or cm to 0.001 mm is an exact integer here.
// Note: 1/16 in is 1,587.5 µm; sixteenths are rounded to the nearest micrometre (0.5 µm),
// far below any measuring tape. Halves, quarters and eighths are exact.

export const UM_PER_INCH = 25_400;
export const UM_PER_CM = 10_000;

export const inchesToUm = (inches: number): number => Math.round(inches * UM_PER_INCH);
export const cmToUm = (cm: number): number => Math.round(cm * UM_PER_CM);
export const umToInches = (um: number): number => um / UM_PER_INCH;
export const umToCm = (um: number): number => um / UM_PER_CM;

const FRACTIONS: Record<number, string> = { 1: "⅛", 2: "¼", 3: "⅜", 4: "½", 5: "⅝", 6: "¾", 7: "⅞" };

/** e.g. 1,536,700 µm → "60½ in"; values between eighths are shown to two decimals. */
export function formatInches(um: number, unit = true): string {
  const eighths = (um * 8) / UM_PER_INCH;
  const suffix = unit ? " in" : "";
  if (Number.isInteger(eighths)) {
    const whole = Math.floor(eighths / 8);
    const rest = eighths % 8;
    const frac = rest ? FRACTIONS[rest] : "";
    return `${whole === 0 && frac ? "" : whole}${frac}${suffix}`;
  }
  return `${(um / UM_PER_INCH).toFixed(2)}${suffix}`;
}

/** e.g. 1,536,700 µm → "153.7 cm" (one decimal, the usual precision of a tape). */
export function formatCm(um: number): string {
  return `${(um / UM_PER_CM).toFixed(1)} cm`;
}

/** Width × length, as entry forms write them: "60½ × 72 in (153.7 × 182.9 cm)". */
export function formatSize(widthUm: number, lengthUm: number): string {
  return `${formatInches(widthUm, false)} × ${formatInches(lengthUm)} (${(widthUm / UM_PER_CM).toFixed(1)} × ${formatCm(lengthUm)})`;
}
