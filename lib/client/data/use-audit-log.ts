"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";

import { apiFetch } from "./api-fetch";
import { teamApi } from "./api-urls";
import { workspaceKeys } from "./query-keys";
import type { AuditLogResponse } from "./types";

export function useAuditLog(slug: string, page: number, initial?: AuditLogResponse) {
  return useQuery({
    queryKey: workspaceKeys.audit(slug, page),
    queryFn: () => apiFetch<AuditLogResponse>(teamApi(slug).audit(page)),
    initialData: initial && initial.page === page ? initial : undefined,
    placeholderData: keepPreviousData,
  });
}
