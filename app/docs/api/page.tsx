import type { Metadata } from "next";

import { OperationList } from "./operation-list";
import { SiteHeader } from "@/app/_parts/site-header";
import { API_CAUTION } from "@/lib/server/handoff/openapi/document";

export const metadata: Metadata = { title: "API", description: "Craquelure's public API" };

const EXAMPLE = `curl -sS -X POST "$CRAQUELURE/api/v1/runs" \\
  -H "Authorization: Bearer $CRAQUELURE_TOKEN" \\
  -H "Content-Type: application/json" \\
  --data @scenario.json > results.csv`;

export default function ApiDocsPage() {
  return (
    <>
      <SiteHeader />
      <main id="main" className="mx-auto max-w-4xl space-y-6 px-4 py-8">
        <h1 className="font-display text-3xl font-semibold">API</h1>
        <p className="text-sm text-ink-soft">
          Scripts and pipelines reach Craquelure over JSON. Create a personal token on your{" "}
          <a className="text-verdigris-dark hover:underline" href="/account#api-tokens">
            account page
          </a>
          ; it works in one team with a role no higher than yours, and stops working when revoked.
          The machine-readable description is at{" "}
          <a className="font-mono text-verdigris-dark hover:underline" href="/api/v1/openapi.json">
            /api/v1/openapi.json
          </a>{" "}
          (OpenAPI 3.1).
        </p>
        <pre className="overflow-x-auto rounded-md bg-ink p-4 text-xs text-white">{EXAMPLE}</pre>
        <p className="text-sm text-ink-soft">
          Errors always read <code>{`{ "error": { "code", "message", "path"? } }`}</code>. Another
          team&apos;s ids answer 404; each token may send 120 requests a minute.
        </p>
        <OperationList />
        <p className="border-t border-glaze-line pt-4 text-xs text-ink-faint">{API_CAUTION}</p>
      </main>
    </>
  );
}
