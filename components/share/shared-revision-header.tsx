import { ReviewBadge } from "@/components/scenarios/review-badge";
import { formatWhen } from "@/lib/client/data/format";
import type { SharedRevisionResponse } from "@/lib/client/data/types";

export interface SharedRevisionHeaderProps {
  shared: SharedRevisionResponse;
}

/** Whose work this is and which revision, as the sender's team saved it. */
export function SharedRevisionHeader({ shared }: SharedRevisionHeaderProps) {
  const { scenario, revision } = shared;
  return (
    <header className="space-y-1">
      <p className="text-sm text-ink-faint">Shared read-only by {shared.teamName}</p>
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="font-display text-2xl font-semibold" data-testid="shared-title">
          {scenario.name}
        </h1>
        {scenario.materialLabel ? (
          <span className="text-sm text-ink-soft">{scenario.materialLabel}</span>
        ) : null}
      </div>
      <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
        <span className="font-medium text-ink">Revision {revision.number}</span>
        <ReviewBadge state={revision.reviewState} />
        <span>
          saved by {revision.authorName ?? "a former member"} on {formatWhen(revision.savedAt)}
        </span>
        {revision.message ? <span className="italic">“{revision.message}”</span> : null}
        <span className="text-ink-faint">· link valid until {formatWhen(shared.expiresAt)}</span>
      </p>
    </header>
  );
}
