/**
 * The proxy skips /api (it would buffer every body first), so the API's CSRF check and its
 * refusal of anonymous writes live in the route wrappers. A route file that exports a write
 * method without one would have neither: this scan keeps every such file on a wrapper.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

function routeFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return routeFiles(path);
    return entry.name === "route.ts" ? [path] : [];
  });
}

const WRITE_EXPORT =
  /export\s+(?:const|async function|function)\s+(POST|PUT|PATCH|DELETE)\b([^\n]*)/g;

function unguardedWrites(source: string): string[] {
  return [...source.matchAll(WRITE_EXPORT)]
    .filter((m) => !/\b(apiRoute|tokenRoute)\b/.test(m[2]))
    .map((m) => m[1]);
}

describe("every API write goes through a wrapper that checks origin and sign-in", () => {
  it("finds the scan's own example of an unguarded write", () => {
    expect(unguardedWrites("export async function POST(request: Request) {")).toEqual(["POST"]);
    expect(unguardedWrites("export const POST = apiRoute(async () => 1);")).toEqual([]);
  });

  it("holds for each route file under app/api", () => {
    const files = routeFiles(join(process.cwd(), "app/api"));
    expect(files.length).toBeGreaterThan(10);
    const offenders = files.flatMap((file) =>
      unguardedWrites(readFileSync(file, "utf8")).map((method) => `${method} in ${file}`),
    );
    expect(offenders).toEqual([]);
  });
});
