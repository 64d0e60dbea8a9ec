import "server-only";

import { randomBytes } from "node:crypto";

/** "Demo composites lab (invented)" → "demo-composites-lab-invented"; never empty. */
export function slugify(name: string): string {
  const base = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 48)
    .replace(/-+$/g, "");
  return base || "team";
}

/** A short random tail for when the plain slug is taken. */
export function slugWithSuffix(base: string): string {
  return `${base}-${randomBytes(3).toString("hex")}`;
}
