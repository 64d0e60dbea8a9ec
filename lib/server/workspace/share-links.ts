import "server-only";

import { createHash, randomBytes } from "node:crypto";

import type { Db } from "@/db/client";
import {
  findShareLinkId,
  insertShareLink,
  listShareLinksForTeam,
  revokeLiveShareLink,
  type ShareLinkView,
} from "@/db/queries/share-links";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { createShareLinkSchema } from "@/lib/shared/validations/workspace";

import { notFound, requireUuid } from "./errors";
import { parseWithPath } from "./parse";
import { revisionInTeam, scenarioInTeam } from "../access/scope";

export type ShareLinkListResponse = { items: ShareLinkView[] };
export interface CreateShareLinkResponse {
  link: ShareLinkView;
  /** Shown once: only its hash is stored. */
  token: string;
  path: string;
}

const DAY_MS = 24 * 60 * 60 * 1000;

/** 128 random bits, URL-safe (22 characters). */
function newShareToken(): string {
  return randomBytes(16).toString("base64url");
}

export function looksLikeShareToken(value: unknown): value is string {
  return typeof value === "string" && /^[A-Za-z0-9_-]{22}$/.test(value);
}

export function hashShareToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export async function createShareLink(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  number: unknown,
  input: unknown,
  now: Date = new Date(),
): Promise<CreateShareLinkResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "share:create");
  const { scenario, revision } = await revisionInTeam(db, ctx.team.id, scenarioId, number);
  const data = parseWithPath(createShareLinkSchema, input ?? {});
  const token = newShareToken();
  const id = await db.transaction(async (tx) => {
    const row = await insertShareLink(tx, {
      teamId: ctx.team.id,
      revisionId: revision.id,
      tokenHash: hashShareToken(token),
      createdBy: ctx.actor.id,
      createdAt: now,
      expiresAt: new Date(now.getTime() + data.expiresInDays * DAY_MS),
    });
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "share-link.create",
      target: row.id,
      detail: { scenarioId: scenario.id, revision: revision.number, days: data.expiresInDays },
    });
    return row.id;
  });
  const links = await listShareLinksForTeam(db, ctx.team.id, now, scenario.id);
  return { link: links.find((l) => l.id === id)!, token, path: `/share/${token}` };
}

export async function listShareLinks(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId?: unknown,
  now: Date = new Date(),
): Promise<ShareLinkListResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const scenario =
    scenarioId === undefined || scenarioId === null
      ? undefined
      : (await scenarioInTeam(db, ctx.team.id, scenarioId)).id;
  return { items: await listShareLinksForTeam(db, ctx.team.id, now, scenario) };
}

/** Revoking twice is harmless; the first revocation's time and author stay. */
export async function revokeShareLink(
  db: Db,
  actor: Actor,
  teamSlug: string,
  linkId: unknown,
  now: Date = new Date(),
): Promise<{ revoked: string }> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "share:create");
  const id = requireUuid(linkId, "share-link");
  const link = await findShareLinkId(db, ctx.team.id, id);
  if (!link) throw notFound("share-link");
  await db.transaction(async (tx) => {
    const changed = await revokeLiveShareLink(tx, id, ctx.actor.id, now);
    if (changed.length) {
      await recordAudit(tx, {
        actorId: ctx.actor.id,
        teamId: ctx.team.id,
        action: "share-link.revoke",
        target: id,
      });
    }
  });
  return { revoked: id };
}
