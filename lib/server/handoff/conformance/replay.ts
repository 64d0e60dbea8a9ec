import "server-only";

/**
 * Replays a history's strains through the driver: one strain-controlled leg per row, one
 * increment each, so Craquelure answers at exactly the uploaded strain states. A first row at
 * zero strain is taken as the initial state (the driver's increment 0).
 */
import { runPath } from "@/lib/mechanics/driver";
import type { Leg, MaterialParams, ResultColumns } from "@/lib/mechanics/types";

import type { History } from "./read-history";

export interface Replay {
  columns: ResultColumns;
  /** Row of `columns` that answers each history row (-1 when the run stopped before it). */
  rowOf: Int32Array;
  stoppedAtRow: number | null;
}

export function replayHistory(params: MaterialParams, history: History): Replay {
  const e11 = history.eps11!;
  const e22 = history.eps22!;
  const g12 = history.gam12!;
  const startsAtZero = e11[0] === 0 && e22[0] === 0 && g12[0] === 0;
  const first = startsAtZero ? 1 : 0;
  const legs: Leg[] = [];
  for (let i = first; i < history.rows; i++) {
    legs.push({
      control: ["strain", "strain", "strain"],
      target: [e11[i], e22[i], g12[i]],
      increments: 1,
    });
  }
  if (legs.length === 0) {
    legs.push({ control: ["strain", "strain", "strain"], target: [0, 0, 0], increments: 1 });
  }
  const result = runPath(params, legs);
  const rowOf = new Int32Array(history.rows);
  for (let i = 0; i < history.rows; i++) {
    const row = startsAtZero ? i : i + 1;
    rowOf[i] = row < result.rows ? row : -1;
  }
  return { columns: result.columns, rowOf, stoppedAtRow: result.status.stoppedAtIncrement };
}
