import "server-only";

/**
 * The downloadable record of a check: a comment block with the verdict, tolerance and the
 * caution, then per increment the uploaded value, Craquelure's value and their difference.
 */
import type { ResultColumns } from "@/lib/mechanics/types";
import { CAUTION_LINES } from "@/lib/shared/caution";
import { csvRow, type CsvValue } from "@/lib/shared/csv-writer";

import type { History } from "./read-history";
import type { ConformanceResult } from "./types";

export function differencesCsv(
  result: ConformanceResult,
  history: History,
  columns: ResultColumns,
  rowOf: Int32Array,
): string {
  const q = result.quantities.map((c) => c.quantity);
  // Each comment line is one cell, so a comma or quote in the set id cannot shift the columns.
  const comments = [
    `# Craquelure conformance check, parameter set ${result.setId}: ${result.passed ? "PASS" : "FAIL"}`,
    `# tolerance: stresses ${result.tolerance.stressFraction * 100} % of peak stress ${result.peakStress} MPa; damage ${result.tolerance.damage}`,
    ...result.quantities.map(
      (c) =>
        `# ${c.quantity}: max abs ${c.maxAbs}, RMS ${c.rms}, max rel ${c.maxRel}, first increment beyond tolerance ${c.firstFailIncrement ?? "none"}`,
    ),
    ...CAUTION_LINES.map((l) => `# ${l}`),
  ];
  const lines = [
    ...comments.map((c) => csvRow([c])),
    csvRow([
      "increment",
      ...q.flatMap((n) => [`${n}_uploaded`, `${n}_craquelure`, `${n}_difference`]),
    ]),
  ];
  for (let i = 0; i < history.rows; i++) {
    const row = rowOf[i];
    const cells: CsvValue[] = [history.increment ? history.increment[i] : i];
    for (const n of q) {
      const theirs = history[n]![i];
      const ours = row >= 0 ? columns[n][row] : NaN;
      cells.push(theirs, row >= 0 ? ours : null, row >= 0 ? theirs - ours : null);
    }
    lines.push(csvRow(cells));
  }
  return lines.join("\n") + "\n";
}
