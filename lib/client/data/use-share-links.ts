"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";

import { apiFetch } from "./api-fetch";
import { teamApi } from "./api-urls";
import { workspaceKeys } from "./query-keys";
import type { CreateShareLinkResponse, ShareLinkListResponse } from "./types";

export function useShareLinks(slug: string, scenarioId: string) {
  return useQuery({
    queryKey: workspaceKeys.shareLinks(slug, scenarioId),
    queryFn: () => apiFetch<ShareLinkListResponse>(teamApi(slug).shareLinks(scenarioId)),
  });
}

export function useCreateShareLink(slug: string, scenarioId: string, number: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (expiresInDays: number) =>
      apiFetch<CreateShareLinkResponse>(teamApi(slug).createShareLink(scenarioId, number), {
        method: "POST",
        body: { expiresInDays },
      }),
    onSettled: () =>
      client.invalidateQueries({ queryKey: workspaceKeys.shareLinks(slug, scenarioId) }),
  });
}

export function useRevokeShareLink(slug: string, scenarioId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (linkId: string) =>
      apiFetch<{ revoked: string }>(teamApi(slug).shareLink(linkId), { method: "DELETE" }),
    onSettled: () =>
      client.invalidateQueries({ queryKey: workspaceKeys.shareLinks(slug, scenarioId) }),
  });
}
