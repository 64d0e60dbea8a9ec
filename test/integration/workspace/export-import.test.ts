import { describe, expect, it } from "vitest";

import * as exportRoute from "@/app/api/v1/teams/[team]/export/route";

import { addComment, editComment } from "@/lib/server/workspace/comments";
import { exportTeam } from "@/lib/server/workspace/export";
import type { TeamExport } from "@/lib/server/workspace/export-schema";
import { importTeam } from "@/lib/server/workspace/import";
import { createParameterSet, updateParameterSet } from "@/lib/server/workspace/parameter-sets";
import { changeReview } from "@/lib/server/workspace/review";
import { saveRevision } from "@/lib/server/workspace/revisions";
import { createScenario } from "@/lib/server/workspace/scenarios";
import { memberships } from "@/db/schema/teams";
import { createTeam } from "@/lib/server/teams/create";

import { openTestDb, recordingMailer, unique } from "../support/db";
import { outcome } from "../support/outcome";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  demoFileWith,
  makeWorld,
  SET_VALUES,
  type World,
} from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

/** A team with history: two scenarios, four revisions, reviews, threaded pinned comments, sets. */
async function richWorld(): Promise<World> {
  const w = await makeWorld(db);
  const { editor, reviewer, owner } = w.members;
  const mail = recordingMailer();
  await saveRevision(db, editor, w.slug, w.scenarioId, {
    baseRevision: 1,
    message: "stiffer",
    file: demoFileWith(12000, { chart: { x: "e11" } }),
  });
  await changeReview(
    db,
    editor,
    w.slug,
    w.scenarioId,
    2,
    { action: "request", note: "ready", reviewers: [reviewer.id] },
    mail,
  );
  await changeReview(
    db,
    reviewer,
    w.slug,
    w.scenarioId,
    2,
    { action: "request-changes", note: "b?" },
    mail,
  );
  const top = await addComment(db, reviewer, w.slug, w.scenarioId, 2, {
    body: "Peak too early",
    increment: 80,
  });
  const reply = await addComment(db, editor, w.slug, w.scenarioId, 2, {
    body: "Agreed",
    parentId: top.id,
  });
  await addComment(db, reviewer, w.slug, w.scenarioId, 2, { body: "Thanks", parentId: reply.id });
  await editComment(db, editor, w.slug, w.scenarioId, 2, reply.id, { body: "Agreed, fixing" });
  await saveRevision(db, owner, w.slug, w.scenarioId, {
    baseRevision: 2,
    message: "fixed",
    file: demoFileWith(12100),
  });
  const second = await createScenario(db, owner, w.slug, {
    name: "Biaxial",
    materialLabel: "PA6-GF30",
    tags: ["biaxial", "check"],
    message: "first",
    file: demoFileWith(9000),
  });
  await changeReview(
    db,
    owner,
    w.slug,
    second.scenario.id,
    1,
    { action: "request", reviewers: [reviewer.id] },
    mail,
  );
  await changeReview(db, reviewer, w.slug, second.scenario.id, 1, { action: "approve" }, mail);
  const fitted = await createParameterSet(db, editor, w.slug, {
    name: "Fitted PA6",
    values: SET_VALUES,
    provenance: {
      kind: "fitted",
      records: ["T-01", "T-02"],
      method: "least squares",
      residuals: { rms: 0.8 },
    },
  });
  await updateParameterSet(db, owner, w.slug, fitted.id, {
    provenance: { kind: "fitted", records: ["T-01"], note: "dropped T-02" },
  });
  return w;
}

/** Imported review history and comments come back as names (text), never as accounts. */
function asText(doc: TeamExport): TeamExport {
  const text = (p: { name: string } | null) =>
    p ? { email: "", name: p.name } : { email: "", name: "" };
  return {
    ...doc,
    scenarios: doc.scenarios.map((s) => ({
      ...s,
      revisions: s.revisions.map((r) => ({
        ...r,
        review: { ...r.review, by: r.review.state === "draft" ? null : text(r.review.by) },
        reviewEvents: r.reviewEvents.map((e) => ({ ...e, actor: text(e.actor) })),
        comments: r.comments.map((c) => ({ ...c, author: text(c.author) })),
      })),
    })),
  };
}

/** What must survive: everything except the file's own stamp, the team and comment keys. */
function content(doc: TeamExport) {
  return {
    parameterSets: doc.parameterSets,
    scenarios: doc.scenarios.map((s) => ({
      ...s,
      revisions: s.revisions.map((r) => {
        const index = new Map(r.comments.map((c, i) => [c.key, i]));
        return {
          ...r,
          comments: r.comments.map(({ key, parentKey, ...c }) => ({
            ...c,
            position: index.get(key),
            parent: parentKey === null ? null : index.get(parentKey),
          })),
        };
      }),
    })),
  };
}

