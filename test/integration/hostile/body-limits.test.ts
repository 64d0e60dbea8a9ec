import { describe, expect, it } from "vitest";

import * as importRoute from "@/app/api/v1/teams/[team]/import/route";
import * as recordsRoute from "@/app/api/v1/teams/[team]/test-records/route";
import { config as proxyConfig } from "@/proxy";

import { openTestDb } from "../support/db";
import { closeAppPoolAfterAll, cookieFor, makeWorld } from "../support/workspace";

// Issue 12, item 8: the documented body limits must be what a client meets through the real
// server, and nobody may make the server read a body before saying who they are.
const db = openTestDb();
closeAppPoolAfterAll();

const MB = 1024 * 1024;

/** A JSON string body of `megabytes` MB, produced only as the reader asks (counts the pulls). */
function countedBody(megabytes: number) {
  const chunk = new TextEncoder().encode("x".repeat(MB));
  const counter = { pulled: 0 };
  const stream = new ReadableStream<Uint8Array>(
    {
      pull(controller) {
        if (counter.pulled === megabytes) return controller.close();
        counter.pulled++;
        controller.enqueue(chunk);
      },
    },
    { highWaterMark: 0 },
  );
  return { stream, counter };
}

/** A JSON upload of `megabytes` MB streamed without a length, as a chunked request arrives. */
function streamedUpload(megabytes: number): ReadableStream<Uint8Array> {
  const encoder = new TextEncoder();
  const ones = encoder.encode("1".repeat(MB));
  let sent = -1;
  return new ReadableStream<Uint8Array>(
    {
      // Pulled one chunk at a time, so a route that stops reading (its limit) stops the source.
      pull(controller) {
        if (sent === -1) controller.enqueue(encoder.encode('{"fileName":"big.csv","text":"'));
        else if (sent < megabytes) controller.enqueue(ones);
        else if (sent === megabytes) controller.enqueue(encoder.encode('"}'));
        else return controller.close();
        sent++;
      },
    },
    { highWaterMark: 0 },
  );
}

/** Whether Next runs proxy.ts for a path: its matcher is a regular expression over the path. */
function proxyRunsFor(path: string): boolean {
  return proxyConfig.matcher.some((pattern) => new RegExp(`^${pattern}$`).test(path));
}

describe("item 8: body limits that really apply, and authorization first", () => {
  it("the proxy, which copies every body it sees into memory, does not run for the API", () => {
    expect(proxyRunsFor("/api/v1/teams/demo/import")).toBe(false);
    expect(proxyRunsFor("/api/v1/teams/demo/test-records")).toBe(false);
    expect(proxyRunsFor("/api/health")).toBe(false);
    // pages and their server actions keep the proxy (nonce, origin check)
    expect(proxyRunsFor("/teams/demo/settings")).toBe(true);
    expect(proxyRunsFor("/sign-in")).toBe(true);
  });

  it("body over the route limit answers 413 with the size and the limit, also when streamed", async () => {
    const w = await makeWorld(db);
    const cookie = (await cookieFor(db, w.members.editor))!;
    const url = `http://app.test/api/v1/teams/${w.slug}/test-records`;
    const params = { params: Promise.resolve({ team: w.slug }) };
    const claimed = await recordsRoute.POST(
      new Request(url, {
        method: "POST",
        headers: { cookie, "content-type": "application/json", "content-length": String(30 * MB) },
        body: "{}",
      }),
      params,
    );
    expect(claimed.status).toBe(413);
    expect((await claimed.json()).error.message).toBe(
      "The upload is 30 MB; this route takes at most 20 MB.",
    );
    // 25 MB without a length: the route counts what it reads and stops at its limit.
    const streamed = await recordsRoute.POST(
      new Request(url, {
        method: "POST",
        headers: { cookie, "content-type": "application/json" },
        body: streamedUpload(25),
        duplex: "half",
      } as RequestInit),
      params,
    );
    const body = await streamed.json();
    expect(streamed.status).toBe(413);
    expect(body.error.message).toBe(
      "The upload is more than 20 MB; this route takes at most 20 MB.",
    );
  });

  it("an anonymous 30 MB import answers 401 before its body is read", async () => {
    const w = await makeWorld(db);
    const { stream, counter } = countedBody(30);
    const response = await importRoute.POST(
      new Request(`http://app.test/api/v1/teams/${w.slug}/import`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: stream,
        duplex: "half",
      } as RequestInit),
      { params: Promise.resolve({ team: w.slug }) },
    );
    expect(response.status).toBe(401);
    expect((await response.json()).error.code).toBe("unauthenticated");
    expect(counter.pulled).toBeLessThanOrEqual(1);
  });
});
