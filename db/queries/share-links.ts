import { and, desc, eq, sql } from "drizzle-orm";

import type { Executor } from "@/db/client";
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
