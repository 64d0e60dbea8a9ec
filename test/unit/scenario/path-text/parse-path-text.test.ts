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
    const legs = legsOf("# demo\ne11=1% over 100\ns11=0 over 50\ne11=-0.5% over 100\n");
    expect(legs).toEqual([
      { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: 100 },
      { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 50 },
      { control: ["strain", "stress", "stress"], target: [-0.005, 0, 0], increments: 100 },
    ]);
  });

  it("reads several components, commas and shear strain", () => {
    expect(legsOf("ε11=0.002, ε22=-1e-3 γ12=0.5% over 7")[0]).toEqual({
      control: ["strain", "strain", "strain"],
      target: [0.002, -0.001, 0.005],
      increments: 7,
    });
    expect(legsOf("σ12=20 σ11=10 over 3")[0].target).toEqual([10, 0, 20]);
  });

  it("expands a growing repeat block: cycle k scaled by (1 + grow·k)", () => {
    const legs = legsOf("repeat 3 grow 1\n  ε11=0.002 over 60\n  σ11=0 over 60\nend");
    expect(legs).toHaveLength(6);
    expect(legs.filter((_, i) => i % 2 === 0).map((l) => l.target[0])).toEqual([
      0.002, 0.004, 0.006,
    ]);
    expect(legs[1].target).toEqual([0, 0, 0]);
  });

  it("reads the ASCII words for keyboards without Greek", () => {
    expect(legsOf("strain11=1% strain22=-0.1% shear12=0.5% over 7")).toEqual(
      legsOf("ε11=1% ε22=-0.1% γ12=0.5% over 7"),
    );
    expect(legsOf("stress11=10 stress22=5 stress12=20 over 3")[0]).toEqual({
      control: ["stress", "stress", "stress"],
      target: [10, 5, 20],
      increments: 3,
    });
    expect(legsOf("τ12=20 over 3")).toEqual(legsOf("σ12=20 over 3"));
  });

  it('still reads version 1\'s names and "in" (texts saved in earlier revisions)', () => {
    expect(legsOf("e11=1% in 100\ns11=0 in 50\ng12=0.5% e22=0.1% in 4\ns12=3 s22=2 in 2")).toEqual(
      legsOf("ε11=1% over 100\nσ11=0 over 50\nγ12=0.5% ε22=0.1% over 4\nσ12=3 σ22=2 over 2"),
    );
  });

  it.each([
    ["ε11=1% over 100\nx11=3 over 5", 2, 1, 'unknown component "x11"'],
    ["e12=0.01 over 10", 1, 1, "γ12"],
    ["Σ11=5 over 3", 1, 1, 'lower case: "σ11"'],
    ["ε11=0.01", 1, 9, 'expected "over <increments>"'],
    ["ε11 0.01 over 5", 1, 5, 'expected "="'],
    ["ε11=abc over 5", 1, 5, "expected a number"],
    ["ε11=0.01 over 0", 1, 15, "whole number"],
    ["ε11=0.01 over 2.5", 1, 15, "whole number"],
    ["σ11=30% over 5", 1, 7, "strains only"],
    ["ε11=1 σ11=2 over 5", 1, 7, "prescribed twice"],
    ["ε11=0.01 over 5 more", 1, 17, 'unexpected "more"'],
    ["  ε11=0.01 over 5 ;", 1, 19, 'unexpected character ";"'],
    ["end", 1, 1, '"end" without'],
    ["repeat 2\nε11=0.01 over 5", 1, 1, "never closed"],
    ["repeat 2\nrepeat 3", 2, 1, "cannot hold another"],
    ["repeat 2 grow\nε11=1 over 1\nend", 1, 14, 'number after "grow"'],
    ["repeat 2\nend", 2, 1, "has no legs"],
    ["# only a note\n", 1, 1, "empty"],
    ["ε11=0.01 over 1000000\nε11=0 over 5", 1, 1, "limit"],
    ["ε11=1e400 over 5", 1, 5, "not a finite number"],
    ["repeat 3 grow 1e308\n  ε11=10 over 1\nend", 1, 1, "too large"],
    ["e11=0.01 in 5 more", 1, 15, 'unexpected "more"'],
  ])("reports %j at line %i, column %i", (text, line, column, message) => {
    const e = firstError(text);
    expect(e.line).toBe(line);
    expect(e.column).toBe(column);
    expect(e.message).toContain(message);
  });

  it("reports every bad line, not only the first", () => {
    const r = parsePathText("x over 1\nε11=0.01 over 5\ny over 2");
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
  it('writes the symbols and "over", leaving out directions free at zero stress', () => {
    const doc: PathDoc = {
      items: [
        {
          kind: "leg",
          leg: {
            control: ["strain", "stress", "strain"],
            target: [0.01, 5, -0.002],
            increments: 60,
          },
        },
        {
          kind: "repeat",
          block: {
            count: 2,
            grow: 0.5,
            legs: [
              { control: ["stress", "strain", "stress"], target: [0, 0.001, 0], increments: 3 },
            ],
          },
        },
        {
          kind: "leg",
          leg: { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 9 },
        },
      ],
    };
    expect(formatPathText(doc)).toBe(
      "ε11=0.01 σ22=5 γ12=-0.002 over 60\nrepeat 2 grow 0.5\n  ε22=0.001 over 3\nend\nσ11=0 over 9",
    );
  });

  it("formatting then parsing gives back the same path object", () => {
    fc.assert(
      fc.property(fc.array(item, { minLength: 1, maxLength: 6 }), (items) => {
        const doc: PathDoc = { items };
        const text = formatPathText(doc);
        expect(text).not.toMatch(/\b[esg](11|22|12)=|\bin \d/);
        const r = parsePathText(text);
        expect(r.ok).toBe(true);
        if (r.ok) expect(r.doc).toEqual(doc);
      }),
    );
  });
});
