import "server-only";

/** Chart traces of a check: both curves per quantity and their difference, against increment. */
import type { ResultColumns } from "@/lib/mechanics/types";

import type { History } from "./read-history";
import type { ComparedQuantity } from "./types";

export interface Trace {
  name: string;
  x: number[];
  y: number[];
  dash?: boolean;
}

/** Enough points for a chart; the CSV download keeps every increment. */
const MAX_POINTS = 4000;

export function conformanceTraces(
  history: History,
  columns: ResultColumns,
  rowOf: Int32Array,
  quantities: ComparedQuantity[],
): { stresses: Trace[]; damage: Trace[]; differences: Trace[] } {
  const stride = Math.max(1, Math.ceil(history.rows / MAX_POINTS));
  const picks: number[] = [];
  for (let i = 0; i < history.rows; i += stride) if (rowOf[i] >= 0) picks.push(i);
  const x = picks.map((i) => (history.increment ? history.increment[i] : i));
  const stresses: Trace[] = [];
  const damage: Trace[] = [];
  const differences: Trace[] = [];
  for (const q of quantities) {
    const theirs = history[q];
    if (!theirs) continue;
    const ours = columns[q];
    const curves = q === "d1" || q === "d2" ? damage : stresses;
    curves.push({ name: `${q} uploaded`, x, y: picks.map((i) => theirs[i]) });
    curves.push({ name: `${q} Craquelure`, x, y: picks.map((i) => ours[rowOf[i]]), dash: true });
    differences.push({
      name: `${q} difference`,
      x,
      y: picks.map((i) => theirs[i] - ours[rowOf[i]]),
    });
  }
  return { stresses, damage, differences };
}
