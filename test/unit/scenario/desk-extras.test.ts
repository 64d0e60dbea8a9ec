import { describe, expect, it } from "vitest";
import {
  DEFAULT_DESK_CHARTS,
  MAX_DESK_OVERLAYS,
  readDeskCharts,
  readDeskExtras,
  readDeskOverlays,
} from "@/lib/scenario/desk-extras";

const ID_A = "0b8f5a52-8c1e-4c43-9d4e-1f2a3b4c5d6e";
const ID_B = "7d1c2e3f-4a5b-4c6d-8e7f-9a0b1c2d3e4f";

describe("the desk field of a scenario file", () => {
  it("is read under its current name and under the old one", () => {
    expect(readDeskExtras({ desk: { pathText: "x" } })).toEqual({ pathText: "x" });
    expect(readDeskExtras({ workbench: { pathText: "y" } })).toEqual({ pathText: "y" });
    expect(readDeskExtras(null)).toBeUndefined();
  });
});

describe("test records kept with a revision", () => {
  it("keeps record ids with their names, in the order chosen", () => {
    const extras = {
      overlays: [
        { recordId: ID_B, name: "  T-03 tension  " },
        { recordId: ID_A, name: "S-01" },
      ],
    };
    expect(readDeskOverlays(extras)).toEqual([
      { recordId: ID_B, name: "T-03 tension" },
      { recordId: ID_A, name: "S-01" },
    ]);
  });

  it("drops entries that are not a record id, repeats, and anything not a list", () => {
    const extras = {
      overlays: [
        { recordId: "r1", name: "not an id" },
        { recordId: 42 },
        null,
        "text",
        { recordId: ID_A.toUpperCase(), name: 7 },
        { recordId: ID_A, name: "again" },
      ],
    };
    expect(readDeskOverlays(extras)).toEqual([{ recordId: ID_A, name: "" }]);
    expect(readDeskOverlays({ overlays: { recordId: ID_A } })).toEqual([]);
    expect(readDeskOverlays(undefined)).toEqual([]);
    expect(readDeskOverlays("desk")).toEqual([]);
  });

  it("cuts an overlong list instead of refusing the file", () => {
    const hex = (k: number) => k.toString(16).padStart(12, "0");
    const overlays = Array.from({ length: MAX_DESK_OVERLAYS + 5 }, (_, k) => ({
      recordId: `0b8f5a52-8c1e-4c43-9d4e-${hex(k)}`,
      name: `R${k}`,
    }));
    const read = readDeskOverlays({ overlays });
    expect(read).toHaveLength(MAX_DESK_OVERLAYS);
    expect(read[0].name).toBe("R0");
  });
});

describe("chart choices kept with a revision", () => {
  it("reads the stress–strain pair and the horizontal axes", () => {
    const extras = {
      charts: {
        stressStrain: { stress: "sig12", strain: "gam12" },
        horizontal: { damage: "sig11", force: "eps22" },
      },
    };
    expect(readDeskCharts(extras)).toEqual({
      stressStrain: { stress: "sig12", strain: "gam12" },
      horizontal: { damage: "sig11", force: "eps22" },
    });
  });

  it("falls back to σ11 against ε11 for an unknown or missing component", () => {
    expect(
      readDeskCharts({ charts: { stressStrain: { stress: "S11", strain: "eps22" } } }),
    ).toEqual({ stressStrain: { stress: "sig11", strain: "eps22" }, horizontal: {} });
    expect(readDeskCharts({})).toEqual(DEFAULT_DESK_CHARTS);
    expect(readDeskCharts({ charts: [1, 2] })).toEqual(DEFAULT_DESK_CHARTS);
  });

  it("drops horizontal axes that are not a known quantity or under a strange key", () => {
    // As JSON.parse gives it: "__proto__" arrives as an own key of the object.
    const extras: unknown = JSON.parse(
      '{"charts":{"horizontal":{"damage":"time","force":3,"energy":"gam12",' +
        '"Not A Key":"eps11","__proto__":"eps11"}}}',
    );
    expect(readDeskCharts(extras).horizontal).toEqual({
      energy: "gam12",
    });
  });
});
