import { describe, expect, it } from "vitest";

import { memberships } from "@/db/schema/teams";
import { saveFit } from "@/lib/server/records/save-fit";
import { uploadTestRecord } from "@/lib/server/records/upload";
import { createTeam } from "@/lib/server/teams/create";
import { exportTeam } from "@/lib/server/workspace/export";
import { importTeam } from "@/lib/server/workspace/import";
import { createParameterSet } from "@/lib/server/workspace/parameter-sets";

import { DEMO_CSV, META, uploadBody } from "../records/support";
import { openTestDb, unique } from "../support/db";
import { closeAppPoolAfterAll, makeWorld, SET_VALUES } from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

// spec A.5's principal-direction example, cut at 30° (thetaA 22.5° → thetaD −7.5°).
const coupon = { cutAngle: 30, layers: [{ fraction: 1, a11: 0.7, a12: 0.2 }] };
// spec A.5's balanced skin/core/skin stack, as "Use as parameter set" describes it.
const stack = {
  closure: "exact" as const,
  layers: [
    { fraction: 0.25, a11: 0.8, a12: 0 },
    { fraction: 0.5, a11: 0.2, a12: 0 },
    { fraction: 0.25, a11: 0.8, a12: 0 },
  ],
  // issue 19 item 2: the provenance keeps the constituents the ply came from (invented values)
  constituents: { Ef: 72000, nuf: 0.22, Em: 3000, num: 0.35, Vf: 0.168, aspect: 500 },
};

describe("the team export carries the orientation tensors with the sets (issue 19 item 4)", () => {
  it("a set fitted on oriented coupons and a set from an orientation state survive export → import", async () => {
    const w = await makeWorld(db);
    const up = await uploadTestRecord(
      db,
      w.members.editor,
      w.slug,
      uploadBody(DEMO_CSV, { name: "cut-30", meta: { ...META, couponOrientation: coupon } }),
    );
    const fitted = unique("Fitted oriented");
    await saveFit(db, w.members.editor, w.slug, {
      method: "identify",
      recordIds: [up.id],
      name: fitted,
      baseOrientation: stack, // the starting values came from "Use as parameter set"
    });
    const fromState = unique("From orientation state");
    await createParameterSet(db, w.members.editor, w.slug, {
      name: fromState,
      values: { ...SET_VALUES, thetaD: 0 },
      provenance: { kind: "constituents", orientations: [stack] },
    });

    const first = await exportTeam(db, w.members.owner, w.slug);
    const fittedSet = first.parameterSets.find((s) => s.name === fitted)!;
    expect(fittedSet.provenance.orientations).toEqual([
      stack,
      { record: `cut-30 (${up.id})`, ...coupon },
    ]);
    expect((fittedSet.values as { thetaD: number }).thetaD).toBeCloseTo(22.5 - 30, 9);
    const stateSet = first.parameterSets.find((s) => s.name === fromState)!;
    expect(stateSet.provenance.orientations).toEqual([stack]);

    const target = await createTeam(db, w.members.owner, { name: unique("Imported") });
    await db
      .insert(memberships)
      .values({ teamId: target.id, userId: w.members.editor.id, role: "editor" });
    await importTeam(db, w.members.owner, target.slug, JSON.parse(JSON.stringify(first)));
    const again = await exportTeam(db, w.members.owner, target.slug);
    const byName = (d: typeof first) =>
      Object.fromEntries(d.parameterSets.map((s) => [s.name, [s.values, s.provenance]]));
    expect(byName(again)[fitted]).toEqual(byName(first)[fitted]);
    expect(byName(again)[fromState]).toEqual(byName(first)[fromState]);
  });

  it("an export whose tensor rows are not numbers is refused and writes nothing", async () => {
    const w = await makeWorld(db);
    const doc = await exportTeam(db, w.members.owner, w.slug);
    const target = await createTeam(db, w.members.owner, { name: unique("Imported") });
    const broken = JSON.parse(JSON.stringify(doc));
    broken.parameterSets[0].provenance = {
      kind: "constituents",
      orientations: [{ layers: [{ fraction: "1", a11: 0.7, a12: 0 }] }],
    };
    await expect(importTeam(db, w.members.owner, target.slug, broken)).rejects.toThrow();
    const empty = await exportTeam(db, w.members.owner, target.slug);
    expect(empty.parameterSets).toHaveLength(0);
  });
});
