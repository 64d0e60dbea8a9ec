import "server-only";

import { getDb } from "@/db/index";

import { flushOutbox } from "./mail-outbox";
import { smtpMailer } from "./transport";

// The in-process sender of queued mail. Decision: it starts the first time this process hands
// out a mailer (lib/server/email/deps.ts) and when instrumentation.ts calls startMailOutbox() at start-up,
// then looks every few seconds while anything is pending, and stops looking when the outbox is
// empty (a later queued mail starts it again). No separate worker process to deploy.

const CHECK_EVERY_MS = Number(process.env.MAIL_OUTBOX_INTERVAL_MS ?? 3_000);
const state = globalThis as unknown as {
  __craqMailTimer?: NodeJS.Timeout;
  __craqMailBusy?: boolean;
};

async function tick(): Promise<void> {
  if (state.__craqMailBusy) return;
  state.__craqMailBusy = true;
  try {
    const { sent, pending } = await flushOutbox(getDb(), smtpMailer);
    if (sent > 0) console.log(`[mail] sent ${sent} queued message(s), ${pending} pending`);
    if (pending === 0) stopMailOutbox();
  } catch (error) {
    // The database itself may be down; the next tick tries again.
    console.error("[mail] outbox pass failed:", error instanceof Error ? error.message : error);
  } finally {
    state.__craqMailBusy = false;
  }
}

export function startMailOutbox(): void {
  if (state.__craqMailTimer || !process.env.DATABASE_URL) return;
  state.__craqMailTimer = setInterval(() => void tick(), CHECK_EVERY_MS);
  // Never keep a process alive just for this timer.
  state.__craqMailTimer.unref();
  void tick();
}

function stopMailOutbox(): void {
  if (state.__craqMailTimer) clearInterval(state.__craqMailTimer);
  state.__craqMailTimer = undefined;
}
