import "server-only";

import { getDb } from "@/db/index";
import { getEnv } from "@/lib/server/access/env";

import { durableMailer } from "./mail-outbox";
import { startMailOutbox } from "./outbox-sender";
import { smtpMailer } from "./transport";
import type { MailDeps } from "../../shared/mail-types";

// The app's mailer: SMTP, with refused mail kept in mail_outbox and retried by the sender.
export function mailDeps(): MailDeps {
  startMailOutbox();
  return {
    mailer: durableMailer(getDb(), smtpMailer, startMailOutbox),
    appUrl: getEnv().APP_URL,
    wakeOutbox: startMailOutbox,
  };
}
