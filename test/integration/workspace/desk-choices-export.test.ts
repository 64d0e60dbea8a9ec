import { describe, expect, it } from "vitest";

import { readDeskCharts, readDeskExtras, readDeskOverlays } from "@/lib/scenario/desk-extras";
import { exportTeam } from "@/lib/server/workspace/export";
import { importTeam } from "@/lib/server/workspace/import";
import { saveRevision } from "@/lib/server/workspace/revisions";
import { createTeam } from "@/lib/server/teams/create";

import { openTestDb, unique } from "../support/db";
import { closeAppPoolAfterAll, demoFileWith, makeWorld } from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

const RECORD = "0b8f5a52-8c1e-4c43-9d4e-1f2a3b4c5d6e";
const DESK = {
  pathText: "",
  hidden: [],
  overlays: [{ recordId: RECORD, name: "T-03 tension" }],
  charts: {
    stressStrain: { stress: "sig12", strain: "gam12" },
    horizontal: { damage: "sig11", energy: "eps22" },
  },
};

describe("test records and chart choices of a revision (issue 13 item 7)", () => {
  it("are kept in the revision's file through a team export and an import into another team", async () => {
    const w = await makeWorld(db);
    await saveRevision(db, w.members.editor, w.slug, w.scenarioId, {
      baseRevision: 1,
      message: "records over the charts",
      file: demoFileWith(12000, { desk: DESK }),
    });
    const exported = await exportTeam(db, w.members.owner, w.slug);
    const revision = (doc: typeof exported) =>
      doc.scenarios
        .flatMap((s) => s.revisions)
        .find((r) => r.message === "records over the charts");
    expect(readDeskExtras(revision(exported)?.file)).toEqual(DESK);

    const target = await createTeam(db, w.members.owner, { name: unique("Elsewhere") });
    const report = await importTeam(
      db,
      w.members.owner,
      target.slug,
      JSON.parse(JSON.stringify(exported)),
    );
    const again = await exportTeam(db, w.members.owner, target.slug);
    const desk = readDeskExtras(revision(again)?.file);
    // The record is not in the file (no such record in the team): its overlay is left out and
    // the import says so; the chart choices travel as written. Overlays of records that do
    // travel are remapped: export-import-records.test.ts.
    expect(readDeskOverlays(desk)).toEqual([]);
    expect(report.notes).toEqual([expect.stringContaining("'T-03 tension'")]);
    expect(readDeskCharts(desk)).toEqual(DESK.charts);
  });
});
