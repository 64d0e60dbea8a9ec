import "server-only";

/**
 * A single-point history from a finite-element implementation, read with the same CSV reader
 * as test records (delimiter, decimal comma, limits, line numbers). Strains in mm/mm
 * (engineering shear), stresses in MPa, as the command-line contract writes them. Columns are
 * mapped by the user, or found by their header names.
 */
import { headerName } from "@/lib/csv/column-mapping";
import { csvError, type CsvError } from "@/lib/csv/csv-error";
import { parseCurveTable } from "@/lib/csv/parse-table";

import {
  HISTORY_CHANNELS,
  REQUIRED_CHANNELS,
  type HistoryChannel,
  type HistoryMapping,
} from "./upload-schema";

export type History = Partial<Record<HistoryChannel, Float64Array>> & {
  rows: number;
  /** Physical line of each row, for messages. */
  lines: Int32Array;
};

/**
 * Header names found without the user's help: the contract's own columns, the symbols the product
 * shows and plain words, compared without case, spaces, "_" or "-" and without a trailing unit.
 * `step` is our own version-1 name of the increment column. Anything else is mapped by the user.
 */
export const HISTORY_HEADER_ALIASES: Readonly<Record<HistoryChannel, readonly string[]>> = {
  increment: ["increment", "step"],
  eps11: ["eps11", "ε11", "strain11"],
  eps22: ["eps22", "ε22", "strain22"],
  gam12: ["gam12", "γ12", "shear12", "shearstrain12", "gamma12"],
  sig11: ["sig11", "σ11", "stress11", "sigma11"],
  sig22: ["sig22", "σ22", "stress22", "sigma22"],
  sig12: ["sig12", "σ12", "τ12", "stress12", "shearstress12", "sigma12", "tau12"],
  d1: ["d1", "damage1"],
  d2: ["d2", "damage2"],
};

/** A header as compared with the aliases: no unit, no case, no spaces, "_" or "-". */
function headerKey(header: string): string {
  return headerName(header).replace(/[\s_-]+/g, "");
}

function suggestHistoryMapping(headers: string[]): HistoryMapping {
  const mapping: HistoryMapping = {};
  for (const channel of HISTORY_CHANNELS) {
    const index = headers.findIndex((h) => HISTORY_HEADER_ALIASES[channel].includes(headerKey(h)));
    if (index >= 0) mapping[channel] = index;
  }
  return mapping;
}

export type HistoryResult = { ok: true; history: History } | { ok: false; error: CsvError };

export function readHistory(text: string, chosen?: HistoryMapping): HistoryResult {
  const parsed = parseCurveTable(text);
  if (!parsed.ok) return parsed;
  const { table } = parsed;
  const mapping = chosen ?? suggestHistoryMapping(table.headers);
  const missing = REQUIRED_CHANNELS.filter((c) => mapping[c] === undefined);
  if (missing.length > 0) {
    return {
      ok: false,
      error: csvError(
        "mapping",
        `no column for ${missing.join(", ")}; name the headers eps11, eps22, gam12, sig11, sig22, sig12 (or strain11, strain22, shear12, stress11, stress22, stress12; increment, d1 and d2 optional) or map them.`,
      ),
    };
  }
  if (table.rowCount === 0)
    return { ok: false, error: csvError("no-data", "the file has no data rows.") };
  const history: History = { rows: table.rowCount, lines: table.lines };
  for (const channel of HISTORY_CHANNELS) {
    const index = mapping[channel];
    if (index === undefined) continue;
    if (index >= table.headers.length) {
      return {
        ok: false,
        error: csvError(
          "mapping",
          `${channel} is mapped to column ${index + 1}, but the file has ${table.headers.length} columns.`,
        ),
      };
    }
    const bad = table.firstBadCell[index];
    if (bad) {
      const what = bad.raw.trim() === "" ? "is empty" : `"${bad.raw.slice(0, 40)}" is not a number`;
      return { ok: false, error: csvError("not-a-number", what, bad.line, table.headers[index]) };
    }
    history[channel] = table.columns[index];
  }
  return { ok: true, history };
}
