import { describe, expect, it } from "vitest";
import { formatPathText } from "@/lib/scenario/path-text/format-path-text";
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import {
  appendLeg,
  appendRepeat,
  moveItem,
  removeLeg,
  setComponent,
  updateLeg,
} from "@/lib/client/loading-desk/path-doc-edit";

function doc(text: string) {
  const r = parsePathText(text);
  if (!r.ok) throw new Error("parse");
  return r.doc;
}

describe("table edits of the path object", () => {
  const start = doc("ε11=0.01 over 10\nrepeat 2 grow 1\n  ε11=0.002 over 5\n  σ11=0 over 5\nend");

  it("changes one component of a leg inside a block", () => {
    const d = updateLeg(start, { item: 1, leg: 0 }, (l) => setComponent(l, 1, "strain", 0.003));
    expect(formatPathText(d)).toContain("  ε11=0.002 ε22=0.003 over 5");
    expect(formatPathText(start)).not.toContain("e22");
  });

  it("moves, removes and appends", () => {
    expect(formatPathText(moveItem(start, 0, 1)).split("\n")[0]).toBe("repeat 2 grow 1");
    expect(moveItem(start, 0, -1)).toBe(start);
    expect(formatPathText(removeLeg(start, { item: 1, leg: 1 }))).toBe(
      "ε11=0.01 over 10\nrepeat 2 grow 1\n  ε11=0.002 over 5\nend",
    );
    expect(
      removeLeg(removeLeg(start, { item: 1, leg: 1 }), { item: 1, leg: 0 }).items,
    ).toHaveLength(1);
    expect(appendLeg(start, 1).items[1]).toMatchObject({ block: { legs: { length: 3 } } });
    expect(appendLeg(start, null).items).toHaveLength(3);
    expect(parsePathText(formatPathText(appendRepeat(start))).ok).toBe(true);
  });
});
