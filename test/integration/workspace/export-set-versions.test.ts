/** Issue 13 item 8: a team export carries each library set's versions; old exports still import. */
import { asc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { parameterSets, parameterSetVersions } from "@/db/schema/parameter-sets";
import { memberships } from "@/db/schema/teams";
import { createTeam } from "@/lib/server/teams/create";
import { exportTeam } from "@/lib/server/workspace/export";
import { importTeam } from "@/lib/server/workspace/import";
import { getParameterSet, updateParameterSet } from "@/lib/server/workspace/parameter-sets";

import { openTestDb, unique } from "../support/db";
import { outcome } from "../support/outcome";
import { closeAppPoolAfterAll, makeWorld, SET_VALUES, type World } from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

async function editedWorld(): Promise<World> {
  const w = await makeWorld(db);
  await updateParameterSet(db, w.members.editor, w.slug, w.setId, {
    values: { ...SET_VALUES, a1: 0.55 },
  });
  await updateParameterSet(db, w.members.owner, w.slug, w.setId, {
    values: { ...SET_VALUES, a1: 0.5 },
  });
  return w;
}

async function targetTeam(w: World) {
  const target = await createTeam(db, w.members.owner, { name: unique("Imported") });
  for (const role of ["editor", "reviewer", "viewer"] as const) {
    await db.insert(memberships).values({ teamId: target.id, userId: w.members[role].id, role });
  }
  return target;
}

async function versionsOfTeam(teamId: string) {
  return db
    .select({ version: parameterSetVersions.version, values: parameterSetVersions.values })
    .from(parameterSetVersions)
    .innerJoin(parameterSets, eq(parameterSets.id, parameterSetVersions.setId))
    .where(eq(parameterSets.teamId, teamId))
    .orderBy(asc(parameterSetVersions.version));
}

describe("library set versions in the team export", () => {
  it("export → import keeps every version with its values and author", async () => {
    const w = await editedWorld();
    const doc = await exportTeam(db, w.members.viewer, w.slug);
    const set = doc.parameterSets.find((s) => s.values.a1 === 0.5)!;
    expect(set.versions?.map((v) => [v.version, v.values.a1])).toEqual([
      [1, SET_VALUES.a1],
      [2, 0.55],
      [3, 0.5],
    ]);
    expect(set.versions?.[2].createdBy?.email).toBe(w.members.owner.email);

    const target = await targetTeam(w);
    await importTeam(db, w.members.owner, target.slug, JSON.parse(JSON.stringify(doc)));
    const again = await exportTeam(db, w.members.owner, target.slug);
    const back = again.parameterSets.find((s) => s.name === set.name)!;
    expect(back.versions).toEqual(set.versions);
    const [row] = await db.select().from(parameterSets).where(eq(parameterSets.teamId, target.id));
    expect(row.version).toBe(3);
    // The imported set keeps counting from its history.
    const next = await updateParameterSet(db, w.members.editor, target.slug, row.id, {
      values: { ...SET_VALUES, a1: 0.45 },
    });
    expect(next.version).toBe(4);
  });

  it("a file without versions (written before they existed) imports each set as version 1", async () => {
    const w = await editedWorld();
    const doc = await exportTeam(db, w.members.owner, w.slug);
    const old = structuredClone(doc);
    for (const s of old.parameterSets) delete s.versions;
    const target = await targetTeam(w);
    await importTeam(db, w.members.owner, target.slug, JSON.parse(JSON.stringify(old)));
    const versions = await versionsOfTeam(target.id);
    expect(versions.map((v) => v.version)).toEqual([1]);
    expect(versions[0].values.a1).toBe(0.5);
    const [row] = await db.select().from(parameterSets).where(eq(parameterSets.teamId, target.id));
    const shown = await getParameterSet(db, w.members.viewer, target.slug, row.id);
    expect(shown.version).toBe(1);
    expect(shown.versions).toHaveLength(1);
  });

  it("refuses a file whose set lists one version twice, writing nothing", async () => {
    const w = await editedWorld();
    const doc = await exportTeam(db, w.members.owner, w.slug);
    const twice = structuredClone(doc);
    const versions = twice.parameterSets[0].versions!;
    versions.push({ ...versions[0] });
    const target = await targetTeam(w);
    expect(await outcome(importTeam(db, w.members.owner, target.slug, twice))).toBe(
      "invalid:import",
    );
    expect(await versionsOfTeam(target.id)).toEqual([]);
  });
});
