"use client";

import { useQuery } from "@tanstack/react-query";

import { apiFetch } from "./api-fetch";
import { teamApi } from "./api-urls";
import { workspaceKeys } from "./query-keys";
import type { RevisionDiffResponse, RevisionListResponse } from "./types";

export function useRevisions(slug: string, scenarioId: string, initial?: RevisionListResponse) {
  return useQuery({
    queryKey: workspaceKeys.revisions(slug, scenarioId),
    queryFn: () => apiFetch<RevisionListResponse>(teamApi(slug).revisions(scenarioId)),
    initialData: initial,
  });
}

export function useRevisionDiff(slug: string, scenarioId: string, from: number, to: number) {
  return useQuery({
    queryKey: workspaceKeys.diff(slug, scenarioId, from, to),
    queryFn: () => apiFetch<RevisionDiffResponse>(teamApi(slug).diff(scenarioId, from, to)),
    enabled: from > 0 && to > 0 && from !== to,
    // Revisions never change once saved: a diff stays true forever.
    staleTime: Infinity,
  });
}
