"use client";

import type { PersonRef } from "@/lib/client/data/types";

export interface ReviewerChoiceProps {
  /** The team's reviewers and owners, the requester left out. */
  choices: PersonRef[];
  chosen: string[];
  onChange: (chosen: string[]) => void;
  error?: string | null;
  disabled?: boolean;
}

/** Whom a review request is asked of: one checkbox per reviewer or owner, the error beside it. */
export function ReviewerChoice({
  choices,
  chosen,
  onChange,
  error,
  disabled,
}: ReviewerChoiceProps) {
  const toggle = (id: string, on: boolean) =>
    onChange(on ? [...chosen, id] : chosen.filter((c) => c !== id));
  return (
    <fieldset
      className="space-y-1"
      aria-describedby={error ? "review-reviewers-error" : undefined}
      aria-invalid={error ? true : undefined}
    >
      <legend className="font-medium">Ask for a review from</legend>
      {choices.length === 0 ? (
        <p className="text-ink-soft">
          This team has no reviewer or owner besides you. An owner can invite one on the team page.
        </p>
      ) : (
        <ul className="flex flex-wrap gap-x-4 gap-y-1">
          {choices.map((person) => (
            <li key={person.id}>
              <label className="inline-flex items-center gap-1.5">
                <input
                  type="checkbox"
                  name="reviewers"
                  value={person.id}
                  checked={chosen.includes(person.id)}
                  disabled={disabled}
                  onChange={(e) => toggle(person.id, e.target.checked)}
                />
                {person.name}
              </label>
            </li>
          ))}
        </ul>
      )}
      {error ? (
        <p id="review-reviewers-error" role="alert" className="text-kiln-dark">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
