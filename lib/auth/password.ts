import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from "node:crypto";

// node:crypto scrypt: no native add-on to build. N=2^15, r=8 costs ~32 MiB and ~50-100 ms here,
// enough to slow guessing without stalling two shared cores.
const PARAMS: ScryptOptions = { N: 1 << 15, r: 8, p: 1, maxmem: 64 * 1024 * 1024 };
const KEY_LENGTH = 64;

function derive(password: string, salt: Buffer): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    scrypt(password.normalize("NFKC"), salt, KEY_LENGTH, PARAMS, (error, key) =>
      error ? reject(error) : resolve(key),
    );
  });
}

export async function hashPassword(password: string): Promise<{ hash: string; salt: string }> {
  const salt = randomBytes(16);
  const key = await derive(password, salt);
  return { hash: key.toString("hex"), salt: salt.toString("hex") };
}

export async function verifyPassword(
  password: string,
  stored: { hash: string; salt: string },
): Promise<boolean> {
  const expected = Buffer.from(stored.hash, "hex");
  const actual = await derive(password, Buffer.from(stored.salt, "hex"));
  // Lengths only differ for a corrupt row; timingSafeEqual would throw on them.
  return expected.length === actual.length && timingSafeEqual(expected, actual);
}

let dummy: Promise<{ hash: string; salt: string }> | undefined;

/** Spend the same time for an unknown e-mail as for a wrong password (no account probing by timing). */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummy ??= hashPassword("not-a-real-password-placeholder");
  await verifyPassword(password, await dummy);
}
