"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";

import { apiFetch } from "./api-fetch";
import { teamApi } from "./api-urls";
import { workspaceKeys } from "./query-keys";
import type { ScenarioSummary } from "./types";

export interface ScenarioDetails {
  name: string;
  materialLabel: string;
  tags: string[];
}

/** Rename, relabel or retag; the revisions stay as they were saved. */
export function useUpdateScenario(slug: string, scenarioId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (details: ScenarioDetails) =>
      apiFetch<ScenarioSummary>(teamApi(slug).scenario(scenarioId), {
        method: "PATCH",
        body: details,
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: workspaceKeys.team(slug) }),
  });
}

export function useDeleteScenario(slug: string, scenarioId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () =>
      apiFetch<{ deleted: string }>(teamApi(slug).scenario(scenarioId), { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: workspaceKeys.team(slug) }),
  });
}
