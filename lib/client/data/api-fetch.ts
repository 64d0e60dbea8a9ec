/** The JSON API's error as the browser sees it: status, stable code, message for the user. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export const OFFLINE_MESSAGE = "The server could not be reached; nothing was changed.";

/** Turns a parsed error body (or nothing) into an ApiError; unknown shapes get a plain message. */
export function toApiError(status: number, body: unknown): ApiError {
  const error = (body as { error?: Record<string, unknown> } | null)?.error;
  if (error && typeof error.code === "string" && typeof error.message === "string") {
    const { code, message, ...details } = error;
    return new ApiError(status, code, message, details);
  }
  return new ApiError(status, "http", `The server answered ${status}.`);
}

/** Fetches one of our JSON routes; resolves with the typed body or throws an ApiError. */
export async function apiFetch<T>(
  url: string,
  init: { method?: string; body?: unknown } = {},
): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method: init.method ?? "GET",
      headers: init.body === undefined ? undefined : { "content-type": "application/json" },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      cache: "no-store",
    });
  } catch {
    throw new ApiError(0, "offline", OFFLINE_MESSAGE);
  }
  const json: unknown = await res.json().catch(() => null);
  if (!res.ok) throw toApiError(res.status, json);
  return json as T;
}

export function messageOf(error: unknown): string {
  return error instanceof ApiError ? error.message : OFFLINE_MESSAGE;
}
