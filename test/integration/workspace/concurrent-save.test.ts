import { describe, expect, it } from "vitest";

import * as revisionRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/route";
import * as revisionsRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/route";
import { isAppError } from "@/lib/shared/errors";
import { DetailedAppError } from "@/lib/server/workspace/errors";
import { getRevision, listRevisions, saveRevision } from "@/lib/server/workspace/revisions";

import { openTestDb } from "../support/db";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  demoFileWith,
  makeWorld,
} from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

describe("saving from the same base at the same time", () => {
  it("through the HTTP handlers: one 201, one 409 naming the winner; the loser saves after", async () => {
    const w = await makeWorld(db);
    const params = { team: w.slug, scenario: w.scenarioId };
    const [editorCookie, ownerCookie] = [
      await cookieFor(db, w.members.editor),
      await cookieFor(db, w.members.owner),
    ];
    const mine = demoFileWith(12000, { note: "editor's" });
    const theirs = demoFileWith(14000, { note: "owner's" });
    const results = await Promise.all([
      callRoute(revisionsRoute.POST, {
        method: "POST",
        params,
        cookie: editorCookie,
        body: { baseRevision: 1, message: "mine", file: mine },
      }),
      callRoute(revisionsRoute.POST, {
        method: "POST",
        params,
        cookie: ownerCookie,
        body: { baseRevision: 1, message: "theirs", file: theirs },
      }),
    ]);
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([201, 409]);
    const winner = results.find((r) => r.status === 201)!;
    const loser = results.find((r) => r.status === 409)!;
    expect(winner.body.number).toBe(2);
    expect(loser.body.error.code).toBe("conflict:revision");
    expect(loser.body.error.latest.number).toBe(2);
    expect(loser.body.error.latest.author.id).toBe(winner.body.author.id);
    expect(Date.parse(loser.body.error.latest.at)).not.toBeNaN();

    // The loser reviews revision 2, then saves its own content as revision 3.
    const loserIsEditor = loser === results[0];
    const loserFile = loserIsEditor ? mine : theirs;
    const retry = await callRoute(revisionsRoute.POST, {
      method: "POST",
      params,
      cookie: loserIsEditor ? editorCookie : ownerCookie,
      body: { baseRevision: 2, message: "after review", file: loserFile },
    });
    expect(retry.status).toBe(201);
    expect(retry.body.number).toBe(3);
    const two = await callRoute(revisionRoute.GET, {
      params: { ...params, number: "2" },
      cookie: editorCookie,
    });
    const three = await callRoute(revisionRoute.GET, {
      params: { ...params, number: "3" },
      cookie: editorCookie,
    });
    expect([two.body.file, three.body.file]).toEqual(
      loserIsEditor ? [theirs, mine] : [mine, theirs],
    );
  });

  it("eight saves from one base: exactly one lands, seven get 409, nothing is overwritten", async () => {
    const w = await makeWorld(db);
    const saves = Array.from({ length: 8 }, (_, i) =>
      saveRevision(db, i % 2 ? w.members.owner : w.members.editor, w.slug, w.scenarioId, {
        baseRevision: 1,
        message: `attempt ${i}`,
        file: demoFileWith(11000 + i),
      }).then(
        (meta) => ({ ok: true as const, meta }),
        (error: unknown) => ({ ok: false as const, error }),
      ),
    );
    const outcomes = await Promise.all(saves);
    const won = outcomes.filter((o) => o.ok);
    const lost = outcomes.filter((o) => !o.ok);
    expect(won).toHaveLength(1);
    expect(lost).toHaveLength(7);
    for (const o of lost) {
      expect(isAppError(o.error) && o.error.code).toBe("conflict:revision");
      expect((o.error as DetailedAppError).details.latest).toMatchObject({ number: 2 });
    }
    const list = await listRevisions(db, w.members.viewer, w.slug, w.scenarioId);
    expect(list.items.map((r) => r.number)).toEqual([2, 1]);
    const one = await getRevision(db, w.members.viewer, w.slug, w.scenarioId, 1);
    expect((one.file as { parameterSets: { E1: number }[] }).parameterSets[0].E1).toBe(11000);
  });

  it("a base that does not exist yet is a 400 on baseRevision, not a conflict", async () => {
    const w = await makeWorld(db);
    const r = await callRoute(revisionsRoute.POST, {
      method: "POST",
      params: { team: w.slug, scenario: w.scenarioId },
      cookie: await cookieFor(db, w.members.editor),
      body: { baseRevision: 5, file: demoFileWith(12000) },
    });
    expect(r.status).toBe(400);
    expect(r.body.error).toMatchObject({ code: "invalid:baseRevision", path: "baseRevision" });
  });
});
