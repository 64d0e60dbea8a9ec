"use client";

import * as Comlink from "comlink";
import { useEffect, useRef, useState } from "react";

import type { RecordMappingInput } from "@/lib/csv/record-mapping";
import type { PreviewResult } from "@/lib/shared/records/csv-preview";
import type { CsvWorkerApi } from "@/workers/csv.worker";

/** Parses `text` in the CSV worker whenever the text or the mapping changes. */
export function useCsvPreview(text: string | null, mapping: RecordMappingInput | undefined) {
  const api = useRef<Comlink.Remote<CsvWorkerApi> | null>(null);
  const [result, setResult] = useState<PreviewResult | null>(null);
  const key = JSON.stringify(mapping ?? null);

  useEffect(() => {
    const worker = new Worker(new URL("./csv.worker.ts", import.meta.url), {
      name: "csv",
    });
    api.current = Comlink.wrap<CsvWorkerApi>(worker);
    return () => {
      api.current = null;
      worker.terminate();
    };
  }, []);

  useEffect(() => {
    if (text === null || !api.current) return;
    let live = true;
    const chosen = JSON.parse(key) as RecordMappingInput | null;
    api.current.preview(text, chosen ?? undefined).then(
      (r) => live && setResult(r),
      () => live && setResult(null),
    );
    return () => {
      live = false;
    };
  }, [text, key]);

  return result;
}
