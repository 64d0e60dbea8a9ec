/** The linear unit finder agrees with the quadratic expression it replaced, and stays linear. */
import { describe, expect, it } from "vitest";

import { headerName } from "@/lib/csv/column-mapping";
import { readCurveCsv } from "@/lib/csv/read-curve-csv";
import { findTrailingUnit } from "@/lib/csv/trailing-unit";
import { headerUnitText } from "@/lib/csv/units";

// The replaced expressions, kept here as the reference (fine on short strings only).
const OLD_UNIT = /[[(]([^\])]*)[\])]\s*$/;
function oldHeaderUnitText(header: string): string | null {
  const match = OLD_UNIT.exec(header.trim());
  return match ? match[1].trim() : null;
}
function oldHeaderName(header: string): string {
  const bare =
    oldHeaderUnitText(header) === null ? header : header.replace(/[[(][^\])]*[\])]\s*$/, "");
  return bare.trim().toLowerCase();
}

// Small deterministic generator (LCG) over the characters that matter to the expression.
function randomHeaders(count: number): string[] {
  const alphabet = ["(", ")", "[", "]", " ", "\t", "a", "M", "%", "/"];
  let seed = 12345;
  const next = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31);
  return Array.from({ length: count }, () => {
    const length = next() % 12;
    return Array.from({ length }, () => alphabet[next() % alphabet.length]).join("");
  });
}

describe("trailing unit", () => {
  const cases = [
    "strain [%]",
    "stress (MPa)",
    "Stress (N/mm²)  ",
    "  eps (mm/mm)",
    "force (kN) / area (mm2)",
    "strain (a(b)",
    "strain [a)",
    "strain ()",
    "strain",
    ")",
    "(",
    "x ((MPa)",
    "x (MPa) extra",
    "[%]",
    "",
  ];

  it("gives the old expression's answer on named headers", () => {
    for (const h of cases) {
      expect(headerUnitText(h), h).toBe(oldHeaderUnitText(h));
      expect(headerName(h), h).toBe(oldHeaderName(h));
    }
  });

  it("gives the old expression's answer on 5,000 generated headers", () => {
    for (const h of randomHeaders(5000)) {
      expect(headerUnitText(h), JSON.stringify(h)).toBe(oldHeaderUnitText(h));
      expect(headerName(h), JSON.stringify(h)).toBe(oldHeaderName(h));
    }
  });

  it("reads a 1 MB cell of '(' as a name without unit", () => {
    const cell = "(".repeat(1024 * 1024);
    expect(findTrailingUnit(cell)).toBeNull();
    expect(headerUnitText(cell)).toBeNull();
    expect(headerName(cell)).toBe(cell);
    const closed = cell + "MPa)";
    expect(findTrailingUnit(closed)).toEqual({ open: 0, close: closed.length - 1 });
    expect(headerName(closed)).toBe("");
  });
});

describe("header cell length", () => {
  it("refuses a header cell over 200 characters, naming the column", () => {
    const result = readCurveCsv(`strain,${"(".repeat(1024 * 1024)}\n0.001,1\n0.002,2\n`);
    expect(result.ok).toBe(false);
    if (result.ok) throw new Error("unreachable");
    expect(result.error.code).toBe("header-too-long");
    expect(result.error.message).toBe(
      "line 1: the header of column 2 is 1,048,576 characters long; at most 200 are accepted.",
    );
  });

  it("accepts a header cell of exactly 200 characters", () => {
    const header = `stress ${"s".repeat(187)} (MPa)`;
    expect(header).toHaveLength(200);
    const result = readCurveCsv(`strain,${header}\n0.001,1\n0.002,2\n`);
    expect(result.ok ? null : result.error.message).toBeNull();
  });
});
