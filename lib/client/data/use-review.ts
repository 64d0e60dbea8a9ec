"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";

import { apiFetch } from "./api-fetch";
import { teamApi } from "./api-urls";
import { workspaceKeys } from "./query-keys";
import type { ReviewActionInput, ReviewActionResponse, ReviewHistoryResponse } from "./types";

export function useReview(slug: string, scenarioId: string, number: number) {
  return useQuery({
    queryKey: workspaceKeys.review(slug, scenarioId, number),
    queryFn: () => apiFetch<ReviewHistoryResponse>(teamApi(slug).review(scenarioId, number)),
  });
}

/** Moves the review; afterwards the revision list and the team's scenario table refresh too. */
export function useReviewAction(slug: string, scenarioId: string, number: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: ReviewActionInput) =>
      apiFetch<ReviewActionResponse>(teamApi(slug).review(scenarioId, number), {
        method: "POST",
        body: input,
      }),
    onSuccess: (data) => {
      client.setQueryData(workspaceKeys.review(slug, scenarioId, number), {
        revision: data.revision,
        history: data.history,
      });
    },
    onSettled: () => client.invalidateQueries({ queryKey: workspaceKeys.team(slug) }),
  });
}
