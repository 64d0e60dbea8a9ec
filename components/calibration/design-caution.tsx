/** Shown wherever fitted values could feed a structural decision. */
export function DesignCaution() {
  return (
    <p className="rounded border border-glaze-line bg-glaze-deep/40 px-3 py-2 text-xs text-ink-soft">
      Fitted parameters describe a phenomenological model fitted to these coupons; they are no
      design allowable. Structural decisions rest with qualified engineers under the applicable
      codes, standards and qualification procedures.
    </p>
  );
}
