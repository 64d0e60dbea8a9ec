"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";

import { apiFetch } from "./api-fetch";
import { teamApi } from "./api-urls";
import { workspaceKeys } from "./query-keys";
import type { ScenarioListResponse } from "./types";

/** One page of the scenarios table; the previous page stays on screen while the next loads. */
export function useScenarioList(
  slug: string,
  query: string,
  initial?: { query: string; data: ScenarioListResponse },
) {
  return useQuery({
    queryKey: workspaceKeys.scenarioList(slug, query),
    queryFn: () => apiFetch<ScenarioListResponse>(teamApi(slug).scenarios(query)),
    initialData: initial && initial.query === query ? initial.data : undefined,
    placeholderData: keepPreviousData,
  });
}
