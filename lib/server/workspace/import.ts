import "server-only";

import { randomUUID } from "node:crypto";

import type { Db, Executor } from "@/db/client";
import type { NewComment } from "@/db/queries/comments";
import type { NewRevision } from "@/db/queries/revisions";
import type { NewReviewEvent } from "@/db/queries/reviews";
import type { NewScenario } from "@/db/queries/scenarios";
import { findTeamMembersByEmail } from "@/db/queries/team-export";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { AppError } from "@/lib/shared/errors";
import {
  countTeamContent,
  findParameterSetIdsByName,
  insertImportedRecordsAndFits,
  insertImportedRows,
} from "@/db/queries/workspace-import";
import { teamImportNotes } from "@/lib/shared/team-import-notes";
import { remapDeskOverlays } from "@/lib/scenario/desk-overlay-remap";
import { authorizeTeam } from "@/lib/server/access/team-access";

import { type ExportPerson, type TeamExport, teamExportSchema } from "./export-schema";
import { checkTeamExport } from "./import-check";
import { importedSetRows } from "./import-sets";
import { checkRecordsAndFits, planRecordsAndFits } from "./import-records";
import { parseWithPath } from "./parse";

export interface TeamImportResponse {
  scenarios: number;
  revisions: number;
  comments: number;
  parameterSets: number;
  testRecords: number;
  fits: number;
  /** What the import left out, in words (overlays and fit links to records not in the file). */
  notes: string[];
}

/**
 * Authors of content (sets, scenarios, revisions) that may become users: matched only to
 * current members of the target team. Review history and comments never do (see below).
 */
function authorsIn(doc: TeamExport): string[] {
  const all: ExportPerson[] = [];
  for (const s of doc.parameterSets) {
    all.push(s.createdBy, s.updatedBy, ...(s.versions ?? []).map((v) => v.createdBy));
  }
  for (const s of doc.scenarios) {
    all.push(s.createdBy, ...s.revisions.map((r) => r.author));
  }
  for (const r of doc.testRecords) all.push(r.createdBy);
  for (const f of doc.fits) all.push(f.createdBy);
  return all.filter((p): p is NonNullable<ExportPerson> => p !== null).map((p) => p.email);
}

/** Name as text for imported review history and comments; "" when the file named nobody. */
function nameOf(p: ExportPerson): string {
  return p?.name.trim() || p?.email || "";
}

async function assertEmpty(db: Executor, teamId: string) {
  const held = await countTeamContent(db, teamId);
  if (held.scenarios > 0 || held.parameterSets > 0 || held.testRecords > 0) {
    throw new AppError(
      "conflict:not-empty",
      "Import into a new, empty team: this one has scenarios, parameter sets or test records already.",
    );
  }
}

/** Loads a team export into an empty team the actor owns; all of it or nothing. */
export async function importTeam(
  db: Db,
  actor: Actor,
  teamSlug: string,
  input: unknown,
): Promise<TeamImportResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:import");
  const doc = parseWithPath(teamExportSchema, input);
  checkTeamExport(doc);
  checkRecordsAndFits(doc);
  const known = await findTeamMembersByEmail(db, ctx.team.id, authorsIn(doc));
  const idOf = (p: ExportPerson) => (p ? (known.get(p.email.toLowerCase()) ?? null) : null);
  const at = (iso: string) => new Date(iso);
  const at0 = (iso: string | null) => (iso ? new Date(iso) : null);

  const { sets, versions } = importedSetRows(doc, ctx.team.id, idOf);
  const planned = planRecordsAndFits(doc, ctx.team.id, idOf);
  const notes = teamImportNotes(doc);
  const scenarioRows: NewScenario[] = [];
  const revisionRows: NewRevision[] = [];
  const eventRows: NewReviewEvent[] = [];
  const commentRows: NewComment[] = [];
  for (const s of doc.scenarios) {
    const scenarioId = randomUUID();
    const latest = Math.max(...s.revisions.map((r) => r.number));
    const newest = s.revisions.find((r) => r.number === latest)!;
    scenarioRows.push({
      id: scenarioId,
      teamId: ctx.team.id,
      name: s.name,
      materialLabel: s.materialLabel,
      tags: s.tags,
      createdBy: idOf(s.createdBy),
      latestRevision: latest,
      latestReviewState: newest.review.state,
      createdAt: at(s.createdAt),
      updatedAt: at(s.updatedAt),
    });
    for (const r of s.revisions) {
      const revisionId = randomUUID();
      // The overlays name records by their old ids: rewritten to the new ones, or left out.
      const desk = remapDeskOverlays(r.file, planned.newIdOf);
      revisionRows.push({
        id: revisionId,
        scenarioId,
        number: r.number,
        authorId: idOf(r.author),
        message: r.message,
        file: desk.file,
        createdAt: at(r.createdAt),
        reviewState: r.review.state,
        // A sign-off in a file proves nothing here: kept as the file's text, never as a user.
        reviewBy: null,
        importedReviewBy: r.review.state === "draft" ? null : nameOf(r.review.by),
        reviewAt: at0(r.review.at),
      });
      for (const e of r.reviewEvents) {
        eventRows.push({
          revisionId,
          fromState: e.from,
          toState: e.to,
          actorId: null,
          importedActor: nameOf(e.actor),
          note: e.note,
          at: at(e.at),
        });
      }
      // New ids for comments, keeping each reply tied to its (renamed) parent.
      const newId = new Map(r.comments.map((c) => [c.key, randomUUID()]));
      for (const c of r.comments) {
        commentRows.push({
          id: newId.get(c.key)!,
          revisionId,
          parentId: c.parentKey ? newId.get(c.parentKey)! : null,
          authorId: null,
          importedAuthor: nameOf(c.author),
          body: c.body,
          increment: c.increment,
          createdAt: at(c.createdAt),
          editedAt: at0(c.editedAt),
        });
      }
    }
  }

  await db.transaction(async (tx) => {
    await assertEmpty(tx, ctx.team.id);
    // Parents before replies: comment rows are in creation order, and a reply is never older.
    await insertImportedRows(tx, {
      parameterSets: sets,
      parameterSetVersions: versions,
      scenarios: scenarioRows,
      revisions: revisionRows,
      reviewEvents: eventRows,
      comments: commentRows,
    });
    const setIds = await findParameterSetIdsByName(
      tx,
      ctx.team.id,
      planned.fits.flatMap((f) => f.parameterSetName ?? []),
    );
    await insertImportedRecordsAndFits(
      tx,
      planned.records,
      planned.fits.map(({ parameterSetName, ...fit }) => ({
        ...fit,
        parameterSetId: parameterSetName === null ? null : (setIds.get(parameterSetName) ?? null),
      })),
    );
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "team.import",
      detail: {
        from: doc.team.slug,
        scenarios: scenarioRows.length,
        revisions: revisionRows.length,
        testRecords: planned.records.length,
        fits: planned.fits.length,
      },
    });
  });
  return {
    scenarios: scenarioRows.length,
    revisions: revisionRows.length,
    comments: commentRows.length,
    parameterSets: sets.length,
    testRecords: planned.records.length,
    fits: planned.fits.length,
    notes,
  };
}
