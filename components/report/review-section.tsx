import { importedPersonText, importedVerdictText } from "@/lib/shared/imported-names";
import type { CalibrationReport } from "@/lib/server/handoff/report/load-report";

import { verdictWords } from "./verdict-words";

type Comment = CalibrationReport["comments"][number];

function Thread({ c }: { c: Comment }) {
  return (
    <li className="break-inside-avoid">
      <p className="text-xs text-ink-faint">
        {c.importedAuthor != null
          ? importedPersonText(c.importedAuthor)
          : (c.author?.name ?? "former member")}
        , {c.createdAt.slice(0, 16).replace("T", " ")}
        {c.increment !== null ? ` · increment ${c.increment}` : ""}
      </p>
      <p className="whitespace-pre-wrap">{c.body}</p>
      {c.replies.length > 0 ? (
        <ul className="ml-4 mt-1 space-y-1 border-l border-glaze-line pl-3">
          {c.replies.map((r) => (
            <Thread key={r.id} c={r} />
          ))}
        </ul>
      ) : null}
    </li>
  );
}

/** The verdict with who gave it, the review history and the comment threads. */
export function ReviewSection({ report }: { report: CalibrationReport }) {
  const { review } = report.revision;
  return (
    <div className="space-y-3 text-sm">
      <p data-testid="report-verdict" className="text-base">
        Verdict: <strong>{verdictWords(review.state)}</strong>
        {review.importedBy != null
          ? ` (${importedVerdictText(review.state, review.importedBy)})`
          : review.by
            ? ` by ${review.by.name}`
            : ""}
        {review.at ? ` on ${review.at.slice(0, 10)}` : ""}
      </p>
      {report.reviews.length > 0 ? (
        <ol className="list-decimal pl-5 text-xs">
          {report.reviews.map((e) => (
            <li key={e.id}>
              {e.at.slice(0, 16).replace("T", " ")}: {e.from.replace("_", " ")} →{" "}
              {e.to.replace("_", " ")} by{" "}
              {e.importedActor != null
                ? importedPersonText(e.importedActor)
                : (e.actor?.name ?? "former member")}
              {e.note ? ` (${e.note})` : ""}
            </li>
          ))}
        </ol>
      ) : null}
      {report.comments.length > 0 ? (
        <ul className="space-y-2">
          {report.comments.map((c) => (
            <Thread key={c.id} c={c} />
          ))}
        </ul>
      ) : (
        <p className="text-ink-faint">No comments on this revision.</p>
      )}
    </div>
  );
}
