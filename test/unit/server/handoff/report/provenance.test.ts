import { describe, expect, it } from "vitest";

import {
  matchProvenance,
  type FitSummary,
  type LibrarySet,
} from "@/lib/server/handoff/report/provenance";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { chartGeometry } from "@/lib/server/handoff/report/svg-chart";

const values = {
  E1: 11000,
  E2: 11000,
  nu12: 0.3,
  G12: 4230,
  Y0_1: 0.05,
  Y0_2: 0.05,
  a1: 0.6,
  a2: 0.6,
  b: 0.3,
  alpha: 0.005,
  beta: 0.005,
  dcrit: 0.45,
};
const set = (id: string, label: string, extra: object = {}) =>
  ({ id, label, ...values, ...extra }) as unknown as ParameterSet;

describe("report provenance", () => {
  const library: LibrarySet[] = [
    {
      id: "L1",
      name: "Fitted SMC",
      values,
      provenance: { kind: "fitted", method: "identify", records: ["r1"] },
    },
    { id: "L2", name: "Typed", values: { ...values, E1: 9000 }, provenance: { kind: "typed" } },
  ];
  const fits: FitSummary[] = [
    {
      parameterSetId: "L1",
      method: "refine",
      recordIds: ["r1", "r2"],
      residuals: [{ id: "r1", rms: 1.25, points: 400 }],
      warnings: ["not informed by these records, kept at the start value: k6"],
      uncertainty: {
        level: 0.95,
        degreesOfFreedom: 398,
        residualSd: 0.01,
        params: [{ name: "E1", value: 11000, se: 12, low: 10976, high: 11024 }],
        correlation: [[1]],
      },
      createdAt: "2026-11-30T10:00:00Z",
    },
  ];
  const names = new Map([
    ["r1", "Tension 0°"],
    ["r2", "Cyclic 90°"],
  ]);

  it("finds the library set by values, and its fit's records with their residuals", () => {
    const [p] = matchProvenance([set("A", "anything")], library, fits, names);
    expect(p).toMatchObject({
      setId: "A",
      libraryName: "Fitted SMC",
      kind: "fitted",
      method: "refine",
      fittedAt: "2026-11-30T10:00:00Z",
      warnings: ["not informed by these records, kept at the start value: k6"], // issue 14
    });
    expect(p.uncertainty?.params[0]).toMatchObject({ name: "E1", se: 12 }); // issue 14
    expect(p.records).toEqual([
      { name: "Tension 0°", rms: 1.25, points: 400 },
      { name: "Cyclic 90°", rms: null, points: null },
    ]);
  });

  it("says so when a set was typed into the scenario", () => {
    const [p] = matchProvenance([set("B", "", { E1: 12345 })], library, fits, names);
    expect(p).toMatchObject({ libraryName: null, kind: "typed into the scenario", records: [] });
    expect(p.librarySource).toBeNull();
  });

  // Issue 13 item 8: a revision made before the library set was edited still names its origin.
  const versioned: LibrarySet[] = [
    {
      id: "L3",
      name: "PA6 edited",
      values: { ...values, E1: 9500 },
      provenance: { kind: "typed", note: "stiffness re-measured" },
      version: 2,
      versions: [
        { version: 1, values: { ...values, E1: 8800 }, provenance: { kind: "fitted" } },
        {
          version: 2,
          values: { ...values, E1: 9500 },
          provenance: { kind: "typed", note: "stiffness re-measured" },
        },
      ],
    },
  ];

  it("names a superseded version when the revision holds an older version's values", () => {
    const [p] = matchProvenance([set("C", "PA6 edited", { E1: 8800 })], versioned, [], names);
    expect(p).toMatchObject({
      libraryName: "PA6 edited",
      libraryVersion: 1,
      latestVersion: 2,
      librarySource: "library set 'PA6 edited', version 1 (superseded by version 2)",
      kind: "fitted", // version 1's origin, not the current one's
      note: null,
    });
  });

  it("names the current version without a superseded note", () => {
    const [p] = matchProvenance([set("D", "", { E1: 9500 })], versioned, [], names);
    expect(p.librarySource).toBe("library set 'PA6 edited', version 2");
  });

  it("compares k6 too: a set differing only in k6 is not the library set", () => {
    const [p] = matchProvenance([set("E", "Fitted SMC", { k6: 1.5 })], library, fits, names);
    expect(p.libraryName).toBeNull();
    // a stored set without k6 has the default k6 = 1 (spec damage-law.md A.3)
    const [q] = matchProvenance([set("F", "Fitted SMC", { k6: 1 })], library, fits, names);
    expect(q.libraryName).toBe("Fitted SMC");
  });
});

describe("report chart geometry", () => {
  it("maps the data range onto the box and keeps zero lines inside it", () => {
    const g = chartGeometry([{ name: "A", x: [-1, 0, 1], y: [-10, 0, 10] }], 200, 100);
    expect(g.paths[0].d.startsWith("M56.0,")).toBe(true);
    expect(g.paths[0].d.split(" ")).toHaveLength(3);
    expect(g.zero.x).toBeCloseTo(56 + (200 - 68) / 2);
    expect(g.xTicks.map((t) => t.label)).toContain("0");
  });

  it("thins long series to at most maxPoints vertices", () => {
    const x = Array.from({ length: 10_000 }, (_, i) => i);
    const g = chartGeometry([{ name: "A", x, y: x }], 480, 260, 500);
    expect(g.paths[0].d.split(" ").length).toBeLessThanOrEqual(500);
  });
});
