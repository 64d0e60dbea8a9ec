"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";

import { apiFetch } from "./api-fetch";
import { teamApi } from "./api-urls";
import { workspaceKeys } from "./query-keys";
import type { ParameterSetListResponse, ParameterSetResponse, ParameterSetView } from "./types";

export function useParameterSets(slug: string, initial?: ParameterSetListResponse) {
  return useQuery({
    queryKey: workspaceKeys.parameterSets(slug),
    queryFn: () => apiFetch<ParameterSetListResponse>(teamApi(slug).parameterSets()),
    initialData: initial,
  });
}

/** One set with its versions (the history); fetched when its row is opened. */
export function useParameterSet(slug: string, id: string, enabled = true) {
  return useQuery({
    queryKey: [...workspaceKeys.parameterSets(slug), id] as const,
    queryFn: () => apiFetch<ParameterSetResponse>(teamApi(slug).parameterSet(id)),
    enabled,
  });
}

export function useRenameParameterSet(slug: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, name }: { id: string; name: string }) =>
      apiFetch<ParameterSetView>(teamApi(slug).parameterSet(id), {
        method: "PATCH",
        body: { name },
      }),
    onSettled: () => client.invalidateQueries({ queryKey: workspaceKeys.parameterSets(slug) }),
  });
}

/** New values are a new version of the set (the server keeps the previous one). */
export function useEditParameterSetValues(slug: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, values }: { id: string; values: Record<string, unknown> }) =>
      apiFetch<ParameterSetResponse>(teamApi(slug).parameterSet(id), {
        method: "PATCH",
        body: { values },
      }),
    onSettled: () => client.invalidateQueries({ queryKey: workspaceKeys.parameterSets(slug) }),
  });
}

export function useDeleteParameterSet(slug: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<{ deleted: string }>(teamApi(slug).parameterSet(id), { method: "DELETE" }),
    onSettled: () => client.invalidateQueries({ queryKey: workspaceKeys.parameterSets(slug) }),
  });
}
