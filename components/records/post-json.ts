/** POSTs JSON to our API; an error comes back as the server's message (never a stack). */
export async function postJson<T>(
  url: string,
  body: unknown,
): Promise<{ ok: true; data: T } | { ok: false; message: string }> {
  try {
    const res = await fetch(url, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(body),
    });
    const json = await res.json().catch(() => null);
    if (res.ok) return { ok: true, data: json as T };
    return { ok: false, message: json?.error?.message ?? `The server answered ${res.status}.` };
  } catch {
    return { ok: false, message: "The server could not be reached; nothing was saved." };
  }
}
