// Ages are rounded to 12 significant digits to remove binary noise (3 × 0.1 = 0.30000000000000004),
// so a computed boundary is the decimal the user means.
const SIGNIFICANT_DIGITS = 12;

/** `ageMa` rounded to the decimal it stands for (12 significant digits). */
export function decimalMa(ageMa: number): number {
  return Number(ageMa.toPrecision(SIGNIFICANT_DIGITS));
}

/** An age in Ma as written in bin names and messages: shortest decimal form, `0.3`, `120`. */
export function formatMa(ageMa: number): string {
  return String(decimalMa(ageMa));
}
