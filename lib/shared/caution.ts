/** The caution every export, bundle and report carries (product.md, "Cautions"). */
export const CAUTION_LINES = [
  "Results come from a phenomenological model fitted to coupon tests; they are no design allowable.",
  "Structural decisions rest with qualified engineers under the applicable codes, standards and the customer's qualification procedures.",
] as const;

export const CAUTION_TEXT = CAUTION_LINES.join(" ");
