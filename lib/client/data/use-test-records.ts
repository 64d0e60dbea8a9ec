"use client";

import { useQueries, useQuery, type UseQueryResult } from "@tanstack/react-query";

import type { TestRecordListResponse, TestRecordResponse } from "@/lib/server/records/records";
import { recordOverlay } from "@/lib/client/loading-desk/record-overlay";
import type { ChartOverlay } from "@/lib/client/loading-desk/chart-overlays";

import { ApiError, apiFetch, messageOf } from "./api-fetch";
import { teamApi } from "./api-urls";
import { workspaceKeys } from "./query-keys";

/** The team's test records, newest first, without points. */
export function useTestRecords(slug: string) {
  return useQuery({
    queryKey: workspaceKeys.testRecords(slug),
    queryFn: () => apiFetch<TestRecordListResponse>(teamApi(slug).testRecords()),
  });
}

export interface RecordOverlays {
  overlays: ChartOverlay[];
  loading: boolean;
  errors: string[];
  /** Positions (in the chosen order) of records the team does not hold: deleted, or never here. */
  missing: number[];
}

const isGone = (error: unknown) => error instanceof ApiError && error.status === 404;

// Module-level so TanStack Query keeps the combined result between renders while nothing changed.
function combine(results: UseQueryResult<ChartOverlay | null>[]): RecordOverlays {
  return {
    overlays: results.flatMap((r) => (r.data ? [r.data] : [])),
    loading: results.some((r) => r.isPending),
    errors: results.flatMap((r) => (r.error && !isGone(r.error) ? [messageOf(r.error)] : [])),
    missing: results.flatMap((r, k) => (isGone(r.error) ? [k] : [])),
  };
}

/** The chosen records as chart overlays, in the order chosen; each record is fetched once. */
export function useRecordOverlays(slug: string, ids: readonly string[]): RecordOverlays {
  return useQueries({
    queries: ids.map((id) => ({
      queryKey: workspaceKeys.testRecord(slug, id),
      queryFn: () => apiFetch<TestRecordResponse>(teamApi(slug).testRecord(id)),
      select: recordOverlay,
      // A record's points never change after upload.
      staleTime: Infinity,
    })),
    combine,
  });
}
