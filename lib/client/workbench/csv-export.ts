/**
 * CSV downloads: one set with exactly the contract's columns (scenario-file.md), or all sets in
 * one file with a first column `set` naming the set of each row, then the same columns.
 */
import { resultsToCsv } from "@/lib/scenario/results-csv";
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
    for (let i = 1; i < lines.length; i++) if (lines[i]) parts.push(`${id},${lines[i]}`);
  }
  return `${header}\n${parts.join("\n")}\n`;
}
