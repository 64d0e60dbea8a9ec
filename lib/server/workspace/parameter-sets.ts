import type { Db } from "@/db/client";
import {
  bumpParameterSetVersion,
  deleteParameterSetRow,
  findParameterSetView,
  insertParameterSet,
  insertParameterSetVersion,
  listParameterSetsForTeam,
  updateParameterSetRow,
  type ParameterSetView,
} from "@/db/queries/parameter-sets";
import type { Actor } from "@/lib/server/accounts/actor";
import { isUniqueViolation } from "@/lib/server/accounts/pg-errors";
import { recordAudit } from "@/lib/server/access/audit";
import { AppError } from "@/lib/shared/errors";
import { changedParameters, sameJson } from "@/lib/shared/parameter-set-changes";
import { authorizeTeam } from "@/lib/server/access/team-access";
import {
  createParameterSetSchema,
  updateParameterSetSchema,
} from "@/lib/shared/validations/parameter-sets";

import { notFound, requireUuid } from "./errors";
import { parseWithPath } from "./parse";
import { listVersions, type ParameterSetVersionSummary } from "./parameter-set-versions";

export type ParameterSetListResponse = { items: ParameterSetView[] };
export type ParameterSetResponse = ParameterSetView & { versions: ParameterSetVersionSummary[] };

const DUPLICATE = "This team has a parameter set with that name already.";

async function findOrThrow(db: Db, teamId: string, id: unknown) {
  const view = await findParameterSetView(db, teamId, requireUuid(id, "parameter-set"));
  if (!view) throw notFound("parameter-set");
  return view;
}

/** Unique names are enforced by the index; a clash becomes a 409 beside the name field. */
async function uniqueName<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (isUniqueViolation(error)) throw new AppError("conflict:name", DUPLICATE, "name");
    throw error;
  }
}

export async function listParameterSets(db: Db, actor: Actor, teamSlug: string) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  return { items: await listParameterSetsForTeam(db, ctx.team.id) };
}

/** The set with its history: each version's number, author, date and what it changed. */
async function withVersions(db: Db, teamId: string, id: unknown): Promise<ParameterSetResponse> {
  const view = await findOrThrow(db, teamId, id);
  return { ...view, versions: await listVersions(db, teamId, view.id) };
}

export async function getParameterSet(db: Db, actor: Actor, teamSlug: string, id: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  return withVersions(db, ctx.team.id, id);
}

export async function createParameterSet(db: Db, actor: Actor, teamSlug: string, input: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "parameter-set:edit");
  const data = parseWithPath(createParameterSetSchema, input);
  const id = await uniqueName(() =>
    db.transaction(async (tx) => {
      const row = await insertParameterSet(tx, {
        teamId: ctx.team.id,
        ...data,
        createdBy: ctx.actor.id,
        updatedBy: ctx.actor.id,
      });
      await recordAudit(tx, {
        actorId: ctx.actor.id,
        teamId: ctx.team.id,
        action: "parameter-set.create",
        target: row.id,
        detail: { name: data.name },
      });
      return row.id;
    }),
  );
  return withVersions(db, ctx.team.id, id);
}

/** True when the edit changes the numbers or where they came from: that is a new version. */
function isNewVersion(before: ParameterSetView, data: { values?: object; provenance?: object }) {
  const values = data.values !== undefined && changedParameters(before.values, data.values).length;
  const provenance = data.provenance !== undefined && !sameJson(data.provenance, before.provenance);
  return Boolean(values) || provenance;
}

export async function updateParameterSet(
  db: Db,
  actor: Actor,
  teamSlug: string,
  id: unknown,
  input: unknown,
) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "parameter-set:edit");
  const before = await findOrThrow(db, ctx.team.id, id);
  const data = parseWithPath(updateParameterSetSchema, input);
  const newVersion = isNewVersion(before, data);
  await uniqueName(() =>
    db.transaction(async (tx) => {
      await updateParameterSetRow(tx, ctx.team.id, before.id, {
        ...data,
        updatedBy: ctx.actor.id,
        updatedAt: new Date(),
      });
      // A rename keeps the version; new numbers (or a new origin) become version n+1, and the
      // previous version stays for the revisions that were made with it.
      const version = newVersion
        ? await bumpParameterSetVersion(tx, ctx.team.id, before.id)
        : undefined;
      if (version !== undefined) {
        await insertParameterSetVersion(tx, {
          setId: before.id,
          version,
          values: data.values ?? before.values,
          provenance: data.provenance ?? before.provenance,
          createdBy: ctx.actor.id,
        });
      }
      await recordAudit(tx, {
        actorId: ctx.actor.id,
        teamId: ctx.team.id,
        action: "parameter-set.update",
        target: before.id,
        // The previous values go into the trail: an edit never loses what was there.
        detail: {
          before: {
            name: before.name,
            values: before.values,
            provenance: before.provenance,
            version: before.version,
          },
          ...(version !== undefined ? { version } : {}),
        },
      });
    }),
  );
  return withVersions(db, ctx.team.id, before.id);
}

export async function deleteParameterSet(db: Db, actor: Actor, teamSlug: string, id: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "parameter-set:edit");
  const before = await findOrThrow(db, ctx.team.id, id);
  await db.transaction(async (tx) => {
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "parameter-set.delete",
      target: before.id,
      detail: { name: before.name, values: before.values, provenance: before.provenance },
    });
    await deleteParameterSetRow(tx, before.id);
  });
  return { deleted: before.id };
}
