import type { Metadata } from "next";
import { headers } from "next/headers";
import { notFound } from "next/navigation";

import { readOutbox } from "@/lib/server/email/outbox";
import { getEnv } from "@/lib/server/access/env";
import { demoMailStatus } from "@/lib/server/demo-mail-gate";

export const metadata: Metadata = { title: "Outbox (local)", robots: { index: false } };
export const dynamic = "force-dynamic";

// Local demos only: 404 unless the operator asked for it (CRAQUELURE_DEMO_MAIL=1, set by
// `scripts/start.sh --demo-mail`), the request is addressed to loopback (see demo-mail-gate for
// what that does and does not guarantee) and MAIL_OUTBOX_DIR is set. Bodies are text, never HTML.
export default async function OutboxPage() {
  const h = await headers();
  const gate = demoMailStatus(process.env, {
    host: h.get("host"),
    forwardedHost: h.get("x-forwarded-host"),
  });
  if (gate !== 200) notFound();
  const dir = getEnv().MAIL_OUTBOX_DIR;
  if (!dir) notFound();
  const messages = await readOutbox(dir);
  return (
    <main id="main" className="mx-auto max-w-4xl px-6 py-10">
      <p
        role="note"
        className="mb-6 rounded-lg border border-amber-300 bg-amber-50 p-3 text-sm text-amber-900"
      >
        Local demo mailbox: every e-mail this instance sent, including password-reset and invitation
        links, readable by anyone who opens this page. It is on because the server was started with
        --demo-mail (CRAQUELURE_DEMO_MAIL=1). Never enable it on a shared server.
      </p>
      <h1 className="font-display text-3xl font-semibold">Outbox</h1>
      <p className="mt-2 text-sm text-ink-soft">
        Messages caught by the local mail server. Nothing here leaves this machine.
      </p>
      {messages.length === 0 ? <p className="mt-6 text-sm">No messages yet.</p> : null}
      <ol className="mt-6 space-y-4">
        {messages.map((m) => (
          <li key={m.id} className="rounded-lg border border-glaze-line bg-white/70 p-4">
            <p className="text-xs text-ink-faint">
              {m.receivedAt} · to {m.to.join(", ")} · from {m.from}
            </p>
            <h2 className="mt-1 font-medium">{m.subject}</h2>
            <pre className="mt-2 whitespace-pre-wrap break-words text-sm">{m.text}</pre>
          </li>
        ))}
      </ol>
    </main>
  );
}
