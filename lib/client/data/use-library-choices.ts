"use client";

import { useMemo } from "react";

import { type LibraryChoice, toLibraryChoice } from "@/lib/client/sets/library-choice";

import { useParameterSets } from "./use-parameter-sets";

/** The team's library as the set picker offers it; empty while loading or when unreadable. */
export function useLibraryChoices(slug: string): LibraryChoice[] {
  const sets = useParameterSets(slug);
  return useMemo(() => (sets.data?.items ?? []).map((s) => toLibraryChoice(s)), [sets.data]);
}
