/**
 * JSON form of a run (scenario-file.md): `{ set, columns: { <name>: [...] }, status }` with the
 * contract's column names and status fields (failed, failMode, stoppedAtIncrement).
 */
import { RESULT_COLUMNS, type ResultColumns, type RunStatus } from "@/lib/mechanics/types";

/** JSON has no NaN or Infinity; the core should never produce them, but stay valid JSON if it does. */
function jsonNumber(x: number): string {
  return Number.isFinite(x) ? String(x) : "null";
}

/** The JSON text in pieces (one or more per column), for large runs. */
export function* resultsJsonChunks(
  setId: string,
  columns: ResultColumns,
  rows: number,
  status: RunStatus,
  valuesPerChunk = 65536,
): Generator<string> {
  let chunk = `{"set":${JSON.stringify(setId)},"columns":{`;
  for (let c = 0; c < RESULT_COLUMNS.length; c++) {
    const name = RESULT_COLUMNS[c];
    const values = columns[name];
    chunk += `${c === 0 ? "" : ","}${JSON.stringify(name)}:[`;
    for (let r = 0; r < rows; r++) {
      chunk += (r === 0 ? "" : ",") + jsonNumber(values[r]);
      if ((r + 1) % valuesPerChunk === 0) {
        yield chunk;
        chunk = "";
      }
    }
    chunk += "]";
  }
  const { failed, failMode, stoppedAtIncrement } = status;
  chunk += `},"status":${JSON.stringify({ failed, failMode, stoppedAtIncrement })}}\n`;
  yield chunk;
}

/** The whole JSON document as one string (ends with a newline). */
export function resultsToJson(
  setId: string,
  columns: ResultColumns,
  rows: number,
  status: RunStatus,
): string {
  let out = "";
  for (const chunk of resultsJsonChunks(setId, columns, rows, status)) out += chunk;
  return out;
}
