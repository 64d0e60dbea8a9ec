/**
 * summary.csv of a parameter study's results zip: one line per set with its state. Through the
 * shared CSV writer, so a set id or label such as `=cmd|' /C calc'!A0` opens as text and a comma
 * or quote in it stays inside its cell (issue 12 item 4).
 */
import { csvLines, type CsvValue } from "./csv-writer";

export type StudySummaryRow = {
  position: number;
  set: { id: string; label: string };
  state: string;
  status: { failed: boolean; failMode: string | null; stoppedAtIncrement: number | null } | null;
  error: string | null;
};

export const STUDY_SUMMARY_HEADER = [
  "position",
  "set",
  "label",
  "state",
  "failed",
  "failMode",
  "stoppedAtIncrement",
  "error",
] as const;

export function studySummaryCsv(rows: readonly StudySummaryRow[]): string {
  const lines: CsvValue[][] = [[...STUDY_SUMMARY_HEADER]];
  for (const row of rows) {
    lines.push([
      row.position + 1,
      row.set.id,
      row.set.label,
      row.state,
      row.status?.failed,
      row.status?.failMode,
      row.status?.stoppedAtIncrement,
      row.error,
    ]);
  }
  return csvLines(lines);
}
