import { beforeAll, describe, expect, it } from "vitest";

import { findTestRecordSummary } from "@/db/queries/test-records";
import { identifyRecords } from "@/lib/server/records/identify-records";
import { uploadTestRecord } from "@/lib/server/records/upload";

import { openTestDb } from "../support/db";
import { makeTeamWithAllRoles, type TeamFixture } from "../support/team";
import { DEMO_CSV, META, recordCount, uploadBody } from "./support";

const db = openTestDb();
let t: TeamFixture;

// spec A.5's principal-direction example: a = [[0.7, 0.2], [0.2, 0.3]] has thetaA = 22.5°.
const tilted = { cutAngle: 30, layers: [{ fraction: 1, a11: 0.7, a12: 0.2 }] };

const withOrientation = (couponOrientation: unknown, name: string) =>
  uploadBody(DEMO_CSV, { name, meta: { ...META, couponOrientation } });

beforeAll(async () => {
  t = await makeTeamWithAllRoles(db);
});

describe("a test record with its coupon's orientation state (issue 19 item 3)", () => {
  it("stores the cut angle and tensors; identification gives thetaD = thetaA − φ", async () => {
    const up = await uploadTestRecord(
      db,
      t.members.editor,
      t.slug,
      withOrientation(tilted, "cut-30"),
    );
    const stored = await findTestRecordSummary(db, t.teamId, up.id);
    expect(stored?.couponOrientation).toEqual(tilted);

    const result = await identifyRecords(db, t.members.editor, t.slug, { recordIds: [up.id] });
    expect(result.params.thetaD).toBeCloseTo(22.5 - 30, 9); // spec A.5: thetaA − φ
    expect(result.identified).toContain("thetaD");
    expect(result.notes.join("\n")).toContain("thetaA 22.5° − cut angle φ 30°");
  });

  it("records of different frames give a warning and keep the starting thetaD", async () => {
    const a = await uploadTestRecord(db, t.members.editor, t.slug, withOrientation(tilted, "a"));
    const b = await uploadTestRecord(
      db,
      t.members.editor,
      t.slug,
      withOrientation({ ...tilted, cutAngle: 0 }, "b"),
    );
    const result = await identifyRecords(db, t.members.editor, t.slug, {
      recordIds: [a.id, b.id],
    });
    expect(result.params.thetaD).toBe(0); // the demo base's frame, not a mix
    expect(result.warnings.join("\n")).toContain("different damage frames");
  });

  it("a record without orientation identifies as before", async () => {
    const up = await uploadTestRecord(db, t.members.editor, t.slug, uploadBody(DEMO_CSV));
    const stored = await findTestRecordSummary(db, t.teamId, up.id);
    expect(stored?.couponOrientation).toBeNull();
    const result = await identifyRecords(db, t.members.editor, t.slug, { recordIds: [up.id] });
    expect(result.identified).not.toContain("thetaD");
  });

  it("refuses a tensor no fibre distribution has, naming the field by its label; saves nothing", async () => {
    const before = await recordCount(db, t.teamId);
    const bad = { cutAngle: 0, layers: [{ fraction: 1, a11: 0.9, a12: 0.4 }] };
    await expect(
      uploadTestRecord(db, t.members.editor, t.slug, withOrientation(bad, "bad")),
    ).rejects.toThrow(/Coupon orientation, layer 1, a12: a12² must not exceed a11·a22/);
    expect(await recordCount(db, t.teamId)).toBe(before);
  });
});
