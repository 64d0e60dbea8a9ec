import "server-only";

import { readdir, readFile } from "node:fs/promises";
import path from "node:path";

// Reads what the local fake SMTP server wrote: one <id>.json per message.
export interface OutboxMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

export async function readOutbox(dir: string, limit = 100): Promise<OutboxMessage[]> {
  const names = (await readdir(dir).catch(() => [] as string[])).filter((n) => n.endsWith(".json"));
  const messages = await Promise.all(
    names.map(async (name) => {
      try {
        return JSON.parse(await readFile(path.join(dir, name), "utf8")) as OutboxMessage;
      } catch {
        return null; // a file still being written, or not ours
      }
    }),
  );
  return messages
    .filter((m): m is OutboxMessage => m !== null)
    .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt))
    .slice(0, limit);
}
