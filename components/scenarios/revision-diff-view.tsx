import { formatValue } from "@/lib/client/data/format";
import type { FieldChange, RevisionDiff } from "@/lib/client/data/types";

export interface RevisionDiffViewProps {
  diff: RevisionDiff;
  fromLabel: string;
  toLabel: string;
}

function ChangeRows({ fields }: { fields: FieldChange[] }) {
  return (
    <>
      {fields.map((f) => (
        <tr key={f.field} className="border-t border-glaze-line/60">
          <td className="py-1 pr-3 font-mono text-xs">{f.field}</td>
          <td className="py-1 pr-3 text-kiln-dark">{formatValue(f.from)}</td>
          <td className="py-1 text-verdigris-dark">{formatValue(f.to)}</td>
        </tr>
      ))}
    </>
  );
}

function Head({ fromLabel, toLabel }: { fromLabel: string; toLabel: string }) {
  return (
    <thead className="text-xs text-ink-faint">
      <tr>
        <th className="pr-3 text-left font-medium">field</th>
        <th className="pr-3 text-left font-medium">{fromLabel}</th>
        <th className="text-left font-medium">{toLabel}</th>
      </tr>
    </thead>
  );
}

/** Parameters and path of two revisions side by side: only what differs. */
export function RevisionDiffView({ diff, fromLabel, toLabel }: RevisionDiffViewProps) {
  if (diff.identical)
    return (
      <p className="text-sm text-ink-soft">
        {fromLabel} and {toLabel} carry the same parameters and path.
      </p>
    );
  const { path } = diff;
  return (
    <div className="space-y-4 text-sm" data-testid="revision-diff">
      {diff.name ? (
        <p>
          Name: <span className="text-kiln-dark">{diff.name.from}</span> →{" "}
          <span className="text-verdigris-dark">{diff.name.to}</span>
        </p>
      ) : null}
      <div>
        <h4 className="font-semibold">Parameter sets</h4>
        {diff.parameterSets.length === 0 ? <p className="text-ink-soft">No change.</p> : null}
        {diff.parameterSets.map((s) => (
          <div key={`${s.kind}-${s.id}`} className="mt-2">
            <p>
              Set {s.id} “{s.label}”{" "}
              {s.kind === "added"
                ? `only in ${toLabel}`
                : s.kind === "removed"
                  ? `only in ${fromLabel}`
                  : "changed:"}
            </p>
            {s.kind === "changed" ? (
              <table className="mt-1 w-full">
                <Head fromLabel={fromLabel} toLabel={toLabel} />
                <tbody>
                  <ChangeRows fields={s.fields} />
                </tbody>
              </table>
            ) : null}
          </div>
        ))}
      </div>
      <div>
        <h4 className="font-semibold">Path</h4>
        <p className="text-ink-soft">
          Legs {path.legCount.from} → {path.legCount.to}; increments {path.totalIncrements.from} →{" "}
          {path.totalIncrements.to}
          {path.generatorsChanged ? "; the cycle generators differ" : ""}.
        </p>
        {path.legs.map((leg) => (
          <div key={`${leg.kind}-${leg.index}`} className="mt-2">
            <p>
              Leg {leg.index + 1}{" "}
              {leg.kind === "added"
                ? `only in ${toLabel}`
                : leg.kind === "removed"
                  ? `only in ${fromLabel}`
                  : "changed:"}
            </p>
            {leg.kind === "changed" ? (
              <table className="mt-1 w-full">
                <Head fromLabel={fromLabel} toLabel={toLabel} />
                <tbody>
                  <ChangeRows fields={leg.fields} />
                </tbody>
              </table>
            ) : null}
          </div>
        ))}
      </div>
    </div>
  );
}
