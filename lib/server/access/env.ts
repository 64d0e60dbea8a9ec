import "server-only";

import { z } from "zod";

// Read lazily: `next build` must not need the runtime environment.
const envSchema = z.object({
  DATABASE_URL: z.string().min(1),
  APP_URL: z.url().default("http://127.0.0.1:3000"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  MAIL_FROM: z.string().default("Craquelure <no-reply@craquelure.local>"),
  MAIL_OUTBOX_DIR: z.string().optional(),
});
export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function getEnv(): Env {
  cached ??= envSchema.parse(process.env);
  return cached;
}

/** Secure cookies follow the public URL, not NODE_ENV: the local http start must still sign in. */
export function isHttpsApp(): boolean {
  return getEnv().APP_URL.startsWith("https://");
}
