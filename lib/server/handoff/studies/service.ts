import "server-only";

/** Parameter studies of a team: submit (fit:run), progress (team:read), results (export). */
import JSZip from "jszip";
import type PgBoss from "pg-boss";

import type { Executor } from "@/db/client";
import {
  findStudyInTeam,
  insertStudy,
  listStudyItems,
  listStudyResults,
} from "@/db/queries/studies";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { CAUTION_LINES } from "@/lib/shared/caution";
import { runStatusOnRead } from "@/lib/scenario/version1-names";
import { safeName } from "@/lib/server/handoff/bundle/build";
import { studySummaryCsv } from "@/lib/shared/study-summary-csv";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { notFound, requireUuid } from "@/lib/server/workspace/errors";
import { parseWithPath } from "@/lib/server/workspace/parse";

import { designStudy } from "./design";
import { enqueueStudyItems } from "./queue";
import { studyRequestSchema } from "./schema";

export async function submitStudy(
  db: Executor,
  boss: () => Promise<PgBoss>,
  actor: Actor,
  teamSlug: string,
  input: unknown,
) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "fit:run");
  const request = parseWithPath(studyRequestSchema, input);
  const { legs, sets, design } = designStudy(request);
  const queue = await boss();
  // The study, its items and their jobs commit together: no study without jobs, no job
  // pointing at a study that was rolled back.
  const { study } = await db.transaction(async (tx) => {
    const inserted = await insertStudy(
      tx,
      {
        teamId: ctx.team.id,
        name: request.name || "Parameter study",
        legs,
        design,
        total: sets.length,
        createdBy: ctx.actor.id,
      },
      sets.map((set, position) => ({ position, set })),
    );
    await enqueueStudyItems(queue, inserted.itemIds, tx);
    return inserted;
  });
  await recordAudit(db, {
    actorId: ctx.actor.id,
    teamId: ctx.team.id,
    action: "study.submit",
    target: study.id,
    detail: { sets: sets.length },
  });
  return { id: study.id, total: sets.length };
}

async function studyOf(db: Executor, teamId: string, studyId: unknown) {
  const study = await findStudyInTeam(db, teamId, requireUuid(studyId, "study"));
  if (!study) throw notFound("study");
  return study;
}

export async function getStudy(db: Executor, actor: Actor, teamSlug: string, studyId: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const study = await studyOf(db, ctx.team.id, studyId);
  const items = (await listStudyItems(db, study.id)).map((i) => ({
    ...i,
    status: runStatusOnRead(i.status),
  }));
  const done = items.filter((i) => i.state === "done").length;
  const failed = items.filter((i) => i.state === "failed").length;
  const state =
    done + failed < study.total
      ? done + failed > 0
        ? "running"
        : "queued"
      : failed > 0
        ? "finished with failures"
        : "done";
  return {
    id: study.id,
    name: study.name,
    createdAt: study.createdAt,
    design: study.design,
    total: study.total,
    done,
    failed,
    state,
    items,
  };
}

/** A zip: one contract CSV per finished set, summary.csv with every set's state, README.txt. */
export async function studyResultsZip(
  db: Executor,
  actor: Actor,
  teamSlug: string,
  studyId: unknown,
) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "export");
  const study = await studyOf(db, ctx.team.id, studyId);
  const rows = await listStudyResults(db, study.id);
  const zip = new JSZip();
  for (const row of rows) {
    const name = `${String(row.position + 1).padStart(4, "0")}-${safeName(row.set.id)}.csv`;
    if (row.csv !== null) zip.file(`sets/${name}`, row.csv);
  }
  zip.file(
    "summary.csv",
    studySummaryCsv(rows.map((row) => ({ ...row, status: runStatusOnRead(row.status) }))),
  );
  zip.file(
    "README.txt",
    [
      `Parameter study: ${study.name}`,
      `Sets: ${study.total}`,
      "Each sets/*.csv has the command-line driver's columns (see the API page).",
      "",
      ...CAUTION_LINES,
      "",
    ].join("\n"),
  );
  const bytes = await zip.generateAsync({ type: "uint8array", compression: "DEFLATE" });
  return { bytes, fileName: `${safeName(study.name)}-results.zip` };
}
