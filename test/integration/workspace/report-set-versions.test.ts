/** Issue 13 item 8: the report of a revision made before a library edit names the old version. */
import { afterAll, describe, expect, it } from "vitest";

import { closeComputePool } from "@/lib/server/compute/pool";
import { loadCalibrationReport } from "@/lib/server/handoff/report/load-report";
import { getParameterSet, updateParameterSet } from "@/lib/server/workspace/parameter-sets";

import { openTestDb } from "../support/db";
import { closeAppPoolAfterAll, DEMO_FILE, makeWorld, SET_VALUES } from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();
afterAll(closeComputePool);

describe("report provenance across library versions", () => {
  it("says the revision's set is version 1, superseded by version 2", async () => {
    const w = await makeWorld(db);
    const { editor, viewer } = w.members;
    // Revision 1 holds the demo file's first set, the same numbers as the library set.
    const before = await getParameterSet(db, viewer, w.slug, w.setId);
    await updateParameterSet(db, editor, w.slug, w.setId, {
      values: { ...SET_VALUES, k6: 1.3 },
    });
    const report = await loadCalibrationReport(db, viewer, w.slug, w.scenarioId, 1);
    const first = report.provenance.find((p) => p.setId === DEMO_FILE.parameterSets[0].id);
    expect(first).toMatchObject({
      libraryName: before.name,
      libraryVersion: 1,
      latestVersion: 2,
      librarySource: `library set '${before.name}', version 1 (superseded by version 2)`,
    });
  });
});
