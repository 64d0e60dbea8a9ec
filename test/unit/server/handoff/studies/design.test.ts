import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { designStudy } from "@/lib/server/handoff/studies/design";
import { axisValues, studyRequestSchema } from "@/lib/server/handoff/studies/schema";

const demo = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
);
const request = (extra: object) => studyRequestSchema.parse({ scenario: demo, ...extra });

describe("study design", () => {
  it("spaces from → to evenly, ends included", () => {
    expect(axisValues({ parameter: "a1", from: 0.2, to: 0.6, count: 3 })).toEqual([0.2, 0.4, 0.6]);
    expect(axisValues({ parameter: "a1", values: [1, 5] })).toEqual([1, 5]);
  });

  it("runs the file's own sets without a grid", () => {
    const design = designStudy(request({}));
    expect(design.sets.map((s) => s.id)).toEqual(
      demo.parameterSets.map((_: unknown, i: number) => demo.parameterSets[i].id ?? "A"),
    );
    expect(design.design).toEqual({ kind: "sets" });
  });

  it("expands a two-axis grid over the base set, first axis outermost", () => {
    const design = designStudy(
      request({
        grid: {
          axes: [
            { parameter: "Y0_1", values: [0.04, 0.06] },
            { parameter: "a1", values: [0.5, 0.6, 0.7] },
          ],
        },
      }),
    );
    expect(design.sets).toHaveLength(6);
    expect(design.sets.map((s) => [s.Y0_1, s.a1])).toEqual([
      [0.04, 0.5],
      [0.04, 0.6],
      [0.04, 0.7],
      [0.06, 0.5],
      [0.06, 0.6],
      [0.06, 0.7],
    ]);
    expect(design.sets[4]).toMatchObject({
      id: "g5",
      label: "Y0_1=0.06, a1=0.6",
      E1: demo.parameterSets[0].E1,
    });
  });

  it("rejects a grid point outside a parameter's range, naming it", () => {
    expect(() =>
      designStudy(request({ grid: { axes: [{ parameter: "dcrit", values: [0.3, 1.5] }] } })),
    ).toThrow(
      expect.objectContaining({
        code: "invalid:file",
        message: expect.stringContaining("parameterSets[1].dcrit"),
      }),
    );
  });

  it("rejects an unknown base set, too many points and too many increments", () => {
    expect(() =>
      designStudy(request({ grid: { base: "Z", axes: [{ parameter: "a1", values: [0.5] }] } })),
    ).toThrow(expect.objectContaining({ code: "invalid:grid" }));
    expect(() =>
      designStudy(
        request({
          grid: {
            axes: [
              { parameter: "a1", from: 0.1, to: 0.9, count: 100 },
              { parameter: "b", from: 0.1, to: 0.5, count: 11 },
            ],
          },
        }),
      ),
    ).toThrow(expect.objectContaining({ code: "invalid:too-large" }));
    const long = structuredClone(demo);
    long.path.legs = [
      { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: 1_000_000 },
    ];
    expect(() =>
      designStudy(
        studyRequestSchema.parse({
          scenario: long,
          grid: { axes: [{ parameter: "a1", from: 0.3, to: 0.6, count: 21 }] },
        }),
      ),
    ).toThrow(expect.objectContaining({ code: "invalid:too-large" }));
  });

  it("refuses an axis with neither values nor a range", () => {
    expect(
      studyRequestSchema.safeParse({
        scenario: demo,
        grid: { axes: [{ parameter: "a1", from: 1 }] },
      }).success,
    ).toBe(false);
  });
});
