import { afterEach, describe, expect, it, vi } from "vitest";

import { apiFetch, ApiError, messageOf, OFFLINE_MESSAGE } from "@/lib/client/data/api-fetch";
import { teamApi, teamPages } from "@/lib/client/data/api-urls";

afterEach(() => vi.unstubAllGlobals());

describe("apiFetch", () => {
  it("sends JSON and returns the typed body", async () => {
    const fetchMock = vi.fn(async () => Response.json({ ok: 1 }, { status: 201 }));
    vi.stubGlobal("fetch", fetchMock);
    await expect(apiFetch("/x", { method: "POST", body: { a: 1 } })).resolves.toEqual({ ok: 1 });
    expect(fetchMock).toHaveBeenCalledWith(
      "/x",
      expect.objectContaining({
        method: "POST",
        body: '{"a":1}',
        headers: { "content-type": "application/json" },
      }),
    );
  });

  it("turns the API's error body into an ApiError with its details", async () => {
    vi.stubGlobal("fetch", async () =>
      Response.json(
        { error: { code: "conflict:revision", message: "newer", latest: { number: 3 } } },
        { status: 409 },
      ),
    );
    const error = await apiFetch("/x").catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 409,
      code: "conflict:revision",
      details: { latest: { number: 3 } },
    });
    expect(messageOf(error)).toBe("newer");
  });

  it("says the server was unreachable when the network fails", async () => {
    vi.stubGlobal("fetch", async () => {
      throw new TypeError("Failed to fetch");
    });
    const error = await apiFetch("/x").catch((e: unknown) => e);
    expect(error).toMatchObject({ status: 0, code: "offline", message: OFFLINE_MESSAGE });
  });
});

describe("addresses", () => {
  it("escapes slugs and ids and leaves default parameters out of page links", () => {
    expect(teamApi("a b").comments("s/1", 2)).toBe(
      "/api/v1/teams/a%20b/scenarios/s%2F1/revisions/2/comments",
    );
    expect(teamApi("lab").diff("s", 1, 3)).toBe("/api/v1/teams/lab/scenarios/s/diff?from=1&to=3");
    expect(teamPages("lab").scenario("s", { rev: undefined, overlay: 2 })).toBe(
      "/teams/lab/scenarios/s?overlay=2",
    );
  });
});
