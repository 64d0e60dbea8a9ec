import { randomBytes } from "node:crypto";

import { asc, eq } from "drizzle-orm";
import { afterAll } from "vitest";

import { createDb, requireDatabaseUrl, type Db } from "@/db/client";
import { mailOutbox } from "@/db/schema/mail-outbox";
import { users } from "@/db/schema/users";
import type { SignedInActor } from "@/lib/server/accounts/actor";
import { hashPassword } from "@/lib/server/accounts/auth/password";
import type { MailDeps, MailMessage } from "@/lib/shared/mail-types";

// Each test file opens its own small pool on the already-migrated database and closes it after.
export function openTestDb(): Db {
  const handle = createDb(requireDatabaseUrl(), { max: 3 });
  afterAll(() => handle.close());
  return handle.db;
}

/** Unique per call, so tests never collide with each other or with seeded rows. */
export function unique(prefix: string): string {
  return `${prefix}-${randomBytes(5).toString("hex")}`;
}

export const TEST_PASSWORD = "correct horse battery";

let cachedHash: Promise<{ hash: string; salt: string }> | undefined;

export async function makeUser(
  db: Db,
  opts: { verified?: boolean; name?: string } = {},
): Promise<SignedInActor> {
  cachedHash ??= hashPassword(TEST_PASSWORD);
  const { hash, salt } = await cachedHash;
  const email = `${unique("user")}@test.craquelure.local`;
  const name = opts.name ?? "Test user";
  const verifiedAt = opts.verified === false ? null : new Date();
  const [row] = await db
    .insert(users)
    .values({ email, name, passwordHash: hash, passwordSalt: salt, verifiedAt })
    .returning();
  return { id: row.id, email: row.email, name: row.name, verified: verifiedAt !== null };
}

/** A mailer that keeps messages in memory; `linkIn` pulls the first link of a path out of one. */
export function recordingMailer(): MailDeps & { sent: MailMessage[] } {
  const sent: MailMessage[] = [];
  return {
    sent,
    appUrl: "http://app.test",
    mailer: {
      async send(message) {
        sent.push(message);
      },
    },
  };
}

/** Mail the services queued for one address (account mail goes through the outbox), oldest first. */
export async function queuedMailTo(db: Db, to: string): Promise<MailMessage[]> {
  const rows = await db
    .select()
    .from(mailOutbox)
    .where(eq(mailOutbox.to, to.toLowerCase()))
    .orderBy(asc(mailOutbox.createdAt));
  return rows.map((r) => ({ to: r.to, subject: r.subject, text: r.text, html: r.html }));
}

export function tokenFromLink(message: MailMessage | undefined, path: string): string {
  const match = message?.text.match(new RegExp(`${path}/([A-Za-z0-9_-]+)`));
  if (!match) throw new Error(`no ${path} link in message`);
  return match[1];
}
