"use client";

import { useState } from "react";

import type { NewComment } from "@/lib/client/data/optimistic-comments";

export interface CommentFormProps {
  idPrefix: string;
  label: string;
  submitLabel: string;
  maxIncrement: number;
  parentId?: string;
  onSubmit: (input: NewComment) => void;
  onCancel?: () => void;
}

/** A comment's words and, optionally, the increment of the path it is about. */
export function CommentForm(props: CommentFormProps) {
  const { idPrefix, maxIncrement } = props;
  const [body, setBody] = useState("");
  const [increment, setIncrement] = useState("");
  const inc = increment.trim() === "" ? undefined : Number(increment);
  const incBad = inc !== undefined && (!Number.isInteger(inc) || inc < 0 || inc > maxIncrement);
  return (
    <form
      className="space-y-2"
      onSubmit={(e) => {
        e.preventDefault();
        if (!body.trim() || incBad) return;
        props.onSubmit({ body: body.trim(), parentId: props.parentId, increment: inc });
        setBody("");
        setIncrement("");
      }}
    >
      <label htmlFor={`${idPrefix}-body`} className="block font-medium">
        {props.label}
      </label>
      <textarea
        id={`${idPrefix}-body`}
        value={body}
        maxLength={5000}
        rows={2}
        onChange={(e) => setBody(e.target.value)}
        className="block w-full rounded-md border border-glaze-line bg-white px-3 py-2"
      />
      <div className="flex flex-wrap items-end gap-3">
        <label htmlFor={`${idPrefix}-increment`} className="text-xs text-ink-soft">
          Pin to increment (0–{maxIncrement}, optional)
          <input
            id={`${idPrefix}-increment`}
            inputMode="numeric"
            value={increment}
            onChange={(e) => setIncrement(e.target.value)}
            aria-invalid={incBad || undefined}
            className="mt-1 block w-28 rounded-md border border-glaze-line bg-white px-2 py-1 text-sm aria-[invalid]:border-kiln"
          />
        </label>
        <button
          type="submit"
          disabled={!body.trim() || incBad}
          className="rounded-md bg-verdigris px-3 py-1.5 text-sm text-white hover:bg-verdigris-dark disabled:opacity-50"
        >
          {props.submitLabel}
        </button>
        {props.onCancel ? (
          <button
            type="button"
            onClick={props.onCancel}
            className="text-sm text-ink-soft hover:underline"
          >
            Cancel
          </button>
        ) : null}
      </div>
      {incBad ? (
        <p className="text-xs text-kiln-dark">The path has increments 0 to {maxIncrement}.</p>
      ) : null}
    </form>
  );
}
