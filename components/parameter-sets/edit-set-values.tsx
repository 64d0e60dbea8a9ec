"use client";

import { useState } from "react";

import { messageOf } from "@/lib/client/data/api-fetch";
import type { ParameterSetView } from "@/lib/client/data/types";
import { useEditParameterSetValues } from "@/lib/client/data/use-parameter-sets";
import { checkDraft, draftOf, EDITABLE_FIELDS } from "@/lib/client/sets/edit-values";
import { labelOf, unitOf } from "@/lib/scenario/parameter-fields";

/**
 * Edits a library set's numbers. Saving makes the next version; revisions made with the
 * current one keep theirs, and the draft stays on screen when the server refuses it.
 */
export function EditSetValues({ slug, set }: { slug: string; set: ParameterSetView }) {
  const edit = useEditParameterSetValues(slug);
  const [open, setOpen] = useState(false);
  const [draft, setDraft] = useState(() => draftOf(set.values));
  const [errors, setErrors] = useState<Record<string, string>>({});

  if (!open) {
    return (
      <button
        type="button"
        onClick={() => {
          setDraft(draftOf(set.values));
          setErrors({});
          setOpen(true);
        }}
        className="mt-2 text-sm text-verdigris-dark hover:underline"
      >
        Edit values
      </button>
    );
  }
  return (
    <form
      className="mt-2 space-y-2"
      aria-label={`Values of ${set.name}`}
      onSubmit={(e) => {
        e.preventDefault();
        const checked = checkDraft(set.values, draft);
        if (!checked.ok) return setErrors(checked.errors);
        setErrors({});
        edit.mutate({ id: set.id, values: checked.values }, { onSuccess: () => setOpen(false) });
      }}
    >
      <div className="grid grid-cols-1 gap-2 sm:grid-cols-2 lg:grid-cols-3">
        {EDITABLE_FIELDS.map((f) => {
          const id = `value-${set.id}-${f.symbol}`;
          const unit = unitOf(f, set.values.law);
          return (
            <div key={f.symbol} className="text-xs">
              <label htmlFor={id} className="block text-ink-soft">
                {labelOf(f.symbol)}
                {unit && unit !== "–" ? ` [${unit}]` : ""}
              </label>
              <input
                id={id}
                inputMode="decimal"
                value={draft[f.symbol] ?? ""}
                onChange={(e) => setDraft({ ...draft, [f.symbol]: e.target.value })}
                aria-invalid={errors[f.symbol] ? true : undefined}
                className="w-full rounded-md border border-glaze-line bg-white px-2 py-1 font-mono"
              />
              {errors[f.symbol] ? (
                <span role="alert" className="block text-kiln-dark">
                  {errors[f.symbol]}
                </span>
              ) : null}
            </div>
          );
        })}
      </div>
      <p className="text-xs text-ink-soft">
        Saving makes version {set.version + 1}; version {set.version} stays for the revisions that
        use it.
      </p>
      <div className="flex gap-3 text-sm">
        <button
          type="submit"
          disabled={edit.isPending}
          className="rounded-md bg-verdigris px-3 py-1 text-white hover:bg-verdigris-dark disabled:opacity-50"
        >
          Save as version {set.version + 1}
        </button>
        <button type="button" onClick={() => setOpen(false)} className="text-ink-soft">
          Cancel
        </button>
      </div>
      {edit.isError ? (
        <p role="alert" className="text-sm text-kiln-dark">
          {messageOf(edit.error)}
        </p>
      ) : null}
    </form>
  );
}
