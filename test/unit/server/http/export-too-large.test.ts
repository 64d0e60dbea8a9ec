import { describe, expect, it } from "vitest";

import { BODY_LIMITS, exportTooLargeMessage } from "@/lib/server/http/body-limits";

// Issue 13 item 8: with the test records' original files in it, a team export can outgrow what
// the import route reads; the export then says so, with both sizes, instead of handing out a file
// that cannot come back.

describe("exportTooLargeMessage", () => {
  it("lets an export up to the import's limit through", () => {
    expect(exportTooLargeMessage(BODY_LIMITS.teamImport)).toBeNull();
    expect(exportTooLargeMessage(1024)).toBeNull();
  });

  it("states the export's size and the import's limit when it is larger", () => {
    expect(BODY_LIMITS.teamImport).toBe(64 * 1024 * 1024);
    expect(exportTooLargeMessage(70 * 1024 * 1024)).toBe(
      "The team export would be 70 MB, and an import takes at most 64 MB, so it could not be imported again. Delete test records that are no longer needed (their original files weigh most) and export again.",
    );
    expect(exportTooLargeMessage(4096, 2048)).toMatch(
      /would be 4 KB, and an import takes at most 2 KB/,
    );
  });
});
