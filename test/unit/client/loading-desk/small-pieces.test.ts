import { describe, expect, it } from "vitest";
import { RESULT_COLUMNS, type ResultColumns } from "@/lib/mechanics/types";
import { expandPathDoc } from "@/lib/scenario/path-text/path-doc";
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";
import {
  chartImageName,
  provenanceName,
  resultsCsvName,
  scenarioFileName,
  slug,
} from "@/lib/client/loading-desk/file-names";
import { findMarks } from "@/lib/client/loading-desk/marks";
import { E, S, leg, run } from "../../mechanics/helpers";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import { ResultBuffer, sliceChunk } from "@/lib/client/loading-desk/result-buffer";
import { rowsToTsv } from "@/lib/client/loading-desk/selection-text";
import { PATH_TEMPLATES, templateByKey } from "@/lib/client/loading-desk/templates";

function columns(rows: number, fill: (name: string, i: number) => number): ResultColumns {
  const c = {} as ResultColumns;
  for (const name of RESULT_COLUMNS)
    c[name] = Float64Array.from({ length: rows }, (_, i) => fill(name, i));
  return c;
}

describe("templates and presets", () => {
  it("every template parses", () => {
    for (const t of PATH_TEMPLATES) expect(parsePathText(t.text).ok, t.key).toBe(true);
  });

  it("the growing cycles template peaks at 0.2 % … 1.4 % (spec D.18)", () => {
    const r = parsePathText(templateByKey("growing-cycles")!.text);
    if (!r.ok) throw new Error("parse");
    const peaks = expandPathDoc(r.doc)
      .filter((l) => l.control[0] === "strain")
      .map((l) => l.target[0]);
    expect(peaks.map((p) => Math.round(p * 1e6) / 1e6)).toEqual([
      0.002, 0.004, 0.006, 0.008, 0.01, 0.012, 0.014,
    ]);
  });

  it("every preset passes the parameter-set schema", () => {
    for (const p of PRESETS)
      expect(parameterSetSchema.safeParse(p.params).success, p.key).toBe(true);
  });
});

describe("result buffer", () => {
  it("assembles chunks in order and refuses a gap", () => {
    const src = columns(10, (name, i) => (name === "increment" ? i : i * 2));
    const buf = new ResultBuffer(10);
    buf.append(sliceChunk(src, 0, 4));
    buf.append(sliceChunk(src, 4, 6));
    expect(buf.rows).toBe(10);
    expect(Array.from(buf.columns.increment)).toEqual(Array.from(src.increment));
    expect(() => buf.append(sliceChunk(src, 2, 1))).toThrow(/expected 10/);
    expect(buf.done).toBe(false);
    buf.finish({ failed: false, failMode: null, stoppedAtIncrement: null, warnings: [] });
    expect(buf.done).toBe(true);
  });
});

describe("marks", () => {
  it("finds damage onset, peak |stress| and failure", () => {
    const c = columns(6, (name, i) => {
      if (name === "d1") return i >= 2 ? 0.1 * i : 0;
      if (name === "sig11") return [0, 10, 20, 25, -30, 5][i];
      if (name === "failed") return i >= 5 ? 1 : 0;
      return 0;
    });
    expect(findMarks(c, 6, "sig11")).toEqual({ onset: 2, peak: 4, failure: 5, broken: null });
    expect(findMarks(c, 2, "sig11")).toEqual({ onset: null, peak: 1, failure: null, broken: null });
  });

  it("names the family that broke when the core goes on past dcrit ('continue', spec C.7)", () => {
    // uniaxial strain along 1 well past dcrit = 0.45 (D.4: d1 reaches dcrit near eps11 = 0.021)
    const legs = [leg([E, S, S], [0.03, 0, 0], 300)];
    const goesOn = run({ onFailure: "continue" }, legs);
    const m = findMarks(goesOn.columns, goesOn.rows, "sig11");
    expect(m.failure).not.toBeNull();
    expect(m.failure).toBeLessThan(goesOn.rows - 1);
    expect(m.broken).toBe(1);
    const stops = run({ onFailure: "stop" }, legs);
    const s = findMarks(stops.columns, stops.rows, "sig11");
    expect(s.failure).toBe(stops.rows - 1);
    expect(s.broken).toBeNull();
  });
});

describe("clipboard and file names", () => {
  it("copies a selection as tab-separated text with the contract's header", () => {
    const c = columns(5, (_n, i) => i);
    const lines = rowsToTsv(c, 3, 1).split("\n");
    expect(lines[0]).toBe(RESULT_COLUMNS.join("\t"));
    expect(lines).toHaveLength(4);
    expect(lines[1].split("\t")[0]).toBe("1");
  });

  it("makes readable file names", () => {
    const d = new Date("2026-03-04T10:00:00Z");
    expect(slug("Demo SMC — tension → unload!")).toBe("demo-smc-tension-unload");
    expect(scenarioFileName("Plate A", d)).toBe("craquelure-plate-a-2026-03-04.scenario.json");
    expect(resultsCsvName("Plate A", null, d)).toBe("craquelure-plate-a-all-sets-2026-03-04.csv");
    expect(resultsCsvName("Plate A", "B: stiffer", d)).toBe(
      "craquelure-plate-a-set-b-stiffer-2026-03-04.csv",
    );
    expect(chartImageName("", "Stress–strain", d)).toBe(
      "craquelure-untitled-stress-strain-2026-03-04",
    );
    expect(provenanceName("Plate A", "B: stiffer", d)).toBe(
      "craquelure-plate-a-set-b-stiffer-2026-03-04.provenance.json",
    );
  });

  it("keeps the quantities' symbols in chart file names (issue 15 item 3)", () => {
    const d = new Date("2026-03-04T10:00:00Z");
    expect(chartImageName("Plate A", "Stress–strain: σ11 against ε11", d)).toBe(
      "craquelure-plate-a-stress-strain-σ11-against-ε11-2026-03-04",
    );
    expect(chartImageName("Plate A", "Stress–strain: σ12 against γ12", d)).toContain(
      "σ12-against-γ12",
    );
    expect(slug("Work, stored and dissipated energy Φ")).toBe(
      "work-stored-and-dissipated-energy-φ",
    );
    // Cut at 48 characters, never inside a symbol and never ending in a dash.
    expect(Array.from(slug("σ11 ".repeat(30))).length).toBeLessThanOrEqual(48);
    expect(slug("σ11 ".repeat(30))).not.toMatch(/-$/);
  });
});
