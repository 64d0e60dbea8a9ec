import { describe, expect, it } from "vitest";

import { isUuid } from "@/lib/shared/uuid";

describe("isUuid", () => {
  it("accepts the ids PostgreSQL's gen_random_uuid issues, in either case", () => {
    expect(isUuid("3f2b8c1e-5a6d-4e7f-9a0b-1c2d3e4f5a6b")).toBe(true);
    expect(isUuid("3F2B8C1E-5A6D-4E7F-9A0B-1C2D3E4F5A6B")).toBe(true);
  });

  it("refuses what a forged URL carries, so the database is never asked", () => {
    for (const forged of [
      "",
      "1",
      "3f2b8c1e5a6d4e7f9a0b1c2d3e4f5a6b",
      "3f2b8c1e-5a6d-4e7f-9a0b-1c2d3e4f5a6b\n",
      "' or 1=1 --",
      "../etc",
    ]) {
      expect(isUuid(forged)).toBe(false);
    }
    expect(isUuid(42)).toBe(false);
    expect(isUuid(null)).toBe(false);
  });
});
