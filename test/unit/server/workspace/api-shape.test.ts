import { describe, expect, it } from "vitest";

import { readJsonBody } from "@/lib/server/http/body";
import { errorResponse, statusOf } from "@/lib/server/http/respond";
import { AppError } from "@/lib/shared/errors";
import type { CommentView } from "@/db/queries/comments";
import { toThreads } from "@/lib/server/workspace/comment-thread";
import {
  DetailedAppError,
  requireRevisionNumber,
  requireUuid,
} from "@/lib/server/workspace/errors";

describe("HTTP status of each error code", () => {
  it.each([
    ["unauthenticated", 401],
    ["unverified", 403],
    ["invalid:file", 422],
    ["invalid:csv", 422],
    ["invalid:time-budget", 422],
    ["invalid:name", 400],
    ["invalid:too-large", 413],
    ["forbidden:team", 403],
    ["not-found:scenario", 404],
    ["conflict:revision", 409],
    ["rate-limited:share", 429],
  ])("%s → %i", (code, status) => expect(statusOf(code)).toBe(status));

  it("puts details beside code and message, and masks unexpected errors", async () => {
    const conflict = errorResponse(
      new DetailedAppError("conflict:revision", "newer", { latest: { number: 3 } }, "baseRevision"),
    );
    expect(conflict.status).toBe(409);
    expect(await conflict.json()).toEqual({
      error: {
        code: "conflict:revision",
        message: "newer",
        path: "baseRevision",
        latest: { number: 3 },
      },
    });
    const quiet = console.error;
    console.error = () => {};
    const masked = errorResponse(new Error('relation "scenarios" does not exist'));
    console.error = quiet;
    expect(masked.status).toBe(500);
    const body = await masked.json();
    expect(body.error.code).toBe("internal");
    expect(JSON.stringify(body)).not.toContain("relation");
    expect(errorResponse(new AppError("not-found:share", "gone")).status).toBe(404);
  });
});

describe("reading a JSON body", () => {
  const post = (body: BodyInit | null, headers: Record<string, string> = {}) =>
    new Request("http://x.test/", { method: "POST", body, headers });

  it("parses JSON within the limit and refuses the rest with clear codes", async () => {
    expect(await readJsonBody(post('{"a":1}'), 100)).toEqual({ a: 1 });
    await expect(readJsonBody(post("x".repeat(101)), 100)).rejects.toMatchObject({
      code: "invalid:too-large",
    });
    await expect(readJsonBody(post("{}", { "content-length": "5000" }), 100)).rejects.toMatchObject(
      { code: "invalid:too-large" },
    );
    await expect(readJsonBody(post("{oops"), 100)).rejects.toMatchObject({ code: "invalid:json" });
    await expect(readJsonBody(post(null), 100)).rejects.toMatchObject({ code: "invalid:body" });
    expect(await readJsonBody(post(null), 100, { optional: true })).toBeUndefined();
  });

  it("refuses half a surrogate pair, which PostgreSQL cannot store, and names where it is", async () => {
    await expect(readJsonBody(post('{"name":"\\ud800"}'), 100)).rejects.toThrow(
      /in “name”.*broken character/,
    );
    await expect(readJsonBody(post('{"legs":[{"label":"a\\udc00"}]}'), 100)).rejects.toThrow(
      /legs\.1\.label/,
    );
    // A whole pair (an emoji) is ordinary text.
    expect(await readJsonBody(post('{"name":"\\ud83d\\ude00"}'), 100)).toEqual({ name: "😀" });
  });
});

describe("ids from URLs", () => {
  it("accepts UUIDs and plain revision numbers only", () => {
    expect(requireUuid("6F1C2B4A-0000-4000-8000-000000000001", "scenario")).toBe(
      "6f1c2b4a-0000-4000-8000-000000000001",
    );
    for (const bad of ["", "1", "6f1c2b4a-0000-4000-8000-00000000000", null, 5]) {
      expect(() => requireUuid(bad, "scenario")).toThrow(/no such scenario/);
    }
    expect(requireRevisionNumber("12")).toBe(12);
    for (const bad of ["0", "01", "-1", "1e3", "1.0", "9999999999", undefined]) {
      expect(() => requireRevisionNumber(bad)).toThrow(/no such revision/);
    }
  });
});

describe("comment threads", () => {
  const row = (id: string, parentId: string | null): CommentView => ({
    id,
    parentId,
    author: null,
    body: id,
    importedAuthor: null,
    increment: null,
    createdAt: "",
    editedAt: null,
  });
  it("nests replies under their parents in order, keeps orphans at the top", () => {
    const threads = toThreads([
      row("a", null),
      row("b", "a"),
      row("c", "b"),
      row("d", null),
      row("e", "zz"),
    ]);
    expect(threads.map((t) => t.id)).toEqual(["a", "d", "e"]);
    expect(threads[0].replies[0].id).toBe("b");
    expect(threads[0].replies[0].replies[0].id).toBe("c");
  });
});
