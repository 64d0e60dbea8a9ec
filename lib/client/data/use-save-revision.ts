"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";

import type { ScenarioFileJson } from "@/lib/client/loading-desk/scenario-state";

import { apiFetch } from "./api-fetch";
import { teamApi } from "./api-urls";
import { workspaceKeys } from "./query-keys";
import type { CreateScenarioResponse, SaveRevisionResponse } from "./types";

export interface SaveRevisionVars {
  baseRevision: number;
  message: string;
  file: ScenarioFileJson;
}

/** A new revision on top of `baseRevision`; a 409 comes back as an ApiError (see conflict.ts). */
export function useSaveRevision(slug: string, scenarioId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (vars: SaveRevisionVars) =>
      apiFetch<SaveRevisionResponse>(teamApi(slug).revisions(scenarioId), {
        method: "POST",
        body: vars,
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: workspaceKeys.team(slug) }),
  });
}

export interface CreateScenarioVars {
  name: string;
  materialLabel: string;
  tags: string[];
  message: string;
  file: ScenarioFileJson;
}

/**
 * The one way the browser creates a scenario with its revision 1 (POST …/scenarios). The new
 * scenario page calls it through useCreateScenario; the sandbox's "Save to team…" calls it
 * directly because its team is chosen in the form, not known when the page opens.
 */
export function createScenarioIn(slug: string, vars: CreateScenarioVars) {
  return apiFetch<CreateScenarioResponse>(teamApi(slug).scenarios(), {
    method: "POST",
    body: vars,
  });
}

export function useCreateScenario(slug: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (vars: CreateScenarioVars) => createScenarioIn(slug, vars),
    onSuccess: () => client.invalidateQueries({ queryKey: workspaceKeys.team(slug) }),
  });
}
