"use client";

import { formatWhen, personName } from "@/lib/client/data/format";
import { reviewStateLabel } from "@/lib/client/data/review-words";
import type { ReviewHistoryResponse } from "@/lib/client/data/types";
import { importedPersonText } from "@/lib/shared/imported-names";

/** The trail of a revision's review, oldest first; a request says whom it was asked of. */
export function ReviewHistoryList({ history }: { history: ReviewHistoryResponse["history"] }) {
  if (!history.length) return null;
  return (
    <ol className="space-y-1 border-l-2 border-glaze-line pl-3" aria-label="Review history">
      {history.map((h) => (
        <li key={h.id}>
          <span className="font-medium">
            {h.importedActor != null ? importedPersonText(h.importedActor) : personName(h.actor)}
          </span>{" "}
          {reviewStateLabel(h.from)} → {reviewStateLabel(h.to)}
          <span className="text-ink-faint">, {formatWhen(h.at)}</span>
          {h.askedOf.length ? (
            <p className="text-ink-soft">Asked of {h.askedOf.map((p) => p.name).join(", ")}</p>
          ) : null}
          {h.note ? <p className="whitespace-pre-wrap text-ink-soft">{h.note}</p> : null}
        </li>
      ))}
    </ol>
  );
}
