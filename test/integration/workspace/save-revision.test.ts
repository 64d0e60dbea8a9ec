import { describe, expect, it } from "vitest";

import { listAuditLog } from "@/lib/server/workspace/audit-log";
import { getRevision, listRevisions, saveRevision } from "@/lib/server/workspace/revisions";
import { getScenario } from "@/lib/server/workspace/scenarios";
import { isAppError } from "@/lib/shared/errors";

import { openTestDb } from "../support/db";
import { makeTeamWithAllRoles } from "../support/team";
import { demoFileWith, makeWorld } from "../support/workspace";

const db = openTestDb();

// The save is one statement that builds its answer from what it wrote (no read-back): these
// check that the answer, the stored revision, the scenario row and the audit trail agree.
describe("saving a revision", () => {
  it("answers with the meta the revision list then shows, and moves the scenario on", async () => {
    const w = await makeWorld(db);
    const file = demoFileWith(13000, { note: "kept as sent" });
    const saved = await saveRevision(db, w.members.editor, w.slug, w.scenarioId, {
      baseRevision: 1,
      message: "stiffer",
      file,
    });
    const list = await listRevisions(db, w.members.viewer, w.slug, w.scenarioId);
    expect(list.items[0]).toEqual(saved);
    expect(saved).toMatchObject({
      number: 2,
      message: "stiffer",
      author: { id: w.members.editor.id, name: w.members.editor.name },
      review: { state: "draft", by: null, at: null, importedBy: null },
    });
    expect((await getRevision(db, w.members.viewer, w.slug, w.scenarioId, 2)).file).toEqual(file);
    const scenario = await getScenario(db, w.members.viewer, w.slug, w.scenarioId);
    expect(scenario.latestRevision).toMatchObject({ number: 2, reviewState: "draft" });
    expect(scenario.updatedAt).toBe(saved.createdAt);

    const log = await listAuditLog(db, w.members.viewer, w.slug, { pageSize: "50" });
    const event = log.items.find((e) => e.action === "revision.save");
    expect(event).toMatchObject({
      target: w.scenarioId,
      detail: { number: 2, base: 1 },
      actor: { id: w.members.editor.id },
    });
  });

  it("writes nothing for a stale base, a future base, or another team's scenario", async () => {
    const w = await makeWorld(db);
    await saveRevision(db, w.members.editor, w.slug, w.scenarioId, {
      baseRevision: 1,
      file: demoFileWith(12000),
    });
    const codeOf = (promise: Promise<unknown>) =>
      promise.then(
        () => "saved",
        (error: unknown) => (isAppError(error) ? error.code : "thrown"),
      );
    const save = (base: number, slug = w.slug, who = w.members.editor) =>
      codeOf(
        saveRevision(db, who, slug, w.scenarioId, { baseRevision: base, file: demoFileWith(1) }),
      );
    expect(await save(1)).toBe("conflict:revision");
    expect(await save(7)).toBe("invalid:baseRevision");
    // An owner of another team names this scenario under their own team: not found.
    const other = await makeTeamWithAllRoles(db);
    expect(await save(2, other.slug, other.members.owner)).toBe("not-found:scenario");
    // A viewer of the scenario's own team may not save at all.
    expect(await save(2, w.slug, w.members.viewer)).toBe("forbidden:team");

    const list = await listRevisions(db, w.members.viewer, w.slug, w.scenarioId);
    expect(list.items.map((r) => r.number)).toEqual([2, 1]);
    const log = await listAuditLog(db, w.members.viewer, w.slug, { pageSize: "50" });
    expect(log.items.filter((e) => e.action === "revision.save")).toHaveLength(1);
  });
});
