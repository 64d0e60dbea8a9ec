/**
 * A hand-drawn-looking stress–strain sketch for the home page: monotonic envelope, an unloading
 * line towards the permanent strain, and the stiff closed branch in compression. Decorative only.
 */
export function LoopSketch() {
  return (
    <svg
      viewBox="0 0 320 220"
      role="img"
      aria-labelledby="loop-sketch-title"
      className="h-auto w-full"
    >
      <title id="loop-sketch-title">
        Sketch of a stress–strain response: damage softens the tensile branch, unloading points to
        the permanent strain, compression recovers the undamaged stiffness.
      </title>
      <line x1="20" y1="150" x2="310" y2="150" stroke="#6b7a82" strokeWidth="1" />
      <line x1="90" y1="10" x2="90" y2="210" stroke="#6b7a82" strokeWidth="1" />
      <text x="300" y="166" fontSize="11" fill="#3b4a52">
        ε
      </text>
      <text x="96" y="20" fontSize="11" fill="#3b4a52">
        σ
      </text>
      <path
        d="M90 150 L130 90 Q170 45 230 38 Q260 36 285 40"
        fill="none"
        stroke="#2f7a74"
        strokeWidth="3"
      />
      <path
        d="M230 38 L132 150"
        fill="none"
        stroke="#b4532a"
        strokeWidth="2.5"
        strokeDasharray="6 4"
      />
      <path d="M132 150 L105 205" fill="none" stroke="#b4532a" strokeWidth="2.5" />
      <circle cx="132" cy="150" r="4" fill="#1f2a30" />
      <text x="138" y="168" fontSize="10" fill="#1f2a30">
        permanent strain
      </text>
      <text x="190" y="110" fontSize="10" fill="#b4532a">
        unloading E(1−d)
      </text>
      <text x="20" y="200" fontSize="10" fill="#b4532a">
        closed: E
      </text>
    </svg>
  );
}
