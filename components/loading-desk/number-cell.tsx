"use client";

import { useState } from "react";

export interface NumberCellProps {
  value: number;
  label: string;
  integer?: boolean;
  min?: number;
  disabled?: boolean;
  onCommit: (v: number) => void;
}

/** A number input that keeps what is typed and commits a valid value on blur or Enter. */
export function NumberCell({ value, label, integer, min, disabled, onCommit }: NumberCellProps) {
  const [text, setText] = useState(String(value));
  const [seen, setSeen] = useState(value);
  if (seen !== value) {
    setSeen(value);
    setText(String(value));
  }
  const n = Number(text.trim());
  const valid =
    text.trim() !== "" &&
    Number.isFinite(n) &&
    (!integer || Number.isInteger(n)) &&
    (min === undefined || n >= min);
  const commit = () => {
    if (valid && n !== value) onCommit(n);
  };
  // Read-only: the value as text, readable and copyable, with the same accessible name.
  if (disabled)
    return (
      <span aria-label={label} className="font-mono text-xs">
        {value}
      </span>
    );
  return (
    <input
      value={text}
      inputMode="decimal"
      aria-label={label}
      aria-invalid={!valid || undefined}
      title={
        valid
          ? undefined
          : integer
            ? `a whole number${min !== undefined ? ` ≥ ${min}` : ""}`
            : "a finite number"
      }
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => e.key === "Enter" && commit()}
      className="w-full min-w-[4.5rem] rounded border border-glaze-line bg-white px-1.5 py-0.5 font-mono text-xs aria-[invalid]:border-kiln aria-[invalid]:bg-kiln-light/40"
    />
  );
}
