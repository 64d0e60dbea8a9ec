"use client";

export interface StepCursorProps {
  value: number | null;
  max: number;
  onChange: (step: number | null) => void;
}

/** The step shown on every chart and highlighted in the table; arrow keys move it. */
export function StepCursor({ value, max, onChange }: StepCursorProps) {
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-md border border-glaze-line bg-white px-3 py-1.5 text-sm">
      <label htmlFor="step-cursor" className="text-ink-soft">
        Step cursor
      </label>
      <input
        id="step-cursor"
        type="range"
        min={0}
        max={Math.max(0, max)}
        value={value ?? 0}
        onChange={(e) => onChange(Number(e.target.value))}
        className="min-w-40 flex-1 accent-[#2f7a74]"
      />
      <output htmlFor="step-cursor" className="w-28 font-mono text-xs">
        {value === null ? "off" : `step ${value} / ${max}`}
      </output>
      <button
        type="button"
        onClick={() => onChange(null)}
        disabled={value === null}
        className="rounded border border-glaze-line px-2 py-0.5 text-xs disabled:opacity-40"
      >
        Hide
      </button>
    </div>
  );
}
