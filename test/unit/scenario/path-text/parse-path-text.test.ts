import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Leg } from "@/lib/mechanics/types";
import { formatPathText } from "@/lib/scenario/path-text/format-path-text";
import { expandPathDoc, type PathDoc } from "@/lib/scenario/path-text/path-doc";
import { formatPathTextError, parsePathText } from "@/lib/scenario/path-text/parse-path-text";

function legsOf(text: string): Leg[] {
  const r = parsePathText(text);
  if (!r.ok) throw new Error(r.errors.map(formatPathTextError).join("; "));
  return expandPathDoc(r.doc);
}

function firstError(text: string) {
  const r = parsePathText(text);
  if (r.ok) throw new Error("expected an error");
  return r.errors[0];
}

describe("path notation", () => {
  it("reads the tension → unload → compression path of spec C.1", () => {
    const legs = legsOf("# demo\ne11=1% in 100\ns11=0 in 50\ne11=-0.5% in 100\n");
    expect(legs).toEqual([
      { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: 100 },
      { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 50 },
      { control: ["strain", "stress", "stress"], target: [-0.005, 0, 0], increments: 100 },
    ]);
  });

  it("reads several components, commas and shear strain", () => {
    expect(legsOf("e11=0.002, e22=-1e-3 g12=0.5% in 7")[0]).toEqual({
      control: ["strain", "strain", "strain"],
      target: [0.002, -0.001, 0.005],
      increments: 7,
    });
    expect(legsOf("s12=20 s11=10 in 3")[0].target).toEqual([10, 0, 20]);
  });

  it("expands a growing repeat block: cycle k scaled by (1 + grow·k)", () => {
    const legs = legsOf("repeat 3 grow 1\n  e11=0.002 in 60\n  s11=0 in 60\nend");
    expect(legs).toHaveLength(6);
    expect(legs.filter((_, i) => i % 2 === 0).map((l) => l.target[0])).toEqual([
      0.002, 0.004, 0.006,
    ]);
    expect(legs[1].target).toEqual([0, 0, 0]);
  });

  it.each([
    ["e11=1% in 100\nx11=3 in 5", 2, 1, 'unknown component "x11"'],
    ["e12=0.01 in 10", 1, 1, "g12"],
    ["e11=0.01", 1, 9, 'expected "in <increments>"'],
    ["e11 0.01 in 5", 1, 5, 'expected "="'],
    ["e11=abc in 5", 1, 5, "expected a number"],
    ["e11=0.01 in 0", 1, 13, "whole number"],
    ["e11=0.01 in 2.5", 1, 13, "whole number"],
    ["s11=30% in 5", 1, 7, "strains only"],
    ["e11=1 s11=2 in 5", 1, 7, "prescribed twice"],
    ["e11=0.01 in 5 more", 1, 15, 'unexpected "more"'],
    ["  e11=0.01 in 5 ;", 1, 17, 'unexpected character ";"'],
    ["end", 1, 1, '"end" without'],
    ["repeat 2\ne11=0.01 in 5", 1, 1, "never closed"],
    ["repeat 2\nrepeat 3", 2, 1, "cannot hold another"],
    ["repeat 2 grow\ne11=1 in 1\nend", 1, 14, 'number after "grow"'],
    ["repeat 2\nend", 2, 1, "has no legs"],
    ["# only a note\n", 1, 1, "empty"],
    ["e11=0.01 in 1000000\ne11=0 in 5", 1, 1, "limit"],
    ["e11=1e400 in 5", 1, 5, "not a finite number"],
    ["repeat 3 grow 1e308\n  e11=10 in 1\nend", 1, 1, "too large"],
  ])("reports %j at line %i, column %i", (text, line, column, message) => {
    const e = firstError(text);
    expect(e.line).toBe(line);
    expect(e.column).toBe(column);
    expect(e.message).toContain(message);
  });

  it("reports every bad line, not only the first", () => {
    const r = parsePathText("x in 1\ne11=0.01 in 5\ny in 2");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.map((e) => e.line)).toEqual([1, 3]);
  });

  it("formats an error with line and column", () => {
    expect(formatPathTextError({ line: 3, column: 5, message: "boom" })).toBe(
      "line 3, column 5: boom",
    );
  });
});

const finite = fc.double({ min: -1e3, max: 1e3, noNaN: true, noDefaultInfinity: true });
const leg = fc.record({
  control: fc.tuple(
    fc.constantFrom("strain" as const, "stress" as const),
    fc.constantFrom("strain" as const, "stress" as const),
    fc.constantFrom("strain" as const, "stress" as const),
  ),
  target: fc
    .tuple(finite, finite, finite)
    .map((t) => t.map((v) => (v === 0 ? 0 : v)) as Leg["target"]),
  increments: fc.integer({ min: 1, max: 500 }),
});
const item = fc.oneof(
  leg.map((l) => ({ kind: "leg" as const, leg: l })),
  fc
    .record({
      count: fc.integer({ min: 1, max: 20 }),
      grow: fc.double({ min: -0.05, max: 3, noNaN: true }).map((g) => (g === 0 ? 0 : g)),
      legs: fc.array(leg, { minLength: 1, maxLength: 4 }),
    })
    .map((block) => ({ kind: "repeat" as const, block })),
);

describe("text ⇄ object", () => {
  it("formatting then parsing gives back the same path object", () => {
    fc.assert(
      fc.property(fc.array(item, { minLength: 1, maxLength: 6 }), (items) => {
        const doc: PathDoc = { items };
        const r = parsePathText(formatPathText(doc));
        expect(r.ok).toBe(true);
        if (r.ok) expect(r.doc).toEqual(doc);
      }),
    );
  });
});
