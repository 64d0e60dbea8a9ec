import { describe, expect, it } from "vitest";

import { ApiError, toApiError } from "@/lib/client/data/api-fetch";
import { saveConflictOf } from "@/lib/client/data/conflict";

describe("reading a 409 on save", () => {
  it("takes who saved the newer revision and when from the error body", () => {
    const error = toApiError(409, {
      error: {
        code: "conflict:revision",
        message: "You started from revision 2, but Rita saved revision 3 since.",
        latest: { number: 3, author: { id: "u", name: "Rita" }, at: "2026-01-02T03:04:05.000Z" },
      },
    });
    expect(saveConflictOf(error, 2)).toEqual({
      base: 2,
      latest: 3,
      author: "Rita",
      at: "2026-01-02T03:04:05.000Z",
      message: "You started from revision 2, but Rita saved revision 3 since.",
    });
  });

  it("is not a conflict for other errors, and survives a missing author", () => {
    expect(saveConflictOf(new ApiError(400, "invalid:file", "bad"), 1)).toBeNull();
    expect(saveConflictOf(new Error("x"), 1)).toBeNull();
    const bare = new ApiError(409, "conflict:revision", "newer", { latest: { number: 5 } });
    expect(saveConflictOf(bare, 4)).toMatchObject({ latest: 5, author: "someone", at: null });
  });

  it("never shows a raw body for unknown error shapes", () => {
    const e = toApiError(502, "<html>proxy</html>");
    expect(e).toMatchObject({ status: 502, code: "http", message: "The server answered 502." });
  });
});
