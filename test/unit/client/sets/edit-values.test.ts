import { describe, expect, it } from "vitest";

import { PRESETS } from "@/lib/client/loading-desk/presets";
import { checkDraft, draftOf } from "@/lib/client/sets/edit-values";

const stored = { ...PRESETS[0].params } as Record<string, unknown>;

describe("the library page's value editor", () => {
  it("sends the stored values with the typed numbers in", () => {
    const draft = { ...draftOf(stored), Y0_1: "0.04" };
    const checked = checkDraft(stored, draft);
    expect(checked).toEqual({ ok: true, values: { ...stored, Y0_1: 0.04 } });
  });

  it("names the field by its label when a number is missing or out of range", () => {
    const checked = checkDraft(stored, { ...draftOf(stored), E1: "", b: "2" });
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.errors.E1).toMatch(/^E1 \(.+\): give a number\.$/);
    expect(checked.errors.b).toBeUndefined(); // numbers are checked against the law once all are given
    const range = checkDraft(stored, { ...draftOf(stored), b: "2" });
    expect(range.ok).toBe(false);
    if (!range.ok) expect(range.errors.b).toMatch(/^b \(.+\): /);
  });
});
