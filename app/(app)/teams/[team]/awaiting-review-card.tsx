import Link from "next/link";

import { Card } from "@/components/ui/card";
import type { AwaitingReview } from "@/db/queries/awaiting-review";
import { formatWhen, personName } from "@/lib/client/data/format";
import { importedPersonText } from "@/lib/shared/imported-names";

/** Revisions waiting for the signed-in reviewer's verdict, newest request first. */
export function AwaitingReviewCard({ slug, items }: { slug: string; items: AwaitingReview[] }) {
  return (
    <Card title="Awaiting my review" id="awaiting-review">
      {items.length === 0 ? (
        <p className="text-sm text-ink-soft">Nothing waits for your verdict in this team.</p>
      ) : (
        <ul className="space-y-2 text-sm" data-testid="awaiting-review">
          {items.map((r) => (
            <li key={`${r.scenarioId}-${r.number}`}>
              <Link
                href={`/teams/${slug}/scenarios/${r.scenarioId}?rev=${r.number}`}
                className="font-medium text-verdigris-dark hover:underline"
              >
                {r.scenarioName}, revision {r.number}
              </Link>
              <p className="text-xs text-ink-soft">
                asked by{" "}
                {r.importedRequester != null
                  ? importedPersonText(r.importedRequester)
                  : personName(r.requestedBy)}
                {r.requestedAt ? `, ${formatWhen(r.requestedAt)}` : ""}
              </p>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
