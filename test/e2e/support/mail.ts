/** Reads the messages the fake SMTP server (scripts/fake-smtp.ts) keeps in MAIL_OUTBOX_DIR. */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

export interface OutboxMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

function outboxDir(): string {
  const dir = process.env.MAIL_OUTBOX_DIR;
  if (!dir)
    throw new Error("MAIL_OUTBOX_DIR is not set: run browser tests through scripts/test.sh");
  return dir;
}

export function listMail(): OutboxMessage[] {
  return readdirSync(outboxDir())
    .filter((name) => name.endsWith(".json"))
    .sort()
    .map((name) => JSON.parse(readFileSync(path.join(outboxDir(), name), "utf8")) as OutboxMessage);
}

/** Waits for the newest message to `to` (and whose subject contains `subject`, if given). */
export async function readMail(
  query: { to: string; subject?: string },
  timeoutMs = 15_000,
): Promise<OutboxMessage> {
  const to = query.to.toLowerCase();
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const match = listMail()
      .filter((m) => m.to.includes(to) && (!query.subject || m.subject.includes(query.subject)))
      .at(-1);
    if (match) return match;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`no e-mail to ${query.to}${query.subject ? ` about "${query.subject}"` : ""}`);
}

/** The first link in a message's text that starts with the app's base URL. */
export function firstLink(message: OutboxMessage, base: string): string {
  const found = message.text.match(/https?:\/\/\S+/g)?.find((url) => url.startsWith(base));
  if (!found) throw new Error(`no link to ${base} in e-mail "${message.subject}"`);
  return found;
}
