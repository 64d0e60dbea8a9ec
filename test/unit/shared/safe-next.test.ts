import { describe, expect, it } from "vitest";

import { safeNextPath } from "@/lib/shared/safe-next";

describe("redirect target after sign-in", () => {
  it("keeps same-site paths", () => {
    expect(safeNextPath("/teams/demo/members")).toBe("/teams/demo/members");
    expect(safeNextPath("/invite/abc?x=1")).toBe("/invite/abc?x=1");
  });

  it("falls back for anything that could leave the site", () => {
    for (const value of [
      "https://elsewhere.example",
      "//elsewhere.example",
      "/\\elsewhere.example",
      "teams",
      undefined,
      3,
    ]) {
      expect(safeNextPath(value)).toBe("/teams");
    }
  });
});

describe("security: open redirect after sign-in", () => {
  it.each([
    "/\t/evil.example/phish",
    "/\n/evil.example",
    "/\u0000/x",
    "/\r//evil.example",
    "//evil.example",
    "/\\evil.example",
  ])("refuses %j", (next) => {
    expect(safeNextPath(next)).toBe("/teams");
  });
  it("keeps a same-origin path with its query", () => {
    expect(safeNextPath("/teams/abc?tab=sets")).toBe("/teams/abc?tab=sets");
  });
});
