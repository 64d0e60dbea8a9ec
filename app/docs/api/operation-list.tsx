import { OPERATIONS } from "@/lib/server/handoff/openapi/operations";

type Op = {
  summary?: string;
  description?: string;
  responses?: Record<string, { description: string }>;
};

/** One entry per method and path of the OpenAPI document, with its answers. */
export function OperationList() {
  const entries = Object.entries(OPERATIONS).flatMap(([path, methods]) =>
    Object.entries(methods).map(([method, op]) => ({ path, method, op: op as Op })),
  );
  return (
    <ul className="space-y-4">
      {entries.map(({ path, method, op }) => (
        <li
          key={`${method} ${path}`}
          className="rounded-lg border border-glaze-line bg-white/70 p-4"
        >
          <p className="font-mono text-sm">
            <span className="mr-2 rounded bg-glaze-deep px-2 py-0.5 font-semibold uppercase">
              {method}
            </span>
            /api/v1{path}
          </p>
          <p className="mt-2 text-sm">{op.summary}</p>
          {op.description ? <p className="mt-1 text-sm text-ink-soft">{op.description}</p> : null}
          <dl className="mt-2 grid grid-cols-[4rem_1fr] gap-x-2 text-xs text-ink-soft">
            {Object.entries(op.responses ?? {}).map(([status, r]) => (
              <div key={status} className="contents">
                <dt className="font-mono">{status}</dt>
                <dd>{r.description}</dd>
              </div>
            ))}
          </dl>
        </li>
      ))}
    </ul>
  );
}
