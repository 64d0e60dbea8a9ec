import { and, desc, eq, isNull, sql } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { rateLimitBuckets } from "@/db/schema/rate-limits";
import { scenarioRevisions, scenarios } from "@/db/schema/scenarios";
import { shareLinks } from "@/db/schema/share-links";
import { teams } from "@/db/schema/teams";
import { users } from "@/db/schema/users";

import { personRef } from "./users-view";

export async function listShareLinksForTeam(
  db: Executor,
  teamId: string,
  now: Date,
  scenarioId?: string,
) {
  const rows = await db
    .select({
      id: shareLinks.id,
      scenarioId: scenarios.id,
      scenarioName: scenarios.name,
      revision: scenarioRevisions.number,
      createdBy: personRef(users.id, users.name),
      createdAt: shareLinks.createdAt,
      expiresAt: shareLinks.expiresAt,
      revokedAt: shareLinks.revokedAt,
      viewCount: shareLinks.viewCount,
      lastViewedAt: shareLinks.lastViewedAt,
    })
    .from(shareLinks)
    .innerJoin(scenarioRevisions, eq(scenarioRevisions.id, shareLinks.revisionId))
    .innerJoin(scenarios, eq(scenarios.id, scenarioRevisions.scenarioId))
    .leftJoin(users, eq(users.id, shareLinks.createdBy))
    .where(
      and(eq(shareLinks.teamId, teamId), scenarioId ? eq(scenarios.id, scenarioId) : undefined),
    )
    .orderBy(desc(shareLinks.createdAt));
  return rows.map((r) => ({
    ...r,
    state: r.revokedAt ? "revoked" : r.expiresAt <= now ? "expired" : "active",
    createdAt: r.createdAt.toISOString(),
    expiresAt: r.expiresAt.toISOString(),
    revokedAt: r.revokedAt?.toISOString() ?? null,
    lastViewedAt: r.lastViewedAt?.toISOString() ?? null,
  }));
}
export type ShareLinkView = Awaited<ReturnType<typeof listShareLinksForTeam>>[number];

/**
 * Counts one view of a live link and returns what the read-only page shows. Expired, revoked
 * and unknown hashes all return null: the caller answers the same for each.
 */
export async function viewLiveShareLink(db: Executor, tokenHash: string, now: Date) {
  return db.transaction(async (tx) => {
    const [link] = await tx
      .update(shareLinks)
      .set({ viewCount: sql`${shareLinks.viewCount} + 1`, lastViewedAt: now })
      .where(
        and(
          eq(shareLinks.tokenHash, tokenHash),
          sql`${shareLinks.revokedAt} is null`,
          sql`${shareLinks.expiresAt} > ${now.toISOString()}`,
        ),
      )
      .returning({ revisionId: shareLinks.revisionId, expiresAt: shareLinks.expiresAt });
    if (!link) return null;
    const [row] = await tx
      .select({
        teamName: teams.name,
        scenarioName: scenarios.name,
        materialLabel: scenarios.materialLabel,
        number: scenarioRevisions.number,
        message: scenarioRevisions.message,
        savedAt: scenarioRevisions.createdAt,
        authorName: users.name,
        reviewState: scenarioRevisions.reviewState,
        file: scenarioRevisions.file,
      })
      .from(scenarioRevisions)
      .innerJoin(scenarios, eq(scenarios.id, scenarioRevisions.scenarioId))
      .innerJoin(teams, eq(teams.id, scenarios.teamId))
      .leftJoin(users, eq(users.id, scenarioRevisions.authorId))
      .where(eq(scenarioRevisions.id, link.revisionId));
    return row ? { ...row, expiresAt: link.expiresAt } : null;
  });
}

export type NewShareLink = typeof shareLinks.$inferInsert;

export async function insertShareLink(db: Executor, values: NewShareLink) {
  const [row] = await db.insert(shareLinks).values(values).returning({ id: shareLinks.id });
  return row;
}

/** The link's id when it belongs to the team; undefined otherwise. */
export async function findShareLinkId(db: Executor, teamId: string, linkId: string) {
  const [link] = await db
    .select({ id: shareLinks.id })
    .from(shareLinks)
    .where(and(eq(shareLinks.teamId, teamId), eq(shareLinks.id, linkId)));
  return link;
}

/** Revokes a link not yet revoked; the rows it changed (none when it was revoked already). */
export async function revokeLiveShareLink(
  db: Executor,
  linkId: string,
  revokedBy: string,
  now: Date,
) {
  return db
    .update(shareLinks)
    .set({ revokedAt: now, revokedBy })
    .where(and(eq(shareLinks.id, linkId), isNull(shareLinks.revokedAt)))
    .returning({ id: shareLinks.id });
}

/** Misses counted so far in one rate-limit window (the bucket the miss rule writes); 0 if none. */
export async function countShareMisses(db: Executor, key: string, windowStart: Date) {
  const [row] = await db
    .select({ count: rateLimitBuckets.count })
    .from(rateLimitBuckets)
    .where(and(eq(rateLimitBuckets.key, key), eq(rateLimitBuckets.windowStart, windowStart)));
  return row?.count ?? 0;
}
