/** The product's cautions, worded once, shown beside export and in the footer. */
export const CAUTION_TEXT =
  "Results come from a phenomenological model fitted to coupon tests; they are no design allowable. " +
  "Structural decisions rest with qualified engineers under the applicable codes, standards and the " +
  "customer's qualification procedures.";

export interface CautionsProps {
  compact?: boolean;
}

export function Cautions({ compact }: CautionsProps) {
  return (
    <p role="note" className={`text-ink-soft ${compact ? "text-xs" : "text-sm"}`}>
      <span className="font-semibold text-kiln-dark">Caution. </span>
      {CAUTION_TEXT}
    </p>
  );
}
