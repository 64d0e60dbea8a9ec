/**
 * Local stand-in for a mail relay: accepts every message on loopback and keeps it as JSON in
 * MAIL_OUTBOX_DIR (one `<id>.json` per message) so the outbox page and the tests can read it.
 * Started by scripts/start.sh and scripts/test.sh; never used in a real deployment.
 */
import { randomUUID } from "node:crypto";
import { mkdirSync, renameSync, writeFileSync } from "node:fs";
import path from "node:path";

import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

const port = Number(process.env.SMTP_PORT ?? 2525);
const dir = path.resolve(process.env.MAIL_OUTBOX_DIR ?? ".data/outbox");
mkdirSync(dir, { recursive: true });

function addresses(value: unknown): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list.flatMap((entry: { value?: { address?: string }[] }) =>
    (entry.value ?? []).map((a) => (a.address ?? "").toLowerCase()).filter(Boolean),
  );
}

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  logger: false,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const id = `${Date.now()}-${randomUUID().slice(0, 8)}`;
        const envelopeTo = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
        const message = {
          id,
          from: mail.from?.text ?? "",
          to: envelopeTo.length > 0 ? envelopeTo : addresses(mail.to),
          subject: mail.subject ?? "",
          text: mail.text ?? "",
          html: typeof mail.html === "string" ? mail.html : "",
          receivedAt: new Date().toISOString(),
        };
        // Write then rename, so a reader never sees half a file.
        const tmp = path.join(dir, `.${id}.tmp`);
        writeFileSync(tmp, JSON.stringify(message, null, 2));
        renameSync(tmp, path.join(dir, `${id}.json`));
        callback();
      })
      .catch((error: Error) => callback(error));
  },
});

server.on("error", (error) => console.error(`[fake-smtp] ${error.message}`));
server.listen(port, "127.0.0.1", () => {
  console.log(`[fake-smtp] listening on 127.0.0.1:${port}, keeping messages in ${dir}`);
});

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => server.close(() => process.exit(0)));
}