describe("team export and import", () => {
  it("export → import into a new team → export again: all content is the same", async () => {
    const w = await richWorld();
    const first = await exportTeam(db, w.members.viewer, w.slug);
    expect(first.scenarios).toHaveLength(2);
    expect(first.scenarios[0].revisions).toHaveLength(3);
    expect(first.scenarios[0].revisions[1].comments).toHaveLength(3);
    expect(first.parameterSets).toHaveLength(2);

    const target = await createTeam(db, w.members.owner, { name: unique("Imported") });
    // Authors are matched to members of the target team: the source team's people join it.
    for (const role of ["editor", "reviewer", "viewer"] as const) {
      await db.insert(memberships).values({ teamId: target.id, userId: w.members[role].id, role });
    }
    const report = await importTeam(
      db,
      w.members.owner,
      target.slug,
      JSON.parse(JSON.stringify(first)),
    );
    expect(report).toMatchObject({
      scenarios: 2,
      revisions: 4,
      comments: 4,
      parameterSets: 2,
    });

    const again = await exportTeam(db, w.members.owner, target.slug);
    expect(again.team.slug).toBe(target.slug);
    expect(content(again)).toEqual(content(asText(first)));
    // The keys are new ids: nothing points back into the source team.
    const keys = (d: TeamExport) =>
      d.scenarios.flatMap((s) => s.revisions.flatMap((r) => r.comments.map((c) => c.key)));
    expect(keys(again).some((k) => keys(first).includes(k))).toBe(false);
  });

  it("refuses a non-empty target, non-owners, and a file with an invalid revision, writing nothing", async () => {
    const w = await richWorld();
    const doc = await exportTeam(db, w.members.owner, w.slug);
    expect(await outcome(importTeam(db, w.members.owner, w.slug, doc))).toBe("conflict:not-empty");
    const target = await createTeam(db, w.members.editor, { name: unique("Mine") });
    expect(await outcome(importTeam(db, w.members.editor, w.slug, doc))).toBe("forbidden:team");

    const broken = structuredClone(doc);
    (
      broken.scenarios[1].revisions[0].file as { parameterSets: { E1: number }[] }
    ).parameterSets[0].E1 = -1;
    expect(await outcome(importTeam(db, w.members.editor, target.slug, broken))).toBe(
      "invalid:import",
    );
    const orphan = structuredClone(doc);
    orphan.scenarios[0].revisions[1].comments[1].parentKey = "not-a-key";
    expect(await outcome(importTeam(db, w.members.editor, target.slug, orphan))).toBe(
      "invalid:import",
    );
    expect(
      await outcome(importTeam(db, w.members.editor, target.slug, { format: "something/else" })),
    ).toBe("invalid:format");
    const empty = await exportTeam(db, w.members.editor, target.slug);
    expect(empty.scenarios).toEqual([]);
    expect(empty.parameterSets).toEqual([]);
  });

  it("authors who are not members of the target team are left empty, not invented", async () => {
    const w = await makeWorld(db);
    const doc = await exportTeam(db, w.members.owner, w.slug);
    doc.scenarios[0].revisions[0].author = { email: "gone@elsewhere.example", name: "Gone" };
    // An account here, but not a member of the target team: not matched either.
    doc.scenarios[0].createdBy = { email: w.outsider.email, name: w.outsider.name };
    const target = await createTeam(db, w.members.owner, { name: unique("Elsewhere") });
    const report = await importTeam(db, w.members.owner, target.slug, doc);
    expect(Object.keys(report).sort()).toEqual(
      [
        "comments",
        "fits",
        "notes",
        "parameterSets",
        "revisions",
        "scenarios",
        "testRecords",
      ].sort(),
    );
    const again = await exportTeam(db, w.members.owner, target.slug);
    expect(again.scenarios[0].revisions[0].author).toBeNull();
    expect(again.scenarios[0].createdBy).toBeNull();
  });

  it("the export route can hand the document over as a file download", async () => {
    const w = await makeWorld(db);
    const r = await callRoute(exportRoute.GET, {
      url: "http://app.test/x?download=1",
      params: { team: w.slug },
      cookie: await cookieFor(db, w.members.viewer),
    });
    expect(r.status).toBe(200);
    expect(r.headers.get("content-disposition")).toMatch(
      new RegExp(`^attachment; filename="craquelure-${w.slug}-\\d{4}-\\d{2}-\\d{2}\\.json"$`),
    );
    expect(r.body.format).toBe("craquelure.team-export/1");
    expect(r.body.scenarios).toHaveLength(1);
  });
});
