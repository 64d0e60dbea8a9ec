import { asc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { fits } from "@/db/schema/fits";
import { parameterSets } from "@/db/schema/parameter-sets";
import { scenarioRevisions, scenarios } from "@/db/schema/scenarios";
import { testRecords } from "@/db/schema/test-records";
import { readDeskExtras, readDeskOverlays } from "@/lib/scenario/desk-extras";
import { saveFit } from "@/lib/server/records/save-fit";
import { uploadTestRecord } from "@/lib/server/records/upload";
import { createTeam } from "@/lib/server/teams/create";
import { exportTeam } from "@/lib/server/workspace/export";
import type { TeamExport } from "@/lib/server/workspace/export-schema";
import { importTeam } from "@/lib/server/workspace/import";
import { saveRevision } from "@/lib/server/workspace/revisions";
import { isAppError } from "@/lib/shared/errors";
import { memberships } from "@/db/schema/teams";

import { exportFile } from "../../fixtures/team-export";
import { DEMO_CSV, uploadBody } from "../records/support";
import { openTestDb, unique } from "../support/db";
import { outcome } from "../support/outcome";
import { closeAppPoolAfterAll, demoFileWith, makeWorld, type World } from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

// Issue 13 items 7 and 8: test records (with their original files) and fits travel in the team
// export; the import gives them new ids and rewrites every reference to them.

// A record of some other team: an overlay of it cannot travel and must be left out.
const NOT_IN_FILE = "2daf7c74-ae30-4e65-9f60-3b4c5d6e7f80";

async function recordsOf(teamId: string) {
  return db
    .select()
    .from(testRecords)
    .where(eq(testRecords.teamId, teamId))
    .orderBy(asc(testRecords.createdAt), asc(testRecords.id));
}

/** Two records (the second with CRLF line ends, so the file text is not the parsed points), a fit, overlays. */
async function worldWithRecords(): Promise<
  World & { recordIds: [string, string]; setName: string }
> {
  const w = await makeWorld(db);
  const a = await uploadTestRecord(
    db,
    w.members.editor,
    w.slug,
    uploadBody(DEMO_CSV, { name: "T-01" }),
  );
  const b = await uploadTestRecord(
    db,
    w.members.editor,
    w.slug,
    uploadBody(DEMO_CSV.replace(/\n/g, "\r\n"), { name: "T-02", fileName: "t-02.csv" }),
  );
  const setName = unique("Fitted from T-01 and T-02");
  await saveFit(db, w.members.editor, w.slug, {
    method: "identify",
    recordIds: [a.id, b.id],
    name: setName,
  });
  await saveRevision(db, w.members.editor, w.slug, w.scenarioId, {
    baseRevision: 1,
    message: "records over the charts",
    file: demoFileWith(12000, {
      desk: {
        pathText: "",
        hidden: [],
        overlays: [
          { recordId: b.id, name: "T-02" },
          { recordId: NOT_IN_FILE, name: "T-77 elsewhere" },
          { recordId: a.id, name: "T-01" },
        ],
      },
    }),
  });
  return { ...w, recordIds: [a.id, b.id], setName };
}

async function emptyTarget(w: World) {
  return createTeam(db, w.members.owner, { name: unique("Imported") });
}

describe("test records and fits in the team export and import", () => {
  it("round trip: same points and files under new ids, the fit and the overlays follow them", async () => {
    const w = await worldWithRecords();
    const doc = await exportTeam(db, w.members.viewer, w.slug);
    expect(doc.testRecords.map((r) => r.name)).toEqual(["T-01", "T-02"]);
    expect(doc.fits).toHaveLength(1);
    expect(doc.fits[0].recordKeys).toEqual(w.recordIds);
    expect(doc.fits[0].parameterSet).toBe(w.setName);

    const target = await emptyTarget(w);
    const report = await importTeam(
      db,
      w.members.owner,
      target.slug,
      JSON.parse(JSON.stringify(doc)),
    );
    expect(report).toMatchObject({ scenarios: 1, revisions: 2, testRecords: 2, fits: 1 });
    expect(report.notes).toEqual([expect.stringContaining("'T-77 elsewhere'")]);
    expect(report.notes[0]).toMatch(/^Revision 2 of '.+' drew 'T-77 elsewhere'/);

    const before = await recordsOf(w.teamId);
    const after = await recordsOf(target.id);
    expect(after).toHaveLength(2);
    const newIds = after.map((r) => r.id);
    expect(newIds.some((id) => w.recordIds.includes(id))).toBe(false);
    after.forEach((r, i) => {
      const old = before[i];
      expect(r.name).toBe(old.name);
      expect(r.points).toEqual(old.points);
      expect(r.fileText).toBe(old.fileText);
      expect(r.fileSha256).toBe(old.fileSha256);
      expect(r.fileName).toBe(old.fileName);
      expect(r.fileSize).toBe(old.fileSize);
      expect(r.mapping).toEqual(old.mapping);
      expect(r.headers).toEqual(old.headers);
      expect(r.pointCount).toBe(old.pointCount);
      expect(r.specimenId).toBe(old.specimenId);
      expect(r.laboratory).toBe(old.laboratory);
    });
    expect(after[1].fileText).toContain("\r\n");

    const [fit] = await db.select().from(fits).where(eq(fits.teamId, target.id));
    expect(fit.recordIds).toEqual(newIds);
    expect(fit.reports.map((r) => r.id)).toEqual(newIds);
    const [set] = await db
      .select()
      .from(parameterSets)
      .where(eq(parameterSets.teamId, target.id))
      .then((rows) => rows.filter((s) => s.name === w.setName));
    expect(fit.parameterSetId).toBe(set.id);
    const [oldFit] = await db.select().from(fits).where(eq(fits.teamId, w.teamId));
    expect(fit.params).toEqual(oldFit.params);

    const [revision] = await db
      .select({ file: scenarioRevisions.file })
      .from(scenarioRevisions)
      .innerJoin(scenarios, eq(scenarios.id, scenarioRevisions.scenarioId))
      .where(eq(scenarios.teamId, target.id))
      .then((rows) => rows.filter((r) => readDeskOverlays(readDeskExtras(r.file)).length > 0));
    expect(readDeskOverlays(readDeskExtras(revision.file))).toEqual([
      { recordId: newIds[1], name: "T-02" },
      { recordId: newIds[0], name: "T-01" },
    ]);

    // And out again: the second export describes the same records and fit.
    const again = await exportTeam(db, w.members.owner, target.slug);
    const strip = (d: TeamExport) => ({
      records: d.testRecords.map(({ key: _k, createdBy: _c, ...r }) => r),
      fits: d.fits.map(({ recordKeys: _r, reports: _p, residuals: _s, createdBy: _c, ...f }) => f),
    });
    expect(strip(again)).toEqual(strip(doc));
  });

  it("refuses a record whose original file was changed, naming the record, and writes nothing", async () => {
    const w = await worldWithRecords();
    const doc = await exportTeam(db, w.members.owner, w.slug);
    const target = await emptyTarget(w);
    const tampered = structuredClone(doc);
    tampered.testRecords[1].file.text = tampered.testRecords[1].file.text.replace("0", "1");
    const failure = await importTeam(db, w.members.owner, target.slug, tampered).then(
      () => null,
      (e: unknown) => e,
    );
    expect(isAppError(failure) && failure.code).toBe("invalid:import");
    expect((failure as Error).message).toMatch(
      /^Test record 'T-02': its original file 't-02\.csv' does not match the sha-256 checksum/,
    );
    expect(await recordsOf(target.id)).toHaveLength(0);
    const empty = await exportTeam(db, w.members.owner, target.slug);
    expect(empty.scenarios).toEqual([]);
    expect(empty.fits).toEqual([]);

    // A checksum edited to match nothing is refused the same way.
    const forged = structuredClone(doc);
    forged.testRecords[0].file.sha256 = "0".repeat(64);
    const second = await importTeam(db, w.members.owner, target.slug, forged).catch(
      (e: Error) => e,
    );
    expect((second as Error).message).toMatch(/^Test record 'T-01'/);
  });

  it("only members export the records; only the target team's owner imports them", async () => {
    const w = await worldWithRecords();
    const doc = await exportTeam(db, w.members.viewer, w.slug);
    expect(doc.testRecords).toHaveLength(2);
    expect(await outcome(exportTeam(db, w.outsider, w.slug))).toMatch(
      /^(not-found|forbidden):team$/,
    );
    const target = await emptyTarget(w);
    for (const role of ["editor", "reviewer", "viewer"] as const) {
      await db.insert(memberships).values({ teamId: target.id, userId: w.members[role].id, role });
      expect(await outcome(importTeam(db, w.members[role], target.slug, doc))).toBe(
        "forbidden:team",
      );
    }
    expect(await recordsOf(target.id)).toHaveLength(0);
    expect(await outcome(importTeam(db, w.members.owner, target.slug, doc))).toBeNull();
    // A team that holds test records is not empty: a second import is refused.
    expect(await outcome(importTeam(db, w.members.owner, target.slug, doc))).toBe(
      "conflict:not-empty",
    );
    expect(await recordsOf(target.id)).toHaveLength(2);
  });

  it("an export file of the old shape (no records, no fits) still imports", async () => {
    const w = await makeWorld(db);
    const target = await emptyTarget(w);
    const old = exportFile() as Record<string, unknown>;
    expect("testRecords" in old || "fits" in old).toBe(false);
    const report = await importTeam(db, w.members.owner, target.slug, old);
    expect(report).toEqual({
      scenarios: 2,
      revisions: 3,
      comments: 3,
      parameterSets: 1,
      testRecords: 0,
      fits: 0,
      notes: [],
    });
  });
});
