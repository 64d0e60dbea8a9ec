import { describe, expect, it } from "vitest";

import * as importRoute from "@/app/api/v1/teams/[team]/import/route";
import * as revisionsRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/route";
import { teams } from "@/db/schema/teams";
import { exportTeam } from "@/lib/server/workspace/export";
import { createTeam } from "@/lib/server/teams/create";
import { runAction } from "@/lib/shared/errors";

import { openTestDb, unique } from "../support/db";
import { callRoute, closeAppPoolAfterAll, cookieFor, makeWorld } from "../support/workspace";

// Issue 12, item 9: odd input that answered 500 or a masked error now gets a clear 400.
const db = openTestDb();
closeAppPoolAfterAll();

describe("item 9: unusual input answers a clear 400, not a 500 or a masked error", () => {
  it("a scenario file nested 5,000 levels deep is refused with where it got too deep", async () => {
    const w = await makeWorld(db);
    const cookie = await cookieFor(db, w.members.editor);
    const deep = `${"[".repeat(5000)}${"]".repeat(5000)}`;
    const r = await callRoute(revisionsRoute.POST, {
      method: "POST",
      params: { team: w.slug, scenario: w.scenarioId },
      cookie,
      headers: { "content-type": "application/json" },
      rawBody: `{"baseRevision":1,"file":${deep}}`,
    });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid:json");
    // Level 65 is the 64th `[` (the outer object is level 1), after the 25 characters of
    // `{"baseRevision":1,"file":`.
    expect(r.body.error.message).toBe(
      "The JSON nests more than 64 levels deep (line 1, column 89); flatten it.",
    );
  });

  it("a revision number 3e9 in an import is refused as a bad file, nothing imported", async () => {
    const w = await makeWorld(db);
    const file = JSON.parse(JSON.stringify(await exportTeam(db, w.members.owner, w.slug)));
    file.scenarios[0].revisions[0].number = 3e9; // past PostgreSQL's integer (2,147,483,647)
    const target = await createTeam(db, w.members.owner, { name: unique("Overflow") });
    const r = await callRoute(importRoute.POST, {
      method: "POST",
      params: { team: target.slug },
      cookie: await cookieFor(db, w.members.owner),
      body: file,
    });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toMatch(/^invalid:/);
    const again = await exportTeam(db, w.members.owner, target.slug);
    expect(again.scenarios).toHaveLength(0);
  });

  it("a NUL byte PostgreSQL refuses in a server action is the user's input error, as in the API", async () => {
    const result = await runAction(() =>
      db.insert(teams).values({ name: "Lab\u0000one", slug: unique("nul") }),
    );
    expect(result).toEqual({
      ok: false,
      code: "invalid:text",
      message: "The request contains a character that cannot be stored (a NUL byte).",
    });
  });
});
