import { reviewStateLabel } from "@/lib/client/data/review-words";

export interface ReviewBadgeProps {
  state: string;
}

const TONES: Record<string, string> = {
  draft: "bg-glaze-deep text-ink-soft",
  in_review: "bg-amber-100 text-amber-900",
  approved: "bg-verdigris-light text-verdigris-dark",
  changes_requested: "bg-kiln-light text-kiln-dark",
};

/** The review state of a revision as a small coloured word (the word carries the meaning). */
export function ReviewBadge({ state }: ReviewBadgeProps) {
  return (
    <span
      className={`inline-block whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-medium ${TONES[state] ?? TONES.draft}`}
      data-testid="review-state"
    >
      {reviewStateLabel(state)}
    </span>
  );
}
