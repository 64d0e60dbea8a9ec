import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";

import type { Db } from "@/db/client";
import {
  findLatestConformanceVerdict,
  insertConformanceCheck,
  listLatestVerdictsOfLatestRevisions,
} from "@/db/queries/conformance-checks";
import { scenarioRevisions } from "@/db/schema/scenarios";
import type { ConformanceResult } from "@/lib/server/handoff/conformance/types";
import { saveRevision } from "@/lib/server/workspace/revisions";
import { createScenario, listScenarios } from "@/lib/server/workspace/scenarios";

import { openTestDb } from "../support/db";
import { demoFileWith, makeWorld, type World } from "../support/workspace";

// Issue 13 item 4: the scenarios table shows the latest revision's newest conformance verdict,
// read for the whole page at once and only from the team's own checks.
const db = openTestDb();

function result(passed: boolean, sig12: number): ConformanceResult {
  return {
    setId: "A",
    tolerance: { stressFraction: 0.01, damage: 0.005 },
    points: 3,
    peakStress: 70,
    passed,
    firstFailIncrement: passed ? null : 2,
    quantities: [
      {
        quantity: "sig11",
        tolerance: 0.7,
        maxAbs: 0.1,
        rms: 0.05,
        maxRel: 0,
        firstFailIncrement: null,
        passed: true,
      },
      {
        quantity: "sig12",
        tolerance: 0.7,
        maxAbs: sig12,
        rms: 0.1,
        maxRel: 0,
        firstFailIncrement: passed ? null : 2,
        passed,
      },
    ],
  };
}

async function revisionId(scenarioId: string, number: number): Promise<string> {
  const [row] = await db
    .select({ id: scenarioRevisions.id })
    .from(scenarioRevisions)
    .where(and(eq(scenarioRevisions.scenarioId, scenarioId), eq(scenarioRevisions.number, number)));
  return row.id;
}

async function check(
  database: Db,
  teamId: string,
  scenarioId: string,
  number: number,
  passed: boolean,
  at: string,
  sig12 = 0.2,
) {
  await insertConformanceCheck(database, {
    teamId,
    revisionId: await revisionId(scenarioId, number),
    setId: "A",
    fileName: `check-${at}.csv`,
    fileText: "",
    passed,
    firstFailIncrement: passed ? null : 2,
    result: result(passed, sig12),
    createdAt: new Date(at),
  });
}

let mine: World;
let theirs: World;
let superseded: string;
let unchecked: string;

beforeAll(async () => {
  mine = await makeWorld(db);
  theirs = await makeWorld(db);
  const editor = mine.members.editor;
  // The world's scenario: checked twice on revision 1, the newer check failed.
  await check(db, mine.teamId, mine.scenarioId, 1, true, "2026-12-01T09:00:00Z");
  await check(db, mine.teamId, mine.scenarioId, 1, false, "2026-12-02T09:00:00Z", 1.5);
  // A forged row naming the other team on my revision, newer still: it must not count.
  await check(db, theirs.teamId, mine.scenarioId, 1, true, "2026-12-03T09:00:00Z");

  // Checked on revision 1, then revision 2 saved: the latest revision has no verdict yet.
  const s = await createScenario(db, editor, mine.slug, {
    name: "Superseded",
    file: demoFileWith(10000),
  });
  superseded = s.scenario.id;
  await check(db, mine.teamId, superseded, 1, true, "2026-12-01T10:00:00Z");
  await saveRevision(db, editor, mine.slug, superseded, {
    baseRevision: 1,
    file: demoFileWith(10500),
  });

  const u = await createScenario(db, editor, mine.slug, {
    name: "Unchecked",
    file: demoFileWith(11000),
  });
  unchecked = u.scenario.id;

  // The other team's scenario passes its check.
  await check(db, theirs.teamId, theirs.scenarioId, 1, true, "2026-12-04T09:00:00Z");
});

describe("latest conformance verdicts", () => {
  it("the scenarios list carries the latest revision's newest verdict, null when none", async () => {
    const list = await listScenarios(db, mine.members.viewer, mine.slug, {});
    const byId = new Map(list.items.map((i) => [i.id, i.conformance]));
    expect(byId.get(mine.scenarioId)).toEqual({
      passed: false,
      checkedAt: "2026-12-02T09:00:00.000Z",
    });
    expect(byId.get(superseded)).toBeNull();
    expect(byId.get(unchecked)).toBeNull();
    expect(byId.has(theirs.scenarioId)).toBe(false);
  });

  it("never reads another team's checks, even when asked for their scenario's id", async () => {
    const verdicts = await listLatestVerdictsOfLatestRevisions(db, mine.teamId, [
      mine.scenarioId,
      theirs.scenarioId,
    ]);
    expect([...verdicts.keys()]).toEqual([mine.scenarioId]);
    expect(await findLatestConformanceVerdict(db, mine.teamId, theirs.scenarioId, 1)).toBeNull();
    // Their own list sees their verdict, and not the forged row on my revision.
    const theirList = await listScenarios(db, theirs.members.viewer, theirs.slug, {});
    expect(theirList.items.map((i) => [i.id, i.conformance?.passed])).toEqual([
      [theirs.scenarioId, true],
    ]);
  });

  it("the hand-off panel's verdict names the file and the largest deviation", async () => {
    expect(await findLatestConformanceVerdict(db, mine.teamId, mine.scenarioId, 1)).toEqual({
      passed: false,
      checkedAt: "2026-12-02T09:00:00.000Z",
      fileName: "check-2026-12-02T09:00:00Z.csv",
      firstFailIncrement: 2,
      largest: { quantity: "sig12", maxAbs: 1.5 },
    });
    expect(await findLatestConformanceVerdict(db, mine.teamId, superseded, 2)).toBeNull();
  });

  it("an empty page asks nothing", async () => {
    expect((await listLatestVerdictsOfLatestRevisions(db, mine.teamId, [])).size).toBe(0);
  });
});
