import { describe, expect, it } from "vitest";

import { changeReview } from "@/lib/server/workspace/review";
import { saveRevision } from "@/lib/server/workspace/revisions";
import { createScenario, listScenarios, updateScenario } from "@/lib/server/workspace/scenarios";

import { openTestDb, recordingMailer } from "../support/db";
import { demoFileWith, makeWorld } from "../support/workspace";

const db = openTestDb();

describe("the scenarios list", () => {
  it("sorts, filters by tag, review state and author, and pages with a total", async () => {
    const w = await makeWorld(db);
    const { owner, editor } = w.members;
    const make = (name: string, tags: string[], who = editor) =>
      createScenario(db, who, w.slug, {
        name,
        tags,
        materialLabel: "PP-GF20",
        file: demoFileWith(10000),
      });
    const b = await make("Bravo", ["cyclic"]);
    await make("alpha", ["cyclic", "shear"], owner);
    const c = await make("Charlie", ["shear"]);
    await changeReview(
      db,
      editor,
      w.slug,
      b.scenario.id,
      1,
      { action: "request", reviewers: [w.members.reviewer.id] },
      recordingMailer(),
    );
    await saveRevision(db, owner, w.slug, c.scenario.id, {
      baseRevision: 1,
      file: demoFileWith(10500),
    });
    await updateScenario(db, editor, w.slug, w.scenarioId, { tags: ["plate", "old"] });

    const list = (query: Record<string, unknown>) =>
      listScenarios(db, w.members.viewer, w.slug, query);
    const names = async (query: Record<string, unknown>) =>
      (await list(query)).items.map((i) => i.name);

    const byUpdated = await list({});
    expect(byUpdated.total).toBe(4);
    // Newest change first: the retag of the world's scenario came last.
    expect(byUpdated.items[0].id).toBe(w.scenarioId);
    expect(byUpdated.items[1].name).toBe("Charlie");

    expect(await names({ sort: "name", dir: "asc" })).toEqual([
      "alpha",
      "Bravo",
      "Charlie",
      expect.any(String),
    ]);
    expect((await names({ sort: "name", dir: "desc" }))[0]).toMatch(/^Scenario-/);
    expect(await names({ tag: "shear", sort: "name" })).toEqual(["alpha", "Charlie"]);
    expect(await names({ review: "in_review" })).toEqual(["Bravo"]);
    expect((await list({ review: "in_review" })).total).toBe(1);
    expect(await names({ author: owner.id })).toEqual(["alpha"]);
    expect(await names({ q: "har" })).toEqual(["Charlie"]);
    expect(await names({ q: "%" })).toEqual([]);
    expect((await names({ sort: "review", dir: "desc" }))[0]).toBe("Bravo");

    const page2 = await list({ sort: "name", pageSize: "2", page: "2" });
    expect(page2).toMatchObject({ total: 4, page: 2, pageSize: 2 });
    expect(page2.items.map((i) => i.name)).toEqual([
      "Charlie",
      expect.stringMatching(/^Scenario-/),
    ]);

    // The total rides on the page's rows; a page past the end has none and still counts.
    expect(await list({ sort: "name", pageSize: "2", page: "9" })).toMatchObject({
      items: [],
      total: 4,
      page: 9,
    });
    expect((await list({ tag: "shear", pageSize: "1", page: "5" })).total).toBe(2);

    const charlie = byUpdated.items[1];
    expect(charlie.latestRevision).toMatchObject({
      number: 2,
      author: { id: owner.id, name: "Owner" },
      reviewState: "draft",
    });
    expect(charlie.createdBy).toEqual({ id: editor.id, name: "editor" });
    expect(charlie.materialLabel).toBe("PP-GF20");
  });

  it("shows the newest revision's review state: a verdict on an older revision does not move it", async () => {
    const w = await makeWorld(db);
    const { editor, reviewer } = w.members;
    const mail = recordingMailer();
    const state = async () =>
      (await listScenarios(db, editor, w.slug, {})).items[0].latestRevision.reviewState;
    await changeReview(
      db,
      editor,
      w.slug,
      w.scenarioId,
      1,
      { action: "request", reviewers: [reviewer.id] },
      mail,
    );
    expect(await state()).toBe("in_review");
    await saveRevision(db, editor, w.slug, w.scenarioId, {
      baseRevision: 1,
      file: demoFileWith(12000),
    });
    expect(await state()).toBe("draft");
    await changeReview(db, reviewer, w.slug, w.scenarioId, 1, { action: "approve" }, mail);
    expect(await state()).toBe("draft");
    await changeReview(
      db,
      editor,
      w.slug,
      w.scenarioId,
      2,
      { action: "request", reviewers: [reviewer.id] },
      mail,
    );
    await changeReview(db, reviewer, w.slug, w.scenarioId, 2, { action: "request-changes" }, mail);
    expect(await state()).toBe("changes_requested");
    expect((await listScenarios(db, editor, w.slug, { review: "changes_requested" })).total).toBe(
      1,
    );
  });
});
