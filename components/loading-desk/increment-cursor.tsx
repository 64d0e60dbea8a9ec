"use client";

export interface IncrementCursorProps {
  value: number | null;
  max: number;
  onChange: (increment: number | null) => void;
}

/** The increment shown on every chart and highlighted in the table; arrow keys move it. */
export function IncrementCursor({ value, max, onChange }: IncrementCursorProps) {
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-md border border-glaze-line bg-white px-3 py-1.5 text-sm">
      <label htmlFor="increment-cursor" className="text-ink-soft">
        Increment cursor
      </label>
      <input
        id="increment-cursor"
        type="range"
        min={0}
        max={Math.max(0, max)}
        value={value ?? 0}
        onChange={(e) => onChange(Number(e.target.value))}
        className="min-w-40 flex-1 accent-[#2f7a74]"
      />
      <output htmlFor="increment-cursor" className="w-28 font-mono text-xs">
        {value === null ? "off" : `increment ${value} / ${max}`}
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
