import LZString from "lz-string";
import { describe, expect, it } from "vitest";
import { expandPathDoc } from "@/lib/scenario/path-text/path-doc";
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import { expandCycles } from "@/lib/scenario/cycle-generator";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import { repeatToGenerator } from "@/lib/client/loading-desk/repeat-to-generator";
import {
  fromScenario,
  toScenarioFile,
  type LoadingDeskState,
} from "@/lib/client/loading-desk/scenario-state";
import { setListReducer } from "@/lib/client/loading-desk/set-list";
import { templateByKey } from "@/lib/client/loading-desk/templates";
import { decodeState, encodeState, readHash } from "@/lib/client/loading-desk/url-state";

function doc(text: string) {
  const r = parsePathText(text);
  if (!r.ok) throw new Error("parse");
  return r.doc;
}

function state(text: string): LoadingDeskState {
  let entries = setListReducer([], { type: "add", params: PRESETS[0].params });
  entries = setListReducer(entries, { type: "add", params: PRESETS[1].params });
  entries = setListReducer(entries, { type: "toggle", id: "B" });
  return { name: "Plate — cycles", entries, pathText: text };
}

describe("scenario file of the loading desk", () => {
  const text = templateByKey("growing-cycles")!.text;

  it("is a valid scenario file whose legs are the expanded path", () => {
    const file = toScenarioFile(state(text), doc(text));
    const parsed = parseScenarioFile(JSON.parse(JSON.stringify(file)));
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(parsed.scenario.path.legs).toEqual(expandPathDoc(doc(text)));
  });

  it("stores a growing cycle block as a generator that expands to the same legs", () => {
    const file = toScenarioFile(state(text), doc(text));
    expect(file.path.generators).toHaveLength(1);
    expect(expandCycles(file.path.generators[0])).toEqual(file.path.legs);
  });

  it("keeps no generator for blocks of another shape", () => {
    const block = doc("repeat 2 grow 1\n ε11=0.01 ε22=0.01 over 5\n σ11=0 over 5\nend").items[0];
    expect(block.kind === "repeat" && repeatToGenerator(block.block)).toBeNull();
  });

  it("reads back its own file: sets, hidden flags and the path text", () => {
    const original = state(text);
    const json = JSON.parse(JSON.stringify(toScenarioFile(original, doc(text))));
    const parsed = parseScenarioFile(json);
    if (!parsed.ok) throw new Error(parsed.errors.join("; "));
    const back = fromScenario(parsed.scenario, json);
    expect(back.pathText).toBe(text);
    expect(back.name).toBe(original.name);
    expect(back.entries.map((e) => [e.set.id, e.visible])).toEqual([
      ["A", true],
      ["B", false],
    ]);
    expect(back.entries[1].set).toEqual(original.entries[1].set);
  });

  it("writes the legs as text when the stored text no longer matches them", () => {
    const json = JSON.parse(JSON.stringify(toScenarioFile(state(text), doc(text))));
    json.desk.pathText = "ε11=0.5% over 10";
    const parsed = parseScenarioFile(json);
    if (!parsed.ok) throw new Error("parse");
    const back = fromScenario(parsed.scenario, json);
    expect(expandPathDoc(doc(back.pathText))).toEqual(parsed.scenario.path.legs);
  });
});

describe("URL state", () => {
  it("round-trips through the address", () => {
    const text = templateByKey("tension-unload-compression")!.text;
    const encoded = encodeState(toScenarioFile(state(text), doc(text)));
    expect(readHash(`#s=${encoded}`)).toBe(encoded);
    const back = decodeState(encoded);
    if (!back.ok) throw new Error(back.errors.join("; "));
    expect(fromScenario(back.scenario).pathText).toBe(text);
    expect(back.scenario.parameterSets.map((s) => s.id)).toEqual(["A", "B"]);
  });

  it("says what is wrong with a damaged or invalid link", () => {
    expect(decodeState("garbage!!")).toMatchObject({ ok: false });
    const bad = LZString.compressToEncodedURIComponent(
      JSON.stringify({
        format: "craquelure.scenario/1",
        parameterSets: [{ E1: "x" }],
        path: { legs: [] },
      }),
    );
    const r = decodeState(bad);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.join("\n")).toMatch(/parameterSets\[0\]\.E1/);
  });
});
