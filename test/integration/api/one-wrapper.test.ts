/**
 * Issue 18: one route wrapper, one status per error code. Before, a CSV that did not read
 * answered 400 on a session route and 422 on a token route; the same code now answers the same
 * status whichever wrapper a route uses, and a rate-limited token still says when to come back.
 */
import { describe, expect, it } from "vitest";

import { apiRoute, tokenRoute } from "@/lib/server/http/route";
import { AppError, type ErrorCode } from "@/lib/shared/errors";

import { openTestDb } from "../support/db";
import { callRoute, closeAppPoolAfterAll } from "../support/workspace";

openTestDb();
closeAppPoolAfterAll();

const failing = (code: string) => async () => {
  throw new AppError(code as ErrorCode, "The cell at line 3 is not a number.");
};

describe("the one route wrapper", () => {
  it.each([
    ["invalid:csv", 422],
    ["invalid:file", 422],
    ["invalid:time-budget", 422],
    ["invalid:name", 400],
    ["not-found:scenario", 404],
  ])("%s answers %i from a session route and from a token route alike", async (code, status) => {
    const session = await callRoute(apiRoute(failing(code)), { params: {} });
    const token = await callRoute(tokenRoute("team:read", failing(code)), {
      params: {},
    });
    expect(session.status).toBe(status);
    expect(token.status).toBe(status);
    expect(session.body).toEqual(token.body);
    expect(session.body.error).toMatchObject({ code, message: /line 3/ });
  });

  it("hands the handler the query and no token on a session request", async () => {
    const seen = await callRoute(
      tokenRoute("team:read", async ({ query, token, actor }) => ({
        query,
        token,
        actor,
      })),
      { params: {}, url: "http://app.test/api/v1/x?page=2" },
    );
    expect(seen.status).toBe(200);
    expect(seen.body).toEqual({ query: { page: "2" }, token: null, actor: null });
  });
});
