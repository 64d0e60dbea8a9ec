import { beforeAll, describe, expect, it } from "vitest";

import * as scenariosRoute from "@/app/api/v1/teams/[team]/scenarios/route";
import { memberships } from "@/db/schema/teams";
import { requestPasswordReset, resetPassword } from "@/lib/server/accounts/password-reset";
import { leaveTeam, removeMember } from "@/lib/server/teams/members";

import { openTestDb, queuedMailTo, recordingMailer, tokenFromLink, unique } from "../support/db";
import { closeAppPoolAfterAll, callRoute, makeWorld, type World } from "../support/workspace";
import { bearer, tokenFor } from "./support";

const db = openTestDb();
closeAppPoolAfterAll();

let w: World;
beforeAll(async () => {
  w = await makeWorld(db);
});

const listWith = (token: string) =>
  callRoute(scenariosRoute.GET, { params: { team: w.slug }, headers: bearer(token) });

describe("security: credentials that outlive their reason", () => {
  it("a password reset revokes the account's API tokens", async () => {
    const { token } = await tokenFor(db, w.members.viewer, w.slug, "viewer");
    expect((await listWith(token)).status).toBe(200);
    const mail = recordingMailer();
    await requestPasswordReset(db, { email: w.members.viewer.email }, unique("ip"), mail);
    const link = tokenFromLink((await queuedMailTo(db, w.members.viewer.email)).at(-1), "/reset");
    await resetPassword(db, {
      token: link,
      password: "a brand new password",
      confirm: "a brand new password",
    });
    expect((await listWith(token)).status).toBe(401);
  });

  it("a removed member's token stays dead when they are invited back", async () => {
    const { token } = await tokenFor(db, w.members.editor, w.slug, "editor");
    expect((await listWith(token)).status).toBe(200);
    await removeMember(db, w.members.owner, { teamSlug: w.slug, userId: w.members.editor.id });
    // Back in the team (as an accepted invitation would do): the old token must not work again.
    await db
      .insert(memberships)
      .values({ teamId: w.teamId, userId: w.members.editor.id, role: "editor" });
    expect((await listWith(token)).status).toBe(401);
  });

  it("leaving a team revokes the tokens bound to it", async () => {
    const { token } = await tokenFor(db, w.members.reviewer, w.slug, "reviewer");
    await leaveTeam(db, w.members.reviewer, { teamSlug: w.slug });
    await db
      .insert(memberships)
      .values({ teamId: w.teamId, userId: w.members.reviewer.id, role: "reviewer" });
    expect((await listWith(token)).status).toBe(401);
  });
});
