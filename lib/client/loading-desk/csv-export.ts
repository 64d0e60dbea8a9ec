/**
 * CSV downloads: one set with exactly the contract's columns (scenario-file.md), or all sets in
 * one file with a first column `set` naming the set of each row, then the same columns.
 */
import { resultsToCsv } from "@/lib/scenario/results-csv";
import { csvText } from "@/lib/shared/csv-writer";
import type { ResultBuffer } from "./result-buffer";

export function setCsv(buffer: ResultBuffer): string {
  return resultsToCsv(buffer.columns, buffer.rows);
}

export function allSetsCsv(sets: { id: string; buffer: ResultBuffer }[]): string {
  let header = "";
  const parts: string[] = [];
  for (const { id, buffer } of sets) {
    const lines = setCsv(buffer).split("\n");
    header = `set,${lines[0]}`;
    // The result lines are numbers only; the set id is the one text cell and is quoted as needed.
    const idCell = csvText(id);
    for (let i = 1; i < lines.length; i++) if (lines[i]) parts.push(`${idCell},${lines[i]}`);
  }
  return `${header}\n${parts.join("\n")}\n`;
}
