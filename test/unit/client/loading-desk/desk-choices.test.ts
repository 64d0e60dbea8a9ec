import { describe, expect, it } from "vitest";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import { deskFileOf, differsFromSaved } from "@/lib/client/loading-desk/kept-draft";
import { initModel, loadingDeskReducer } from "@/lib/client/loading-desk/loading-desk-reducer";
import {
  chartsOnThisDesk,
  fromScenario,
  type LoadingDeskState,
  toScenarioFile,
} from "@/lib/client/loading-desk/scenario-state";
import { setListReducer } from "@/lib/client/loading-desk/set-list";
import { decodeState, encodeState } from "@/lib/client/loading-desk/url-state";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";

const RECORD = "0b8f5a52-8c1e-4c43-9d4e-1f2a3b4c5d6e";

function state(): LoadingDeskState {
  return {
    name: "Plate — choices",
    entries: setListReducer([], { type: "add", params: PRESETS[0].params }),
    pathText: "ε11=1% over 50\nσ11=0 over 50",
    overlays: [{ recordId: RECORD, name: "T-03 tension" }],
    charts: {
      stressStrain: { stress: "sig22", strain: "eps22" },
      horizontal: { damage: "sig11", energy: "eps11" },
    },
  };
}

function fileOf(s: LoadingDeskState) {
  const model = initModel(s);
  return toScenarioFile(model, model.doc);
}

function reopen(json: unknown) {
  const parsed = parseScenarioFile(json);
  if (!parsed.ok) throw new Error(parsed.errors.join("; "));
  return fromScenario(parsed.scenario, json);
}

describe("test records and chart choices in the desk's file", () => {
  it("are written to the desk field and read back from it", () => {
    const json: unknown = JSON.parse(JSON.stringify(fileOf(state())));
    const back = reopen(json);
    expect(back.overlays).toEqual(state().overlays);
    expect(back.charts).toEqual(state().charts);
  });

  it("open a file written before they were kept with no records and each chart's own axes", () => {
    const json = JSON.parse(JSON.stringify(fileOf(state())));
    delete json.desk.overlays;
    delete json.desk.charts;
    const back = reopen(json);
    expect(back.overlays).toEqual([]);
    expect(back.charts).toEqual({
      stressStrain: { stress: "sig11", strain: "eps11" },
      horizontal: {},
    });
  });

  it("drop a chart this desk does not have and an axis a chart does not offer", () => {
    // The energy chart offers strains and the increment only (chart-defs.ts), not a stress.
    expect(
      chartsOnThisDesk({
        stressStrain: { stress: "sig11", strain: "eps11" },
        horizontal: { energy: "sig12", gone: "eps11", force: "damage", damage: "gam12" },
      }).horizontal,
    ).toEqual({ damage: "gam12" });
  });

  it("travel in the sandbox link", () => {
    const decoded = decodeState(encodeState(fileOf(state())));
    if (!decoded.ok) throw new Error(decoded.errors.join("; "));
    expect(fromScenario(decoded.scenario).charts).toEqual(state().charts);
  });

  it("count as an unsaved change, and opening the revision as saved does not", () => {
    const saved = JSON.parse(JSON.stringify(fileOf(state())));
    const parsed = parseScenarioFile(saved);
    if (!parsed.ok) throw new Error("parse");
    const opened = { ...parsed.scenario, desk: saved.desk };
    const baseline = deskFileOf(opened);
    const model = initModel(fromScenario(opened, opened));
    expect(differsFromSaved(toScenarioFile(model, model.doc), baseline)).toBe(false);
    const moved = loadingDeskReducer(model, {
      type: "charts",
      charts: { ...model.charts, horizontal: { damage: "increment" } },
    });
    expect(differsFromSaved(toScenarioFile(moved, moved.doc), baseline)).toBe(true);
    const fewer = loadingDeskReducer(model, { type: "overlays", overlays: [] });
    expect(differsFromSaved(toScenarioFile(fewer, fewer.doc), baseline)).toBe(true);
  });
});
