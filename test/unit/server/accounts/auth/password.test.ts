import { describe, expect, it, vi } from "vitest";

import { scryptSync } from "node:crypto";

import {
  burnPasswordCheck,
  hashPassword,
  needsRehash,
  verifyPassword,
} from "@/lib/server/accounts/auth/password";

// A time limit, not a speed goal: scrypt at N = 2^17 takes a few hundred ms per hash alone; on a
// busy two-core machine a test of several hashes outlasts the default 5 s.
vi.setConfig({ testTimeout: 60000 });

describe("scrypt password hashing", () => {
  it("accepts the password it hashed and refuses others", async () => {
    const stored = await hashPassword("glass mat thermoplastic");
    expect(await verifyPassword("glass mat thermoplastic", stored)).toBe(true);
    expect(await verifyPassword("glass mat thermoplastiC", stored)).toBe(false);
    expect(await verifyPassword("", stored)).toBe(false);
  });

  it("salts per hash: the same password never gives the same record", async () => {
    const a = await hashPassword("same password twice");
    const b = await hashPassword("same password twice");
    expect(a.hash).not.toBe(b.hash);
    expect(a.hash.split("$")[3]).not.toBe(b.hash.split("$")[3]);
  });

  it("does not accept a hash paired with another record's salt", async () => {
    const a = await hashPassword("first password here");
    const b = await hashPassword("first password here");
    const [, , params, , keyA] = a.hash.split("$");
    const saltB = b.hash.split("$")[3];
    const swapped = `$scrypt$${params}$${saltB}$${keyA}`;
    expect(await verifyPassword("first password here", { hash: swapped, salt: "" })).toBe(false);
  });

  it("treats a truncated (corrupt) hash as a mismatch instead of throwing", async () => {
    const stored = await hashPassword("some long password");
    await expect(
      verifyPassword("some long password", { ...stored, hash: stored.hash.slice(0, 10) }),
    ).resolves.toBe(false);
  });

  it("normalises Unicode so the same visible password matches", async () => {
    const stored = await hashPassword("Bruchdehnung \u00e9tir\u00e9e");
    expect(await verifyPassword("Bruchdehnung e\u0301tire\u0301e", stored)).toBe(true);
  });

  it("runs the dummy check for unknown accounts without error", async () => {
    await expect(burnPasswordCheck("anything at all")).resolves.toBeUndefined();
  });
});

describe("security: passwords", () => {
  // A record written before the PHC format: hex key, hex salt beside it, N = 2^15, r = 8.
  function legacyRecord(password: string) {
    const salt = Buffer.from("00112233445566778899aabbccddeeff", "hex");
    const key = scryptSync(password.normalize("NFKC"), salt, 64, {
      N: 2 ** 15,
      r: 8,
      p: 1,
      maxmem: 64 * 1024 * 1024,
    });
    return { hash: key.toString("hex"), salt: salt.toString("hex") };
  }

  it("stores a self-describing record at N = 2^17, r = 8 (OWASP Password Storage Cheat Sheet)", async () => {
    const stored = await hashPassword("short glass fibre");
    expect(stored.hash).toMatch(
      /^\$scrypt\$ln=17,r=8,p=1\$[A-Za-z0-9+/]{22}==\$[A-Za-z0-9+/]{86}==$/,
    );
    expect(needsRehash(stored)).toBe(false);
  });

  it("still accepts a record of the old format and asks for it to be rehashed", async () => {
    const old = legacyRecord("moulding compound");
    expect(await verifyPassword("moulding compound", old)).toBe(true);
    expect(await verifyPassword("moulding compounds", old)).toBe(false);
    expect(needsRehash(old)).toBe(true);
  });

  it("asks for a rehash of a weaker PHC record and refuses forged parameters", async () => {
    const stored = await hashPassword("glass mat");
    const weaker = { hash: stored.hash.replace("ln=17", "ln=14"), salt: "" };
    expect(needsRehash(weaker)).toBe(true);
    // ln=30 would ask for 128 GiB: refused as corrupt rather than attempted.
    const forged = { hash: stored.hash.replace("ln=17", "ln=30"), salt: "" };
    expect(await verifyPassword("glass mat", forged)).toBe(false);
  });
});
