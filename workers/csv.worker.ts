/// <reference lib="webworker" />
/**
 * The CSV worker: parses a test-curve file off the main thread for the upload's preview and
 * mapping step. Wiring only; the logic is lib/shared/records/csv-preview.ts (lib/csv underneath).
 */
import * as Comlink from "comlink";

import type { RecordMappingInput } from "@/lib/csv/record-mapping";
import { previewCsv } from "@/lib/shared/records/csv-preview";

const api = {
  preview(text: string, mapping?: RecordMappingInput) {
    return previewCsv(text, mapping);
  },
};

export type CsvWorkerApi = typeof api;

Comlink.expose(api);
