import { describe, expect, it } from "vitest";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { diffSets } from "@/lib/client/loading-desk/set-diff";
import { entriesFromSets, setListReducer, type SetEntry } from "@/lib/client/loading-desk/set-list";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import { SET_COLORS } from "@/lib/client/loading-desk/set-colors";

const base = PRESETS[0].params;
const start = setListReducer([], { type: "add", params: base });

describe("parameter set list", () => {
  it("adds up to six sets with ids A… and distinct colours", () => {
    let list: SetEntry[] = start;
    for (let k = 0; k < 8; k++) list = setListReducer(list, { type: "add", params: base });
    expect(list.map((e) => e.set.id)).toEqual(["A", "B", "C", "D", "E", "F"]);
    expect(new Set(list.map((e) => e.color)).size).toBe(6);
  });

  it("duplicates, renames, hides and removes, never below one set", () => {
    let list = setListReducer(start, { type: "duplicate", id: "A" });
    expect(list[1].set.label).toBe(`${base.label} (copy)`);
    expect(list[1].set.E1).toBe(base.E1);
    list = setListReducer(list, { type: "rename", id: "B", label: "stiffer" });
    list = setListReducer(list, { type: "toggle", id: "A" });
    expect(list.map((e) => [e.set.label, e.visible])).toEqual([
      [base.label, false],
      ["stiffer", true],
    ]);
    list = setListReducer(list, { type: "remove", id: "A" });
    expect(list.map((e) => e.set.id)).toEqual(["B"]);
    expect(setListReducer(list, { type: "remove", id: "B" })).toHaveLength(1);
  });

  it("reuses a freed id and colour", () => {
    let list = setListReducer(start, { type: "add", params: base });
    list = setListReducer(list, { type: "remove", id: "A" });
    list = setListReducer(list, { type: "add", params: base });
    expect(list.map((e) => e.set.id).sort()).toEqual(["A", "B"]);
    expect(list[1].color).toBe(SET_COLORS[0]);
  });

  it("updates values while keeping the id", () => {
    const list = setListReducer(start, { type: "update", id: "A", set: { ...base, Y0_1: 0.07 } });
    expect(list[0].set).toMatchObject({ id: "A", Y0_1: 0.07 });
  });

  it("builds entries from imported sets with hidden ones", () => {
    const sets = [
      { ...base, id: "A" },
      { ...base, id: "B" },
    ] as ParameterSet[];
    expect(entriesFromSets(sets, ["B"]).map((e) => e.visible)).toEqual([true, false]);
  });
});

describe("diff of two sets", () => {
  it("flags only the fields that differ, with the relative change", () => {
    const a = { ...base, id: "A" } as ParameterSet;
    const b = { ...base, id: "B", Y0_1: 0.06, law: "linY" } as ParameterSet;
    const rows = diffSets(a, b).filter((r) => r.differs);
    expect(rows.map((r) => r.symbol)).toEqual(["Y0_1", "law"]);
    expect(rows[0].relative).toBeCloseTo(0.2, 12);
    expect(rows[1].relative).toBeNull();
    // choices in the desk's words, not the file's codes (issue 16)
    expect(rows[1].left).toBe("d linear in √Ȳ");
    expect(rows[1].right).toBe("d linear in Ȳ");
  });

  it("shows numbers to the desk's six significant digits, flagging a difference beyond them", () => {
    const a = { ...base, id: "A", E1: 10994.028523930534 } as ParameterSet;
    const b = { ...base, id: "B", E1: 10994.028523930534 + 1e-9 } as ParameterSet;
    const row = diffSets(a, b).find((r) => r.symbol === "E1")!;
    expect(row.left).toBe("10994");
    expect(row.differs).toBe(true);
    expect(row.label).toBe("Young's modulus, axis 1");
  });
});
