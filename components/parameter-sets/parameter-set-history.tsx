import { formatWhen, personName } from "@/lib/client/data/format";
import type { ParameterSetVersionSummary } from "@/lib/client/data/types";

/** What a version changed, in words: the parameters, the origin, or (version 1) the start. */
function changeText(v: ParameterSetVersionSummary): string {
  if (v.version === 1) return "first version";
  const parts: string[] = [];
  if (v.changed.length) parts.push(`changed ${v.changed.join(", ")}`);
  if (v.provenanceChanged) parts.push("new provenance");
  return parts.length ? parts.join("; ") : "no parameter changed";
}

/**
 * A library set's versions, newest first: number, date, author and what changed. Older
 * versions stay because revisions made with them still hold their numbers.
 */
export function ParameterSetHistory({ versions }: { versions: ParameterSetVersionSummary[] }) {
  const newestFirst = [...versions].sort((a, b) => b.version - a.version);
  return (
    <section aria-label="Version history" className="mt-3 text-sm">
      <h3 className="text-xs font-medium text-ink-soft">History</h3>
      <ol className="mt-1 space-y-0.5" data-testid="set-history">
        {newestFirst.map((v, i) => (
          <li key={v.version} className="flex flex-wrap gap-x-3">
            <span className="font-medium">
              Version {v.version}
              {i === 0 ? " (current)" : ""}
            </span>
            <span className="text-ink-soft">{formatWhen(v.createdAt)}</span>
            <span className="text-ink-soft">{personName(v.createdBy)}</span>
            <span>{changeText(v)}</span>
          </li>
        ))}
      </ol>
    </section>
  );
}
