import { describe, expect, it } from "vitest";

import * as importRoute from "@/app/api/v1/teams/[team]/import/route";
import { TEAM_EXPORT_FORMAT } from "@/lib/server/workspace/export-schema";
import { listComments } from "@/lib/server/workspace/comments";
import { reviewHistory } from "@/lib/server/workspace/review";
import { listScenarios } from "@/lib/server/workspace/scenarios";
import { createTeam } from "@/lib/server/teams/create";
import { importedVerdictText } from "@/lib/shared/imported-names";

import { makeUser, openTestDb, unique } from "../support/db";
import { callRoute, closeAppPoolAfterAll, cookieFor, DEMO_FILE } from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

const T = "2026-01-05T10:00:00.000Z";

/** A file whose one revision was "approved" by `approver`, with a comment by them. */
function forgedFile(approver: { email: string; name: string }) {
  return {
    format: TEAM_EXPORT_FORMAT,
    exportedAt: T,
    team: { name: "Forged", slug: "forged" },
    parameterSets: [],
    scenarios: [
      {
        name: "Plate A",
        materialLabel: "PA6-GF30",
        tags: [],
        createdBy: approver,
        createdAt: T,
        updatedAt: T,
        revisions: [
          {
            number: 1,
            author: approver,
            message: "",
            file: DEMO_FILE,
            createdAt: T,
            review: { state: "approved", by: approver, at: T },
            reviewEvents: [
              { from: "draft", to: "in_review", actor: approver, note: "", at: T },
              { from: "in_review", to: "approved", actor: approver, note: "Signed off", at: T },
            ],
            comments: [
              {
                key: "c1",
                parentKey: null,
                author: approver,
                body: "Checked against the coupons",
                increment: null,
                createdAt: T,
                editedAt: null,
              },
            ],
          },
        ],
      },
    ],
  };
}

async function importAsNewTeam(file: unknown) {
  const importer = await makeUser(db, { name: "Importer" });
  const team = await createTeam(db, importer, { name: unique("Imported") });
  const answer = await callRoute(importRoute.POST, {
    method: "POST",
    params: { team: team.slug },
    cookie: await cookieFor(db, importer),
    body: file,
  });
  return { importer, team, answer };
}

describe("item 2: team import forges sign-off and reveals accounts", () => {
  it("an approval by a non-member is shown as imported text, never as that user's sign-off", async () => {
    // The victim has an account here but was never a member of the importer's team.
    const victim = await makeUser(db, { name: "Head of Testing" });
    const { importer, team, answer } = await importAsNewTeam(
      forgedFile({ email: victim.email, name: victim.name }),
    );
    expect(answer.status).toBe(201);

    const list = await listScenarios(db, importer, team.slug, {});
    const scenarioId = list.items[0].id;
    const review = await reviewHistory(db, importer, team.slug, scenarioId, 1);
    expect(review.revision.review.state).toBe("approved");
    expect(review.revision.review.by).toBeNull();
    expect(review.revision.review.importedBy).toBe("Head of Testing");
    expect(importedVerdictText("approved", review.revision.review.importedBy!)).toMatch(
      /^imported: approved by Head of Testing \(/,
    );
    expect(review.history.map((e) => e.actor)).toEqual([null, null]);
    expect(review.history.map((e) => e.importedActor)).toEqual([
      "Head of Testing",
      "Head of Testing",
    ]);
    // Authorship is not given to a stranger either.
    expect(review.revision.author).toBeNull();
    const comments = await listComments(db, importer, team.slug, scenarioId, 1);
    expect(comments.items[0].author).toBeNull();
    expect(comments.items[0].importedAuthor).toBe("Head of Testing");
  });

  it("the answer is the same whether the named addresses have accounts or not", async () => {
    const known = await makeUser(db, { name: "Known Person" });
    const withAccount = await importAsNewTeam(forgedFile({ email: known.email, name: "X" }));
    const without = await importAsNewTeam(
      forgedFile({ email: `${unique("nobody")}@nowhere.example`, name: "X" }),
    );
    expect(withAccount.answer.status).toBe(201);
    expect(without.answer.body).toEqual(withAccount.answer.body);
    expect(JSON.stringify(withAccount.answer.body)).not.toContain(known.email);
    expect(JSON.stringify(withAccount.answer.body)).not.toContain("@");
  });
});
