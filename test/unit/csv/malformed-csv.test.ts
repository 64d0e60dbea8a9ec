/** Every malformed file gives one clear message naming the line (and the cell) and no points. */
import { describe, expect, it } from "vitest";
import { readCurveCsv } from "@/lib/csv/read-curve-csv";

function rejected(text: string) {
  const result = readCurveCsv(text);
  expect(result.ok).toBe(false);
  expect(result.points).toBeNull();
  if (result.ok) throw new Error("unreachable");
  expect(result.error.message).not.toMatch(/\bat \w+ \(|Error:/); // no stack trace, no raw error
  return result.error;
}

describe("malformed files", () => {
  it("empty file", () => {
    expect(rejected("").message).toBe("The file is empty.");
    expect(rejected(" \n\n \n").code).toBe("empty");
  });

  it("header without data", () => {
    expect(rejected("strain,stress\n").message).toBe("line 1: a header but no data rows.");
  });

  it("text in a number", () => {
    const lines = [
      "strain,stress",
      ...Array.from({ length: 12 }, (_, i) => `0.00${i},${i}`),
      "0.02,abc",
    ];
    const error = rejected(lines.join("\n"));
    expect(error.message).toBe('line 14, column "stress": "abc" is not a number');
    expect(error).toMatchObject({ line: 14, column: "stress", code: "not-a-number" });
  });

  it("empty cell in a mapped column", () => {
    expect(rejected("strain;stress\n0,1;2\n0,2;\n").message).toBe(
      'line 3, column "stress": is empty',
    );
  });

  it("ragged rows", () => {
    const error = rejected("strain,stress\n0.001,1\n0.002,2,7\n");
    expect(error.message).toBe(
      "line 3: 3 cells where line 1 has 2; every row needs the same columns.",
    );
  });

  it("ragged rows counted on physical lines past blank lines", () => {
    expect(rejected("strain,stress\n\n0.001,1\n\n0.002\n").line).toBe(5);
  });

  it("wrong delimiter", () => {
    const error = rejected("strain|stress\n0.001|10\n0.002|20\n");
    expect(error.code).toBe("delimiter");
    expect(error.message).toBe(
      'line 1: only one column found; separate columns with a comma, a semicolon or a tab, or raise "Lines to skip" past a block of notes above the table.',
    );
  });

  it("too large (over 10 MB) is refused before parsing", () => {
    const row = "0.0012345678,123.45678901\n";
    const text = "strain,stress\n" + row.repeat(Math.ceil((10 * 1024 * 1024) / row.length) + 1);
    const error = rejected(text);
    expect(error.code).toBe("too-large");
    expect(error.message).toBe("The file is larger than 10 MB; split it or thin the rows.");
  });

  it("more than 200,000 rows", () => {
    const text = "e,s\n" + "1,2\n".repeat(200_001);
    const error = rejected(text);
    expect(error.message).toBe("line 200002: more than 200,000 data rows; thin the curve first.");
  });

  it("a million columns", () => {
    const error = rejected(`${"1,".repeat(999_999)}1\n1,2\n`);
    expect(error.code).toBe("too-many-columns");
    expect(error.message).toBe("line 1: 1,000,000 cells; at most 64 columns are accepted.");
  });

  it("endless quoting", () => {
    const error = rejected(`strain,stress\n0.001,1\n"0.002,2\n${"0.003,3\n".repeat(1000)}`);
    expect(error.code).toBe("quotes");
    expect(error.message).toBe('line 3: a quoted cell is never closed properly (a lone ").');
  });

  it("a wrongly mapped column index", () => {
    const result = readCurveCsv("a,b\n1,2\n", { strain: 0, stress: 5 });
    expect(result.ok).toBe(false);
    if (!result.ok)
      expect(result.error.message).toBe(
        "stress is mapped to column 6, but the file has 2 columns.",
      );
  });

  it("a unit in the header that is not supported", () => {
    expect(rejected("\nstrain [%],stress [psi]\n0.1,1000\n").message).toBe(
      'line 2, column "stress [psi]": unit "psi" is not one of Pa, kPa, MPa, GPa; choose the unit in the mapping step.',
    );
    const chosen = readCurveCsv("strain [%],stress [psi]\n0.1,1000\n", {
      strain: 0,
      stress: 1,
      stressUnit: "kPa",
    });
    expect(chosen.ok).toBe(true);
  });

  it("a header with no recognisable strain or stress", () => {
    expect(rejected("force,position\n1,2\n").message).toBe(
      "no strain and stress columns recognised in the header; map them by hand.",
    );
  });
});

describe("arbitrary text", () => {
  it("never throws: either points or one message with no points", async () => {
    const fc = (await import("fast-check")).default;
    const text = fc.oneof(
      fc.string({ maxLength: 300 }),
      fc
        .array(fc.constantFrom("1", "2.5", ",", ";", "\t", "\n", '"', "x", "0,5", "e", "-", " "), {
          maxLength: 200,
        })
        .map((a) => a.join("")),
    );
    fc.assert(
      fc.property(text, (t) => {
        const result = readCurveCsv(t);
        if (!result.ok) {
          expect(result.points).toBeNull();
          expect(result.error.message.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 500 },
    );
  });
});
