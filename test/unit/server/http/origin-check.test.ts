import { describe, expect, it } from "vitest";

import {
  CROSS_ORIGIN_MESSAGE,
  isCrossOriginWrite,
  refuseCrossOriginWrite,
} from "@/lib/server/http/origin-check";

const base = { host: "127.0.0.1:3000", origin: null, referer: null };

describe("origin check for state-changing requests", () => {
  it("lets reads through whatever their origin", () => {
    for (const method of ["GET", "HEAD", "OPTIONS", "get"]) {
      expect(isCrossOriginWrite({ ...base, method, origin: "https://elsewhere.example" })).toBe(
        false,
      );
    }
  });

  it("accepts a POST from the same host", () => {
    expect(isCrossOriginWrite({ ...base, method: "POST", origin: "http://127.0.0.1:3000" })).toBe(
      false,
    );
  });

  it("refuses a POST, PUT, PATCH or DELETE from another host", () => {
    for (const method of ["POST", "PUT", "PATCH", "DELETE"]) {
      expect(isCrossOriginWrite({ ...base, method, origin: "https://elsewhere.example" })).toBe(
        true,
      );
    }
  });

  it("tells ports apart", () => {
    expect(isCrossOriginWrite({ ...base, method: "POST", origin: "http://127.0.0.1:4000" })).toBe(
      true,
    );
  });

  it("falls back to the Referer when Origin is absent", () => {
    expect(
      isCrossOriginWrite({ ...base, method: "POST", referer: "http://127.0.0.1:3000/teams" }),
    ).toBe(false);
    expect(
      isCrossOriginWrite({ ...base, method: "POST", referer: "https://elsewhere.example/x" }),
    ).toBe(true);
  });

  it("refuses an opaque origin, a garbled one, and a request without Host", () => {
    expect(isCrossOriginWrite({ ...base, method: "POST", origin: "null" })).toBe(true);
    expect(isCrossOriginWrite({ ...base, method: "POST", origin: "not a url" })).toBe(true);
    expect(
      isCrossOriginWrite({ ...base, host: null, method: "POST", origin: "http://127.0.0.1:3000" }),
    ).toBe(true);
  });

  it("lets a header-less non-browser client through", () => {
    expect(isCrossOriginWrite({ ...base, method: "POST" })).toBe(false);
  });
});

describe("refuseCrossOriginWrite (the API wrappers' form)", () => {
  const url = "http://127.0.0.1:3000/api/v1/teams/demo/scenarios";
  it("throws a 403 error with the message for a write sent from another site", () => {
    const request = new Request(url, {
      method: "POST",
      headers: { host: "127.0.0.1:3000", origin: "https://elsewhere.example" },
    });
    expect(() => refuseCrossOriginWrite(request)).toThrow(
      expect.objectContaining({ code: "forbidden:origin", message: CROSS_ORIGIN_MESSAGE }),
    );
  });
  it("lets the same origin, a script without Origin and any read through", () => {
    const same = new Request(url, { method: "POST", headers: { origin: "http://127.0.0.1:3000" } });
    expect(() => refuseCrossOriginWrite(same)).not.toThrow();
    expect(() => refuseCrossOriginWrite(new Request(url, { method: "DELETE" }))).not.toThrow();
    const read = new Request(url, { headers: { origin: "https://elsewhere.example" } });
    expect(() => refuseCrossOriginWrite(read)).not.toThrow();
  });
});
