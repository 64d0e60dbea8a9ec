import { describe, expect, it } from "vitest";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import { setListReducer } from "@/lib/client/loading-desk/set-list";
import { initModel, loadingDeskReducer } from "@/lib/client/loading-desk/loading-desk-reducer";

const entries = setListReducer([], { type: "add", params: PRESETS[0].params });
const model = initModel({ name: "x", entries, pathText: "ε11=1% over 10" });

describe("loading desk state", () => {
  it("keeps the last valid path while the text has an error, and reports where", () => {
    const bad = loadingDeskReducer(model, { type: "pathText", text: "ε11=1% over 10\nq in 3" });
    expect(bad.pathErrors[0]).toMatchObject({ line: 2, column: 1 });
    expect(bad.doc).toBe(model.doc);
    const good = loadingDeskReducer(bad, { type: "pathText", text: "ε11=2% over 10" });
    expect(good.pathErrors).toEqual([]);
    expect(good.doc.items[0]).toMatchObject({ kind: "leg", leg: { target: [0.02, 0, 0] } });
  });

  it("writes the text again when the table edits the path object", () => {
    const doc = {
      items: [
        {
          kind: "leg" as const,
          leg: {
            control: ["stress", "strain", "stress"] as const,
            target: [5, 0.001, 0],
            increments: 4,
          },
        },
      ],
    };
    const m = loadingDeskReducer(model, { type: "pathDoc", doc: JSON.parse(JSON.stringify(doc)) });
    expect(m.pathText).toBe("σ11=5 ε22=0.001 over 4");
  });

  it("selects a new set and falls back when the active one is removed", () => {
    const two = loadingDeskReducer(model, { type: "sets", action: { type: "duplicate", id: "A" } });
    expect(two.activeId).toBe("B");
    const back = loadingDeskReducer(two, { type: "sets", action: { type: "remove", id: "B" } });
    expect(back.activeId).toBe("A");
  });

  it("bumps the epoch when the whole state is replaced", () => {
    const m = loadingDeskReducer(model, {
      type: "replace",
      state: { name: "y", entries, pathText: "γ12=1% over 5" },
    });
    expect(m.epoch).toBe(1);
    expect(m.name).toBe("y");
  });
});
