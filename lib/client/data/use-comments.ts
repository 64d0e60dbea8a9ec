"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";

import { apiFetch } from "./api-fetch";
import { teamApi } from "./api-urls";
import { type NewComment, withPendingComment } from "./optimistic-comments";
import { workspaceKeys } from "./query-keys";
import type { CommentListResponse, PersonRef } from "./types";

export function useComments(slug: string, scenarioId: string, number: number) {
  return useQuery({
    queryKey: workspaceKeys.comments(slug, scenarioId, number),
    queryFn: () => apiFetch<CommentListResponse>(teamApi(slug).comments(scenarioId, number)),
  });
}

/**
 * Adds a comment optimistically: it shows at once (marked as sending), the server's threads
 * replace it on success, and a failure puts the previous threads back.
 */
export function useAddComment(slug: string, scenarioId: string, number: number, me: PersonRef) {
  const client = useQueryClient();
  const key = workspaceKeys.comments(slug, scenarioId, number);
  return useMutation({
    mutationFn: (input: NewComment) =>
      apiFetch<CommentListResponse & { id: string }>(teamApi(slug).comments(scenarioId, number), {
        method: "POST",
        body: input,
      }),
    onMutate: async (input) => {
      await client.cancelQueries({ queryKey: key });
      const previous = client.getQueryData<CommentListResponse>(key);
      const items = withPendingComment(
        previous?.items ?? [],
        input,
        me,
        String(Date.now()),
        new Date().toISOString(),
      );
      client.setQueryData<CommentListResponse>(key, { items });
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) client.setQueryData(key, context.previous);
    },
    onSuccess: (data) => client.setQueryData<CommentListResponse>(key, { items: data.items }),
    onSettled: () => client.invalidateQueries({ queryKey: key }),
  });
}
