import { describe, expect, it } from "vitest";
import { RESULT_COLUMNS } from "@/lib/mechanics/types";
import { allSetsCsv, setCsv } from "@/lib/client/loading-desk/csv-export";
import { ResultBuffer } from "@/lib/client/loading-desk/result-buffer";

function buffer(rows: number, scale: number) {
  const b = new ResultBuffer(rows + 3);
  for (const c of RESULT_COLUMNS)
    for (let i = 0; i < rows; i++) b.columns[c][i] = c === "increment" ? i : i * scale;
  b.rows = rows;
  return b;
}

describe("CSV export", () => {
  it("writes one set with the contract's header and only the filled rows", () => {
    const lines = setCsv(buffer(3, 0.5)).trimEnd().split("\n");
    expect(lines[0]).toBe(RESULT_COLUMNS.join(","));
    expect(lines).toHaveLength(4);
    expect(lines[3].split(",")[5]).toBe("1");
  });

  it("writes all sets with a leading set column", () => {
    const lines = allSetsCsv([
      { id: "A", buffer: buffer(2, 1) },
      { id: "B", buffer: buffer(3, 2) },
    ])
      .trimEnd()
      .split("\n");
    expect(lines[0]).toBe(`set,${RESULT_COLUMNS.join(",")}`);
    expect(lines.slice(1).map((l) => l.split(",")[0])).toEqual(["A", "A", "B", "B", "B"]);
  });
});
