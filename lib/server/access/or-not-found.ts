import "server-only";

import { notFound } from "next/navigation";

import { isAppError } from "@/lib/shared/errors";
import { isComputeRefusal } from "@/lib/server/compute/errors";

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

export type PageCompute<T> = { ok: true; value: T } | { ok: false; message: string };

/**
 * As orNotFound, for a page whose service computes in the pool: a full pool or a task over its
 * budget is not a missing page, so its message comes back for the page to show.
 */
export async function orNotFoundOrBusy<T>(promise: Promise<T>): Promise<PageCompute<T>> {
  try {
    return { ok: true, value: await promise };
  } catch (error) {
    if (isComputeRefusal(error)) return { ok: false, message: error.message };
    if (isAppError(error)) notFound();
    throw error;
  }
}
