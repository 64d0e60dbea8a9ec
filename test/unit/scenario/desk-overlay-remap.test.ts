import { describe, expect, it } from "vitest";

import { droppedOverlayNote, remapDeskOverlays } from "@/lib/scenario/desk-overlay-remap";

// Issue 13 items 7 and 8: a team import gives test records new ids; the overlays a revision
// draws must follow them, and an overlay of a record the file does not carry is left out.

const OLD_A = "0b8f5a52-8c1e-4c43-9d4e-1f2a3b4c5d6e";
const OLD_B = "1c9f6b63-9d2f-4d54-8e5f-2a3b4c5d6e7f";
const GONE = "2daf7c74-ae30-4e65-9f60-3b4c5d6e7f80";
const NEW_A = "3ebf8d85-bf41-4f76-8a71-4c5d6e7f8091";
const NEW_B = "4fc09e96-c052-4087-9b82-5d6e7f8091a2";
const MAP = new Map([
  [OLD_A, NEW_A],
  [OLD_B, NEW_B],
]);

describe("remapDeskOverlays", () => {
  it("rewrites each overlay to its record's new id, keeps the order and the rest of the desk", () => {
    const file = {
      parameterSets: [],
      desk: {
        pathText: "tension",
        hidden: ["B"],
        overlays: [
          { recordId: OLD_B, name: "T-02" },
          { recordId: OLD_A.toUpperCase(), name: "T-01" },
        ],
        charts: { stressStrain: { stress: "sig12", strain: "gam12" } },
      },
    };
    const out = remapDeskOverlays(file, MAP);
    expect(out.dropped).toEqual([]);
    expect(out.file).toEqual({
      parameterSets: [],
      desk: {
        pathText: "tension",
        hidden: ["B"],
        overlays: [
          { recordId: NEW_B, name: "T-02" },
          { recordId: NEW_A, name: "T-01" },
        ],
        charts: { stressStrain: { stress: "sig12", strain: "gam12" } },
      },
    });
    // The input is not changed in place.
    expect(file.desk.overlays[0].recordId).toBe(OLD_B);
  });

  it("drops an overlay whose record is not in the file and says which", () => {
    const file = {
      desk: {
        overlays: [
          { recordId: GONE, name: "T-09 deleted" },
          { recordId: OLD_A, name: "T-01" },
        ],
      },
    };
    const out = remapDeskOverlays(file, MAP);
    expect(out.file.desk).toEqual({ overlays: [{ recordId: NEW_A, name: "T-01" }] });
    expect(out.dropped).toEqual([{ recordId: GONE, name: "T-09 deleted" }]);
    expect(droppedOverlayNote("Plate rib", 2, out.dropped[0])).toBe(
      "Revision 2 of 'Plate rib' drew 'T-09 deleted' over its charts; that record is not in the file, so the overlay is left out.",
    );
  });

  it("rewrites the old field name in place and leaves files without overlays as they are", () => {
    const old = { workbench: { overlays: [{ recordId: OLD_A, name: "" }] } };
    expect(remapDeskOverlays(old, MAP).file).toEqual({
      workbench: { overlays: [{ recordId: NEW_A, name: "" }] },
    });
    const plain = { desk: { pathText: "x" } };
    expect(remapDeskOverlays(plain, MAP).file).toBe(plain);
    const none = { parameterSets: [] };
    expect(remapDeskOverlays(none, MAP)).toEqual({ file: none, dropped: [] });
  });

  it("with no records in the file every overlay is dropped", () => {
    const out = remapDeskOverlays(
      { desk: { overlays: [{ recordId: OLD_A, name: "T-01" }] } },
      new Map(),
    );
    expect(out.file).toEqual({ desk: { overlays: [] } });
    expect(out.dropped).toHaveLength(1);
    expect(droppedOverlayNote("Clip", 1, { recordId: OLD_A, name: "" })).toMatch(
      /^Revision 1 of 'Clip' drew a test record over/,
    );
  });
});
