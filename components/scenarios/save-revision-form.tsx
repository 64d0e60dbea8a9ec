"use client";

import { useState } from "react";

export interface SaveRevisionFormProps {
  /** What the save does, e.g. "Saves revision 4 on top of revision 3". */
  summary: string;
  submitLabel: string;
  pending: boolean;
  error: string | null;
  initialMessage?: string;
  onSubmit: (message: string) => void;
  onCancel: () => void;
}

/** The message of a new revision, and the one button that saves it. */
export function SaveRevisionForm({
  summary,
  submitLabel,
  pending,
  error,
  initialMessage = "",
  onSubmit,
  onCancel,
}: SaveRevisionFormProps) {
  const [message, setMessage] = useState(initialMessage);
  return (
    <form
      aria-label="Save revision"
      className="space-y-2 rounded-lg border border-verdigris/40 bg-verdigris-light/40 p-3"
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit(message.trim());
      }}
    >
      <p className="text-sm text-ink-soft">{summary}</p>
      <label htmlFor="revision-message" className="block text-sm font-medium">
        What changed (revision message)
      </label>
      <textarea
        id="revision-message"
        value={message}
        maxLength={2000}
        rows={2}
        onChange={(e) => setMessage(e.target.value)}
        className="block w-full rounded-md border border-glaze-line bg-white px-3 py-2 text-sm"
        placeholder="e.g. raised Y0_2 after the 45° cyclic test"
      />
      {error ? (
        <p role="alert" className="text-sm text-kiln-dark">
          {error}
        </p>
      ) : null}
      <div className="flex gap-2">
        <button
          type="submit"
          disabled={pending}
          className="rounded-md bg-kiln px-3 py-1.5 text-sm text-white hover:bg-kiln-dark disabled:opacity-60"
        >
          {pending ? "Saving…" : submitLabel}
        </button>
        <button
          type="button"
          onClick={onCancel}
          className="rounded-md border border-glaze-line bg-white px-3 py-1.5 text-sm"
        >
          Keep editing
        </button>
      </div>
    </form>
  );
}
