import { describe, expect, it } from "vitest";

import {
  clientAddressFrom,
  normalizeAddress,
  parseTrustedProxies,
  PEER_HEADER,
  stampPeer,
  UNKNOWN_PEER,
} from "@/lib/server/http/client-peer";

// The rule under test is the one documented in lib/server/http/client-peer.ts.
const from = (headers: Record<string, string>, trusted = "") =>
  clientAddressFrom((name) => headers[name], parseTrustedProxies(trusted));

describe("the client address for rate limits", () => {
  it("is the peer our server recorded, whatever X-Forwarded-For the client wrote", () => {
    expect(from({ [PEER_HEADER]: "203.0.113.9", "x-forwarded-for": "10.9.9.9" })).toBe(
      "203.0.113.9",
    );
  });

  it("is one shared key without a recorded peer (no server of ours in front)", () => {
    expect(from({ "x-forwarded-for": "10.9.9.9" })).toBe(UNKNOWN_PEER);
  });

  it("behind a trusted proxy is the rightmost forwarded hop that is not one of ours", () => {
    const headers = {
      [PEER_HEADER]: "10.0.0.2",
      "x-forwarded-for": "6.6.6.6, 198.51.100.4, 10.0.0.3",
    };
    expect(from(headers, "10.0.0.2,10.0.0.3")).toBe("198.51.100.4");
  });

  it("treats an IPv4-mapped IPv6 address as the IPv4 one", () => {
    expect(normalizeAddress("::FFFF:127.0.0.1")).toBe("127.0.0.1");
    expect(from({ [PEER_HEADER]: "::ffff:127.0.0.1" })).toBe("127.0.0.1");
  });
});

describe("stamping the peer on a request (scripts/serve.ts)", () => {
  it("drops every copy the client sent and writes the socket's address", () => {
    const request = {
      headers: { [PEER_HEADER]: "6.6.6.6", host: "app" } as Record<string, string>,
      rawHeaders: ["Host", "app", "X-Craquelure-Peer", "6.6.6.6", "x-craquelure-peer", "7.7.7.7"],
    };
    stampPeer(request, "::ffff:192.0.2.5");
    expect(request.headers[PEER_HEADER]).toBe("192.0.2.5");
    expect(request.rawHeaders).toEqual(["Host", "app", PEER_HEADER, "192.0.2.5"]);
    expect(from(request.headers)).toBe("192.0.2.5");
  });
});
