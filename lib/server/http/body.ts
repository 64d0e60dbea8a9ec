import "server-only";

import { AppError } from "@/lib/shared/errors";
import { findTooDeep, tooDeepMessage } from "@/lib/shared/json-depth";

import { formatBytes } from "./body-limits";

export { BODY_LIMITS } from "./body-limits";

/** 413 in the user's words: how big the upload is (when known) and what this route takes. */
function tooLarge(limit: number, size: number | null): AppError {
  const what = size === null ? `more than ${formatBytes(limit)}` : formatBytes(size);
  return new AppError(
    "invalid:too-large",
    `The upload is ${what}; this route takes at most ${formatBytes(limit)}.`,
  );
}

/**
 * Reads a JSON body up to `limit` bytes. The stream is cut off at the limit, so a client that
 * lies about Content-Length cannot make the server buffer more than that.
 */
export async function readJsonBody(
  request: Request,
  limit: number,
  options: { optional?: boolean } = {},
): Promise<unknown> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > limit) throw tooLarge(limit, declared);
  const reader = request.body?.getReader();
  if (!reader) {
    if (options.optional) return undefined;
    throw new AppError("invalid:body", "Send a JSON body.");
  }
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    // A client that hangs up mid-body is a bad request, not a server fault.
    const { done, value } = await reader.read().catch(() => {
      throw new AppError("invalid:body", "The request body could not be read.");
    });
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw tooLarge(limit, null);
    }
    chunks.push(value);
  }
  const text = new TextDecoder().decode(Buffer.concat(chunks));
  if (text.trim() === "") {
    if (options.optional) return undefined;
    throw new AppError("invalid:body", "Send a JSON body.");
  }
  const tooDeep = findTooDeep(text);
  if (tooDeep) throw new AppError("invalid:json", tooDeepMessage(tooDeep));
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError("invalid:json", "The request body is not valid JSON.");
  }
  const broken = findBrokenText(value, "");
  if (broken !== null) {
    // PostgreSQL refuses such text; saying so here beats a failed save.
    throw new AppError(
      "invalid:json",
      `The text ${broken ? `in “${broken}” ` : ""}holds a broken character (half of a surrogate pair); retype it.`,
    );
  }
  return value;
}

/** A lone UTF-16 surrogate: `\p{Cs}` matches only unpaired halves in a `u` regex. */
const LONE_SURROGATE = /\p{Cs}/u;

/** The dotted path of the first string (key or value) with a lone surrogate, or null. */
function findBrokenText(value: unknown, path: string): string | null {
  if (typeof value === "string") return LONE_SURROGATE.test(value) ? path : null;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const found = findBrokenText(value[i], path ? `${path}.${i + 1}` : String(i + 1));
      if (found !== null) return found;
    }
    return null;
  }
  if (value && typeof value === "object") {
    for (const [key, item] of Object.entries(value)) {
      const at = path ? `${path}.${key}` : key;
      if (LONE_SURROGATE.test(key)) return path;
      const found = findBrokenText(item, at);
      if (found !== null) return found;
    }
  }
  return null;
}
