/**
 * What the request thread hands a compute worker, and what comes back. Types only: both sides
 * import this file, and nothing here may pull runtime code across the thread boundary.
 */
import type { MessagePort } from "node:worker_threads";

import type { IdentifyOptions } from "@/lib/calibration/identify";
import type { Bounds, FittableParam } from "@/lib/calibration/refine-params";
import type { RecordPoints, TestRecordInput } from "@/lib/calibration/types";
import type { CsvError } from "@/lib/csv/csv-error";
import type { CurvePoints } from "@/lib/csv/extract-points";
import type { Conversion } from "@/lib/csv/convert-quantities";
import type { FileLayout } from "@/lib/csv/file-layout";
import type { RecordMappingInput } from "@/lib/csv/record-mapping";
import type { ColumnMappingChoice, TestType } from "@/lib/csv/record-schema";
import type { Leg, MaterialParams } from "@/lib/mechanics/types";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import type { Scenario } from "@/lib/scenario/scenario-schema";
import type { BundleIdentity } from "@/lib/server/handoff/bundle/note";
import type { ConformanceTolerance } from "@/lib/server/handoff/conformance/types";
import type { HistoryMapping } from "@/lib/server/handoff/conformance/upload-schema";
import type { RunRequest } from "@/lib/server/handoff/runs/run-request";

export type ComputeTask =
  | {
      kind: "run";
      request: RunRequest;
      /** Back-pressure (chunk-credit.ts); without it the worker posts as fast as it formats. */
      credit?: Int32Array;
    }
  | { kind: "report-curves"; sets: ParameterSet[]; legs: Leg[]; perSetBudgetMs: number }
  | {
      kind: "conformance";
      scenario: Scenario;
      setId: string | undefined;
      text: string;
      tolerance: ConformanceTolerance;
      mapping: HistoryMapping | undefined;
    }
  | {
      kind: "replay-residuals";
      params: MaterialParams;
      records: { id: string; input: { testType: TestType; points: RecordPoints } }[];
    }
  | { kind: "identify"; records: TestRecordInput[]; options: IdentifyOptions }
  | {
      kind: "fit-uncertainty";
      params: MaterialParams;
      records: TestRecordInput[];
      free: FittableParam[];
      bounds: Bounds | undefined;
    }
  | { kind: "read-curve-csv"; text: string; mapping: RecordMappingInput }
  | {
      kind: "reference-bundle";
      file: Record<string, unknown>;
      scenario: Scenario;
      identity: BundleIdentity;
    };

/** What a "read-curve-csv" task sends back: only what an upload stores, not the table's cells. */
export type CurveCsvOutcome =
  | {
      ok: true;
      points: CurvePoints;
      headers: string[];
      warnings: string[];
      layout: FileLayout;
      choice: ColumnMappingChoice;
      conversion: Conversion;
    }
  | { ok: false; error: CsvError };

/** A task as posted: the port carries "start" and, for runs, the streamed output. */
export type PostedTask = ComputeTask & { port: MessagePort };

/** An expected error rebuilt on the request thread (class identity does not cross threads). */
export interface SentAppError {
  code: string;
  message: string;
  field?: string;
  details?: Record<string, unknown>;
}

export type TaskOutcome<T = unknown> = { ok: true; value: T } | { ok: false; error: SentAppError };

export type PortMessage =
  | { type: "start" }
  | { type: "head"; warnings: string[] }
  | { type: "chunk"; bytes: Uint8Array }
  | { type: "end" };
