import { Readable } from "node:stream";

import { getCloneableBody } from "next/dist/server/body-streams";
import { PHASE_PRODUCTION_SERVER } from "next/constants";
import { describe, expect, it } from "vitest";

import * as importRoute from "@/app/api/v1/teams/[team]/import/route";
import * as recordsRoute from "@/app/api/v1/teams/[team]/test-records/route";
import nextConfig from "@/next.config";

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

/** The body as the route sees it after Next's proxy has copied it (next.config's limit). */
async function throughProxyCopy(megabytes: number): Promise<ReadableStream<Uint8Array>> {
  const limit = nextConfig(PHASE_PRODUCTION_SERVER).experimental?.proxyClientMaxBodySize;
  const source = Readable.from(
    (function* () {
      yield Buffer.from('{"fileName":"big.csv","text":"');
      for (let i = 0; i < megabytes; i++) yield Buffer.alloc(MB, "1");
      yield Buffer.from('"}');
    })(),
  );
  const cloneable = getCloneableBody(source as never, limit as number | undefined);
  const proxyCopy = cloneable.cloneBodyStream();
  proxyCopy.resume(); // the proxy's own reader
  await cloneable.finalize();
  // What the route reads is the source with the proxy's copy swapped in (Next's finalize).
  const chunks = (source as AsyncIterable<Buffer>)[Symbol.asyncIterator]();
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      const { value, done } = await chunks.next();
      if (done) controller.close();
      else controller.enqueue(new Uint8Array(value));
    },
  });
}

describe("item 8: body limits that really apply, and authorization first", () => {
  it("body over the route limit answers 413 with the size and the limit, also past Next's proxy copy", async () => {
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
    // 25 MB without a length, as it reaches the route after the proxy: with Next's default
    // 10 MB copy the route saw a cut-off body and answered 400 "not valid JSON".
    const streamed = await recordsRoute.POST(
      new Request(url, {
        method: "POST",
        headers: { cookie, "content-type": "application/json" },
        body: await throughProxyCopy(25),
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
