import { describe, expect, it } from "vitest";

import { burnPasswordCheck, hashPassword, verifyPassword } from "@/lib/auth/password";

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
    expect(a.salt).not.toBe(b.salt);
    expect(a.hash).not.toBe(b.hash);
    expect(a.salt).toMatch(/^[0-9a-f]{32}$/);
    expect(a.hash).toMatch(/^[0-9a-f]{128}$/);
  });

  it("does not accept a hash paired with another record's salt", async () => {
    const a = await hashPassword("first password here");
    const b = await hashPassword("first password here");
    expect(await verifyPassword("first password here", { hash: a.hash, salt: b.salt })).toBe(false);
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
