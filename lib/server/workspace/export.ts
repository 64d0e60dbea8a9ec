import "server-only";

import type { Db } from "@/db/client";
import { listTeamSetVersionRows } from "@/db/queries/parameter-sets";
import { loadPeople, loadTeamContent, loadTeamRecordsAndFits } from "@/db/queries/team-export";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { exportTooLargeMessage } from "@/lib/server/http/body-limits";
import { AppError } from "@/lib/shared/errors";

import { exportRecordsAndFits } from "./export-records";
import { TEAM_EXPORT_FORMAT, type ExportPerson, type TeamExport } from "./export-schema";

export type TeamExportResponse = TeamExport;

function groupBy<T, K>(rows: T[], key: (row: T) => K): Map<K, T[]> {
  const map = new Map<K, T[]>();
  for (const row of rows) {
    const list = map.get(key(row));
    if (list) list.push(row);
    else map.set(key(row), [row]);
  }
  return map;
}

const iso = (d: Date) => d.toISOString();
const isoOrNull = (d: Date | null) => (d ? d.toISOString() : null);

/**
 * An export is only worth handing out if an import can take it back: past the import route's
 * body limit (the original files of the test records weigh most) the person is told so here.
 */
function assertImportable(doc: TeamExport): void {
  const tooLarge = exportTooLargeMessage(Buffer.byteLength(JSON.stringify(doc), "utf8"));
  if (tooLarge) throw new AppError("invalid:too-large", tooLarge);
}

/** One JSON document with everything the team made (share links and the audit trail stay). */
export async function exportTeam(
  db: Db,
  actor: Actor,
  teamSlug: string,
  now: Date = new Date(),
): Promise<TeamExportResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "export");
  const c = await loadTeamContent(db, ctx.team.id);
  const setVersions = await listTeamSetVersionRows(db, ctx.team.id);
  const recordsAndFits = await loadTeamRecordsAndFits(db, ctx.team.id);
  const people = await loadPeople(
    db,
    [
      ...c.scenarioRows.map((r) => r.createdBy),
      ...c.revisionRows.flatMap((r) => [r.authorId, r.reviewBy]),
      ...c.eventRows.map((r) => r.actorId),
      ...c.commentRows.map((r) => r.authorId),
      ...c.setRows.flatMap((r) => [r.createdBy, r.updatedBy]),
      ...setVersions.map((v) => v.createdBy),
      ...recordsAndFits.recordRows.map((r) => r.createdBy),
      ...recordsAndFits.fitRows.map((r) => r.fit.createdBy),
    ].filter((id): id is string => id !== null),
  );
  const who = (id: string | null): ExportPerson => (id ? (people.get(id) ?? null) : null);
  // Imported history stays text on the way out too: a name, no address to match on.
  const whoOrText = (id: string | null, text: string | null): ExportPerson =>
    text !== null ? { email: "", name: text } : who(id);
  const revisionsOf = groupBy(c.revisionRows, (r) => r.scenarioId);
  const eventsOf = groupBy(c.eventRows, (r) => r.revisionId);
  const commentsOf = groupBy(c.commentRows, (r) => r.revisionId);
  const versionsOf = groupBy(setVersions, (v) => v.setId);

  const doc: TeamExport = {
    format: TEAM_EXPORT_FORMAT,
    exportedAt: iso(now),
    team: { name: ctx.team.name, slug: ctx.team.slug },
    parameterSets: c.setRows.map((s) => ({
      name: s.name,
      values: s.values as Record<string, unknown>,
      provenance: s.provenance,
      createdBy: who(s.createdBy),
      updatedBy: who(s.updatedBy),
      createdAt: iso(s.createdAt),
      updatedAt: iso(s.updatedAt),
      versions: (versionsOf.get(s.id) ?? []).map((v) => ({
        version: v.version,
        values: v.values as Record<string, unknown>,
        provenance: v.provenance,
        createdBy: who(v.createdBy),
        createdAt: iso(v.createdAt),
      })),
    })),
    scenarios: c.scenarioRows.map((s) => ({
      name: s.name,
      materialLabel: s.materialLabel,
      tags: s.tags,
      createdBy: who(s.createdBy),
      createdAt: iso(s.createdAt),
      updatedAt: iso(s.updatedAt),
      revisions: (revisionsOf.get(s.id) ?? []).map((r) => ({
        number: r.number,
        author: who(r.authorId),
        message: r.message,
        file: r.file,
        createdAt: iso(r.createdAt),
        review: {
          state: r.reviewState,
          by: whoOrText(r.reviewBy, r.importedReviewBy),
          at: isoOrNull(r.reviewAt),
        },
        reviewEvents: (eventsOf.get(r.id) ?? []).map((e) => ({
          from: e.fromState,
          to: e.toState,
          actor: whoOrText(e.actorId, e.importedActor),
          note: e.note,
          at: iso(e.at),
        })),
        comments: (commentsOf.get(r.id) ?? []).map((m) => ({
          key: m.id,
          parentKey: m.parentId,
          author: whoOrText(m.authorId, m.importedAuthor),
          body: m.body,
          increment: m.increment,
          createdAt: iso(m.createdAt),
          editedAt: isoOrNull(m.editedAt),
        })),
      })),
    })),
    ...exportRecordsAndFits(recordsAndFits, who),
  };
  assertImportable(doc);
  await recordAudit(db, {
    actorId: ctx.actor.id,
    teamId: ctx.team.id,
    action: "team.export",
    detail: {
      scenarios: doc.scenarios.length,
      parameterSets: doc.parameterSets.length,
      testRecords: doc.testRecords.length,
      fits: doc.fits.length,
    },
  });
  return doc;
}
