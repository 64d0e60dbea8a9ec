/**
 * Struct-of-arrays output: one Float64Array per column of the command-line contract
 * (scenario-file.md), 24 × 8 = 192 bytes per stored increment. Each column has its own buffer so
 * a worker can transfer them.
 */
import type { Material } from "./material";
import * as StateLayout from "./state";
import { RESULT_COLUMNS, type ResultColumns } from "./types";

// Bind imported names once: CommonJS transpilation (tsx, vitest) turns every access to an
// imported binding into a getter call, which dominates a per-increment loop.
const { D1, D2, DP1, DP2, EPS, EPS_P, PHI, PSI, SIG, TH_DEG, W, Y1, Y2 } = StateLayout;

export const BYTES_PER_ROW = RESULT_COLUMNS.length * Float64Array.BYTES_PER_ELEMENT;

export function allocateColumns(rows: number): ResultColumns {
  const cols = {} as ResultColumns;
  for (const name of RESULT_COLUMNS) cols[name] = new Float64Array(rows);
  return cols;
}

/** Copies rows [from, to) into fresh, transferable columns. */
export function sliceColumns(cols: ResultColumns, from: number, to: number): ResultColumns {
  const out = {} as ResultColumns;
  for (const name of RESULT_COLUMNS) out[name] = cols[name].slice(from, to);
  return out;
}

/** Column writer; holds the arrays in fields so the per-row write is plain indexed stores. */
export class RowWriter {
  private readonly c: Float64Array[];
  constructor(
    cols: ResultColumns,
    private readonly m: Material,
  ) {
    this.c = RESULT_COLUMNS.map((n) => cols[n]);
  }

  write(row: number, leg: number, st: Float64Array, failed: number): void {
    const c = this.c;
    const b = this.m.b;
    c[0][row] = row;
    c[1][row] = leg;
    c[2][row] = st[EPS];
    c[3][row] = st[EPS + 1];
    c[4][row] = st[EPS + 2];
    c[5][row] = st[SIG];
    c[6][row] = st[SIG + 1];
    c[7][row] = st[SIG + 2];
    c[8][row] = st[D1];
    c[9][row] = st[D2];
    c[10][row] = st[DP1];
    c[11][row] = st[DP2];
    c[12][row] = st[EPS_P];
    c[13][row] = st[EPS_P + 1];
    c[14][row] = st[EPS_P + 2];
    const y1 = st[Y1];
    const y2 = st[Y2];
    c[15][row] = y1;
    c[16][row] = y2;
    c[17][row] = y1 + b * y2;
    c[18][row] = b * y1 + y2;
    c[19][row] = st[PSI];
    c[20][row] = st[W];
    c[21][row] = st[PHI];
    c[22][row] = st[TH_DEG];
    c[23][row] = failed;
  }
}
