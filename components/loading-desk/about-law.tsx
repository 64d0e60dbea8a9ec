/** What the law does and does not represent (spec B.9), in plain words. */
export function AboutLaw() {
  return (
    <details
      className="rounded-md border border-glaze-line bg-white/70 px-3 py-2 text-sm"
      data-testid="about-law"
    >
      <summary className="cursor-pointer font-medium">About this law and its limits</summary>
      <div className="mt-2 space-y-2 text-ink-soft">
        <p>
          Plane stress, small strain, one material point. Two damage variables d1, d2 (crack
          families normal to the damage axes) grow linearly with √Ȳ above a threshold; cracks close
          under compression and the stiffness along that axis comes back fully; a permanent strain
          grows with the damage accumulated while the cracks are open.
        </p>
        <ul className="list-disc space-y-0.5 pl-5">
          <li>
            No strain-rate or temperature effect (strain rate is known to shift the SMC threshold).
          </li>
          <li>
            No compressive damage or crushing; the compressive strength Xc only raises a warning.
          </li>
          <li>Damage axes do not rotate after damage onset.</li>
          <li>No permanent shear strain in the fixed damage frame.</li>
          <li>No fatigue.</li>
          <li>
            Softening is local: meaningful at one point, mesh-dependent in a finite-element model.
          </li>
          <li>Full stiffness recovery when cracks close.</li>
        </ul>
      </div>
    </details>
  );
}
