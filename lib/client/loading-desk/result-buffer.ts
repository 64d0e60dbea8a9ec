/**
 * Main-thread copy of one run's results, filled chunk by chunk as the worker sends them.
 * Struct of arrays sized for the whole path; `rows` says how many are filled.
 */
import {
  RESULT_COLUMNS,
  type ResultColumn,
  type ResultColumns,
  type RunStatus,
} from "@/lib/mechanics/types";

/** One slice of rows sent by the worker (columns are transferable buffers). */
export interface ResultChunk {
  from: number;
  count: number;
  columns: Record<ResultColumn, Float64Array>;
}

export class ResultBuffer {
  readonly columns: ResultColumns;
  rows = 0;
  status: RunStatus | null = null;

  constructor(readonly capacity: number) {
    const cols = {} as ResultColumns;
    for (const name of RESULT_COLUMNS) cols[name] = new Float64Array(capacity);
    this.columns = cols;
  }

  get done(): boolean {
    return this.status !== null;
  }

  append(chunk: ResultChunk): void {
    if (chunk.from !== this.rows)
      throw new Error(`chunk starts at ${chunk.from}, expected ${this.rows}`);
    if (chunk.from + chunk.count > this.capacity) throw new Error("chunk overruns the buffer");
    for (const name of RESULT_COLUMNS)
      this.columns[name].set(chunk.columns[name].subarray(0, chunk.count), chunk.from);
    this.rows += chunk.count;
  }

  finish(status: RunStatus): void {
    this.status = status;
  }
}

/** Copies rows [from, from+count) of struct-of-arrays columns into fresh transferable arrays. */
export function sliceChunk(columns: ResultColumns, from: number, count: number): ResultChunk {
  const out = {} as Record<ResultColumn, Float64Array>;
  for (const name of RESULT_COLUMNS) out[name] = columns[name].slice(from, from + count);
  return { from, count, columns: out };
}

/** The buffers of a chunk, for Comlink.transfer / postMessage. */
export function chunkTransferables(chunk: ResultChunk): ArrayBuffer[] {
  return RESULT_COLUMNS.map((name) => chunk.columns[name].buffer as ArrayBuffer);
}
