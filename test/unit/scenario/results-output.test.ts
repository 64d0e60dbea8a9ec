/** CSV and JSON output of result columns (scenario-file.md "Command-line driver"). */
import { describe, expect, it } from "vitest";
import { RESULT_COLUMNS, type ResultColumns, type RunStatus } from "@/lib/mechanics/types";
import { resultsCsvChunks, resultsToCsv, resultsToJson } from "@/lib/scenario/results-csv";

const CONTRACT_HEADER =
  "increment,leg,eps11,eps22,gam12,sig11,sig22,sig12,d1,d2,dp1,dp2,epsP11,epsP22,gamP12,Y1,Y2,Ybar1,Ybar2,psi,W,Phi,thetaD,failed";

/** Columns with `capacity` rows where cell (r, c) = r + c/100, except the values set by `edit`. */
function columnsWith(capacity: number, edit?: (cols: ResultColumns) => void): ResultColumns {
  const cols = {} as ResultColumns;
  RESULT_COLUMNS.forEach((name, c) => {
    cols[name] = Float64Array.from({ length: capacity }, (_, r) => r + c / 100);
  });
  edit?.(cols);
  return cols;
}

const STATUS: RunStatus = {
  failed: true,
  failMode: "dcrit axis 1",
  stoppedAtIncrement: 2,
  warnings: ["x"],
};

describe("resultsToCsv", () => {
  it("starts with exactly the contract's header", () => {
    expect(resultsToCsv(columnsWith(0), 0)).toBe(CONTRACT_HEADER + "\n");
  });

  it("writes one line per stored row only, not the spare capacity, with \\n endings", () => {
    const text = resultsToCsv(columnsWith(10), 3);
    expect(text.endsWith("\n")).toBe(true);
    expect(text.includes("\r")).toBe(false);
    const lines = text.trimEnd().split("\n");
    expect(lines).toHaveLength(4);
    expect(lines[2].split(",")).toHaveLength(24);
    expect(lines[2].startsWith("1,1.01,1.02,")).toBe(true);
  });

  it("writes shortest round-trip numbers, -0 as 0, integers without a point", () => {
    const cols = columnsWith(1, (c) => {
      c.increment[0] = 7;
      c.eps11[0] = 0.1 + 0.2; // 0.30000000000000004 must survive
      c.sig11[0] = -0;
      c.d1[0] = 1e-21;
      c.failed[0] = 1;
    });
    const cells = resultsToCsv(cols, 1).split("\n")[1].split(",");
    expect(cells[0]).toBe("7");
    expect(cells[2]).toBe("0.30000000000000004");
    expect(Number(cells[2])).toBe(0.1 + 0.2);
    expect(cells[5]).toBe("0");
    expect(cells[8]).toBe("1e-21");
    expect(cells[23]).toBe("1");
  });

  it("gives the same text in chunks as in one piece", () => {
    const cols = columnsWith(1000);
    expect([...resultsCsvChunks(cols, 999, 7)].join("")).toBe(resultsToCsv(cols, 999));
  });
});

describe("resultsToJson", () => {
  it("follows the contract: set, columns by name (stored rows only), three status fields", () => {
    const cols = columnsWith(5, (c) => {
      c.sig22[1] = -0;
    });
    const parsed = JSON.parse(resultsToJson("A", cols, 2, STATUS));
    expect(Object.keys(parsed)).toEqual(["set", "columns", "status"]);
    expect(parsed.set).toBe("A");
    expect(Object.keys(parsed.columns)).toEqual([...RESULT_COLUMNS]);
    expect(parsed.columns.eps11).toEqual([0.02, 1.02]);
    expect(Object.is(parsed.columns.sig22[1], 0)).toBe(true);
    expect(parsed.status).toEqual({
      failed: true,
      failMode: "dcrit axis 1",
      stoppedAtIncrement: 2,
    });
  });

  it("writes null status fields for a run that did not fail, and empty columns for no rows", () => {
    const ok: RunStatus = { failed: false, failMode: null, stoppedAtIncrement: null, warnings: [] };
    const parsed = JSON.parse(resultsToJson("B", columnsWith(0), 0, ok));
    expect(parsed.status).toEqual({ failed: false, failMode: null, stoppedAtIncrement: null });
    expect(parsed.columns.increment).toEqual([]);
  });
});
