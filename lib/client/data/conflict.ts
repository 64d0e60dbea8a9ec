import { ApiError } from "./api-fetch";
import type { PersonRef } from "./types";

/** What a 409 on save tells: the newer revision, who saved it and when. */
export interface SaveConflict {
  base: number;
  latest: number;
  author: string;
  at: string | null;
  message: string;
}

/** Reads the 409 conflict:revision answer; any other error is not a conflict (null). */
export function saveConflictOf(error: unknown, base: number): SaveConflict | null {
  if (!(error instanceof ApiError) || error.code !== "conflict:revision") return null;
  const latest = error.details.latest as
    { number?: unknown; author?: PersonRef | null; at?: unknown } | undefined;
  const number = typeof latest?.number === "number" ? latest.number : base + 1;
  return {
    base,
    latest: number,
    author: latest?.author?.name ?? "someone",
    at: typeof latest?.at === "string" ? latest.at : null,
    message: error.message,
  };
}
