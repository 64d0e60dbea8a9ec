import "server-only";

import { notFound } from "next/navigation";

import { isAppError } from "@/lib/shared/errors";

/**
 * Awaits a service call for a page: an expected refusal (unknown, foreign or forbidden ids,
 * expired links) becomes the not-found page, so pages reveal nothing about what exists;
 * anything unexpected is rethrown for the error boundary.
 */
export async function orNotFound<T>(promise: Promise<T>): Promise<T> {
  try {
    return await promise;
  } catch (error) {
    if (isAppError(error)) notFound();
    throw error;
  }
}
