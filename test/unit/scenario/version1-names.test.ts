import { describe, expect, it } from "vitest";

import { RESULT_COLUMNS } from "@/lib/mechanics/types";
import { CSV_HEADER } from "@/lib/scenario/results-csv";
import { runStatusOnRead, VERSION1_COLUMN_NAMES } from "@/lib/scenario/version1-names";

describe("version 1 names (step, stoppedAtStep) read as increment, stoppedAtIncrement", () => {
  it("the contract's header starts increment,leg, and no longer has a step column", () => {
    expect(CSV_HEADER.startsWith("increment,leg,")).toBe(true);
    expect(RESULT_COLUMNS).not.toContain("step");
  });

  it("maps the old column name onto a current one", () => {
    expect(VERSION1_COLUMN_NAMES.step).toBe("increment");
    expect(RESULT_COLUMNS).toContain(VERSION1_COLUMN_NAMES.step);
  });

  it("reads a stored status of either version", () => {
    const old = { failed: true, failMode: "limit load", stoppedAtStep: 106, warnings: [] };
    expect(runStatusOnRead(old)).toEqual({
      failed: true,
      failMode: "limit load",
      stoppedAtIncrement: 106,
      warnings: [],
    });
    const current = { failed: true, failMode: "dcrit axis 1", stoppedAtIncrement: 7, warnings: [] };
    expect(runStatusOnRead(current)).toEqual(current);
    const none = { failed: false, failMode: null, stoppedAtIncrement: null, warnings: [] };
    expect(runStatusOnRead(none)).toEqual(none);
    expect(runStatusOnRead(null)).toBeNull();
  });
});
