import { randomBytes, scrypt, timingSafeEqual } from "node:crypto";

/**
 * Passwords are stored as a self-describing string in the PHC format,
 * `$scrypt$ln=17,r=8,p=1$<salt, base64>$<key, base64>`, so the cost can rise later without a
 * migration: a record with weaker parameters is rehashed at the next successful sign-in.
 * scrypt from node:crypto: no native add-on to build. ln=17, r=8 follows current guidance
 * (OWASP Password Storage Cheat Sheet: N ≥ 2^17, r = 8, p = 1) and costs 128 MiB per hash.
 */
const CURRENT = { ln: 17, r: 8, p: 1 };
const KEY_LENGTH = 64;
/** Rows written before the PHC format: hex key and a separate hex salt, N = 2^15, r = 8, p = 1. */
const LEGACY = { ln: 15, r: 8, p: 1 };

type Params = { ln: number; r: number; p: number };
export type StoredPassword = { hash: string; salt: string };

function derive(password: string, salt: Buffer, params: Params): Promise<Buffer> {
  const N = 2 ** params.ln;
  // scrypt needs 128·N·r bytes; leave room so the default 32 MiB cap does not refuse it.
  const maxmem = 256 * N * params.r;
  return new Promise((resolve, reject) => {
    scrypt(
      password.normalize("NFKC"),
      salt,
      KEY_LENGTH,
      { N, r: params.r, p: params.p, maxmem },
      (error, key) => (error ? reject(error) : resolve(key)),
    );
  });
}

/** The new record: the PHC string goes in `hash`; `salt` stays empty (it lives inside the string). */
export async function hashPassword(password: string): Promise<StoredPassword> {
  const salt = randomBytes(16);
  const key = await derive(password, salt, CURRENT);
  const { ln, r, p } = CURRENT;
  return {
    hash: `$scrypt$ln=${ln},r=${r},p=${p}$${salt.toString("base64")}$${key.toString("base64")}`,
    salt: "",
  };
}

type Parsed = { params: Params; salt: Buffer; key: Buffer };

const PHC =
  /^\$scrypt\$ln=(\d{1,2}),r=(\d{1,2}),p=(\d{1,2})\$([A-Za-z0-9+/=]+)\$([A-Za-z0-9+/=]+)$/;

function parse(stored: StoredPassword): Parsed | null {
  const match = PHC.exec(stored.hash);
  if (match) {
    const params = { ln: Number(match[1]), r: Number(match[2]), p: Number(match[3]) };
    // A forged or corrupt row must not make one sign-in allocate gigabytes.
    if (params.ln < 10 || params.ln > 20 || params.r < 1 || params.r > 16 || params.p !== 1)
      return null;
    return { params, salt: Buffer.from(match[4], "base64"), key: Buffer.from(match[5], "base64") };
  }
  if (/^[0-9a-f]+$/.test(stored.hash) && /^[0-9a-f]+$/.test(stored.salt)) {
    return {
      params: LEGACY,
      salt: Buffer.from(stored.salt, "hex"),
      key: Buffer.from(stored.hash, "hex"),
    };
  }
  return null;
}

export async function verifyPassword(password: string, stored: StoredPassword): Promise<boolean> {
  const parsed = parse(stored);
  if (!parsed) {
    await derive(password, randomBytes(16), CURRENT); // same time as a real check
    return false;
  }
  const actual = await derive(password, parsed.salt, parsed.params);
  // Lengths only differ for a corrupt row; timingSafeEqual would throw on them.
  return parsed.key.length === actual.length && timingSafeEqual(parsed.key, actual);
}

/** True when the record was written with other parameters than today's (or before the PHC format). */
export function needsRehash(stored: StoredPassword): boolean {
  const parsed = parse(stored);
  if (!parsed || !stored.hash.startsWith("$scrypt$")) return true;
  return (
    parsed.params.ln !== CURRENT.ln ||
    parsed.params.r !== CURRENT.r ||
    parsed.params.p !== CURRENT.p
  );
}

let dummy: Promise<StoredPassword> | undefined;

/** Spend the same time for an unknown e-mail as for a wrong password (no account probing by timing). */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummy ??= hashPassword("not-a-real-password-placeholder");
  await verifyPassword(password, await dummy);
}
