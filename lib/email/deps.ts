import "server-only";

import { getEnv } from "@/lib/env";

import { smtpMailer } from "./transport";
import type { MailDeps } from "./types";

export function mailDeps(): MailDeps {
  return { mailer: smtpMailer, appUrl: getEnv().APP_URL };
}
