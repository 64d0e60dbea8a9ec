import { check, type Check } from "./fault-steps";

// What a client sees while the database is down: the API says 503 with a hint when to retry and a
// message, the health route agrees, and a page fails plainly (no stack trace in the HTML).
export async function probeWhileDown(base: string, url: string, cookie: string, checks: Check[]) {
  const api = await fetch(url, { headers: { cookie } });
  const body = await api.json().catch(() => null);
  check(
    checks,
    "API answers 503 while the database is down",
    api.status === 503,
    `status ${api.status}`,
  );
  check(
    checks,
    "with Retry-After",
    Number(api.headers.get("retry-after")) > 0,
    `retry-after ${api.headers.get("retry-after")}`,
  );
  check(
    checks,
    "and a JSON message",
    body?.error?.code === "unavailable:database" && /not reachable/.test(body?.error?.message),
    JSON.stringify(body),
  );
  const health = await fetch(`${base}/api/health`);
  check(
    checks,
    "health says the database is unreachable",
    health.status === 503,
    `status ${health.status}`,
  );
  const page = await fetch(`${base}/teams`, { headers: { cookie } });
  const html = await page.text();
  check(
    checks,
    "a page fails without a stack trace",
    page.status >= 500 && !/\n\s+at \S+ \(/.test(html),
    `status ${page.status}`,
  );
}
