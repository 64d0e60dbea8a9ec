import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { readOutbox } from "@/lib/email/outbox";
import { getEnv } from "@/lib/env";

export const metadata: Metadata = { title: "Outbox (local)", robots: { index: false } };
export const dynamic = "force-dynamic";

// Local runs only: the page exists when MAIL_OUTBOX_DIR is set (start and test scripts) and
// answers 404 anywhere else. Mail bodies are shown as text, never as live HTML.
export default async function OutboxPage() {
  const dir = getEnv().MAIL_OUTBOX_DIR;
  if (!dir) notFound();
  const messages = await readOutbox(dir);
  return (
    <main id="main" className="mx-auto max-w-4xl px-6 py-10">
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
