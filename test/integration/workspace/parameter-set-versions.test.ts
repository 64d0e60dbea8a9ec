import { asc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import * as setRoute from "@/app/api/v1/teams/[team]/parameter-sets/[set]/route";
import { auditEvents } from "@/db/schema/audit-events";
import { parameterSetVersions } from "@/db/schema/parameter-sets";
import {
  createParameterSet,
  getParameterSet,
  updateParameterSet,
} from "@/lib/server/workspace/parameter-sets";

import { openTestDb, unique } from "../support/db";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  makeWorld,
  SET_VALUES,
} from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

async function versionRows(setId: string) {
  return db
    .select()
    .from(parameterSetVersions)
    .where(eq(parameterSetVersions.setId, setId))
    .orderBy(asc(parameterSetVersions.version));
}

describe("a library set's versions", () => {
  it("a new set is version 1 with its values", async () => {
    const w = await makeWorld(db);
    const set = await getParameterSet(db, w.members.viewer, w.slug, w.setId);
    expect(set.version).toBe(1);
    expect(set.versions).toEqual([
      expect.objectContaining({ version: 1, changed: [], provenanceChanged: false }),
    ]);
    expect(set.versions[0].createdBy?.id).toBe(w.members.editor.id);
    const rows = await versionRows(w.setId);
    expect(rows.map((r) => r.values.E1)).toEqual([SET_VALUES.E1]);
  });

  it("editing values makes version 2 and keeps version 1's values", async () => {
    const w = await makeWorld(db);
    const { owner } = w.members;
    const edited = { ...SET_VALUES, Y0_1: 0.02, k6: 1.4 };
    const after = await updateParameterSet(db, owner, w.slug, w.setId, { values: edited });
    expect(after.version).toBe(2);
    expect(after.values.Y0_1).toBe(0.02);
    expect(after.versions.map((v) => v.version)).toEqual([1, 2]);
    expect(after.versions[1]).toMatchObject({ changed: ["Y0_1", "k6"] });
    expect(after.versions[1].createdBy?.id).toBe(owner.id);

    const rows = await versionRows(w.setId);
    expect(rows.map((r) => r.version)).toEqual([1, 2]);
    expect(rows[0].values.Y0_1).toBe(SET_VALUES.Y0_1);
    expect(rows[0].values.k6).toBe(SET_VALUES.k6 ?? 1);
    expect(rows[1].values.Y0_1).toBe(0.02);

    const audit = await db.select().from(auditEvents).where(eq(auditEvents.target, w.setId));
    const update = audit.find((a) => a.action === "parameter-set.update");
    expect(update?.detail).toMatchObject({ version: 2, before: { version: 1 } });
  });

  it("renaming alone, or saving the same numbers again, makes no version", async () => {
    const w = await makeWorld(db);
    const { editor } = w.members;
    const renamed = await updateParameterSet(db, editor, w.slug, w.setId, { name: unique("R") });
    expect(renamed.version).toBe(1);
    const same = await updateParameterSet(db, editor, w.slug, w.setId, {
      values: { ...SET_VALUES },
    });
    expect(same.version).toBe(1);
    expect(await versionRows(w.setId)).toHaveLength(1);
  });

  it("a new origin alone is a new version with no changed parameter", async () => {
    const w = await makeWorld(db);
    const after = await updateParameterSet(db, w.members.editor, w.slug, w.setId, {
      provenance: { kind: "fitted", records: ["coupon 3"] },
    });
    expect(after.version).toBe(2);
    expect(after.versions[1]).toMatchObject({ changed: [], provenanceChanged: true });
  });

  it("a viewer cannot edit the values (403) and the set stays at version 1", async () => {
    const w = await makeWorld(db);
    const result = await callRoute(setRoute.PATCH, {
      method: "PATCH",
      url: "http://app.test/api/v1/x",
      params: { team: w.slug, set: w.setId },
      cookie: await cookieFor(db, w.members.viewer),
      body: { values: { ...SET_VALUES, Y0_1: 0.03 } },
    });
    expect(result.status).toBe(403);
    expect(await versionRows(w.setId)).toHaveLength(1);
  });

  it("the API's GET lists the versions", async () => {
    const w = await makeWorld(db);
    const created = await createParameterSet(db, w.members.editor, w.slug, {
      name: unique("Set"),
      values: SET_VALUES,
    });
    await updateParameterSet(db, w.members.editor, w.slug, created.id, {
      values: { ...SET_VALUES, b: 0.5 },
    });
    const result = await callRoute(setRoute.GET, {
      method: "GET",
      url: "http://app.test/api/v1/x",
      params: { team: w.slug, set: created.id },
      cookie: await cookieFor(db, w.members.viewer),
    });
    expect(result.status).toBe(200);
    expect(result.body.version).toBe(2);
    expect(result.body.versions).toEqual([
      expect.objectContaining({ version: 1, changed: [] }),
      expect.objectContaining({ version: 2, changed: ["b"] }),
    ]);
  });
});
