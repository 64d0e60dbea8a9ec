import { describe, expect, it } from "vitest";

import { isCrossOriginWrite } from "@/lib/server/http/origin-check";

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
