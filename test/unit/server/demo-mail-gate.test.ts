import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";

import { demoMailStatus, hostName, isLoopbackHost } from "@/lib/server/demo-mail-gate";

const loopback = { host: "127.0.0.1:3000", forwardedHost: null };

describe("demo mail gate", () => {
  it("answers 404 without the setting, whoever asks", () => {
    expect(demoMailStatus({}, loopback)).toBe(404);
    expect(demoMailStatus({ CRAQUELURE_DEMO_MAIL: "0" }, loopback)).toBe(404);
    expect(demoMailStatus({ CRAQUELURE_DEMO_MAIL: "true" }, loopback)).toBe(404);
  });

  it("answers 200 with the setting for a loopback host", () => {
    const on = { CRAQUELURE_DEMO_MAIL: "1" };
    expect(demoMailStatus(on, loopback)).toBe(200);
    expect(demoMailStatus(on, { host: "localhost:3000", forwardedHost: "localhost:3000" })).toBe(
      200,
    );
    expect(demoMailStatus(on, { host: "[::1]:3000", forwardedHost: null })).toBe(200);
  });

  it("refuses other hosts even with the setting", () => {
    const on = { CRAQUELURE_DEMO_MAIL: "1" };
    expect(demoMailStatus(on, { host: "lab.example:3000", forwardedHost: null })).toBe(404);
    expect(demoMailStatus(on, { host: "10.0.0.5", forwardedHost: null })).toBe(404);
    expect(demoMailStatus(on, { host: null, forwardedHost: null })).toBe(404);
    // A proxy on the same machine forwarding a public name.
    expect(demoMailStatus(on, { host: "127.0.0.1:3000", forwardedHost: "lab.example" })).toBe(404);
    // Look-alikes of loopback names.
    expect(isLoopbackHost("127.0.0.1.evil.example")).toBe(false);
    expect(isLoopbackHost("localhost.evil.example:80")).toBe(false);
    expect(isLoopbackHost("[::1].evil")).toBe(false);
  });

  it("takes the port off a Host header", () => {
    expect(hostName("LocalHost:3000")).toBe("localhost");
    expect(hostName("[::1]:8080")).toBe("[::1]");
    expect(hostName("127.0.0.1")).toBe("127.0.0.1");
  });
});

// The page itself: notFound() without the setting, rendered with it.
const requestHeaders = new Map<string, string>();
vi.mock("next/headers", () => ({
  headers: async () => ({ get: (name: string) => requestHeaders.get(name) ?? null }),
}));
vi.mock("next/navigation", () => ({
  notFound: () => {
    throw new Error("NEXT_NOT_FOUND");
  },
}));
vi.mock("@/lib/server/access/env", () => ({
  getEnv: () => ({ MAIL_OUTBOX_DIR: "/nonexistent-outbox" }),
}));
vi.mock("@/lib/server/email/outbox", () => ({ readOutbox: async () => [] }));

describe("/dev/outbox page", () => {
  beforeEach(() => {
    requestHeaders.clear();
    requestHeaders.set("host", "127.0.0.1:3000");
  });
  afterEach(() => {
    vi.unstubAllEnvs();
  });

  it("calls notFound() when CRAQUELURE_DEMO_MAIL is not set", async () => {
    vi.stubEnv("CRAQUELURE_DEMO_MAIL", "");
    const { default: OutboxPage } = await import("@/app/dev/outbox/page");
    await expect(OutboxPage()).rejects.toThrow("NEXT_NOT_FOUND");
  });

  it("calls notFound() for a non-loopback host even when set", async () => {
    vi.stubEnv("CRAQUELURE_DEMO_MAIL", "1");
    requestHeaders.set("host", "lab.example");
    const { default: OutboxPage } = await import("@/app/dev/outbox/page");
    await expect(OutboxPage()).rejects.toThrow("NEXT_NOT_FOUND");
  });

  it("renders with the banner when set and asked on loopback", async () => {
    vi.stubEnv("CRAQUELURE_DEMO_MAIL", "1");
    const { default: OutboxPage } = await import("@/app/dev/outbox/page");
    const page = await OutboxPage();
    expect(JSON.stringify(page)).toContain("Never enable it on a shared server");
  });
});
