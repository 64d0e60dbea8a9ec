/**
 * How a parameter's value is shown to a person (desk fields, read-only desk, printed report):
 * SHOWN_DIGITS significant digits, then the shortest form, so a fitted 10994.028523930534 reads
 * 10994.0 → "10994" and float noise is gone. Six digits are well past what coupon tests resolve
 * (a modulus to 1 part in 10⁶), and moduli keep their plain form (no exponent below 10²¹).
 * Only the text is rounded: the stored value stays exact until someone edits it.
 */
export const SHOWN_DIGITS = 6;

export function shownNumber(value: number, digits: number = SHOWN_DIGITS): string {
  if (!Number.isFinite(value)) return String(value);
  // Number() drops trailing zeros and "e+" forms toPrecision writes for large whole values.
  const rounded = Number(value.toPrecision(digits));
  return String(rounded === 0 ? 0 : rounded);
}
