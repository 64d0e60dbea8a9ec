import "server-only";

import type { Db } from "@/db/client";
import { chosenReviewerRecipients, reviewRecipients } from "@/db/queries/review-recipients";
import type { ReviewState } from "@/db/schema/scenarios";
import { reviewRequestedMessage, reviewVerdictMessage } from "@/lib/server/email/templates/review";
import { linkTo, type MailDeps } from "@/lib/shared/mail-types";

export interface ReviewMailContext {
  team: { id: string; slug: string; name: string };
  scenario: { id: string; name: string };
  revision: number;
  actorId: string;
  actorName: string;
  note: string;
  to: ReviewState;
  /** Who asked for the review: told about the verdict even without editing the scenario. */
  requesterId?: string | null;
  /** On a request: the reviewers it is asked of, the only people mailed about it. */
  chosenReviewers?: string[];
}

/**
 * Sends the review mails after the state change has committed. A mail that fails is logged
 * and counted, never turned into an error: the verdict is saved either way.
 */
export async function sendReviewMail(db: Db, deps: MailDeps, ctx: ReviewMailContext) {
  const requested = ctx.to === "in_review";
  const people = requested
    ? await chosenReviewerRecipients(db, {
        teamId: ctx.team.id,
        chosen: ctx.chosenReviewers ?? [],
        actorId: ctx.actorId,
      })
    : await reviewRecipients(db, {
        teamId: ctx.team.id,
        scenarioId: ctx.scenario.id,
        extra: ctx.requesterId ? [ctx.requesterId] : [],
        actorId: ctx.actorId,
      });
  const url = linkTo(
    deps.appUrl,
    `/teams/${ctx.team.slug}/scenarios/${ctx.scenario.id}?rev=${ctx.revision}`,
  );
  let sent = 0;
  let queued = 0;
  for (const person of people) {
    const base = {
      to: person.email,
      actorName: ctx.actorName,
      teamName: ctx.team.name,
      scenarioName: ctx.scenario.name,
      revision: ctx.revision,
      note: ctx.note,
      url,
    };
    const message = requested
      ? reviewRequestedMessage(base)
      : reviewVerdictMessage({ ...base, verdict: ctx.to as "approved" | "changes_requested" });
    try {
      const result = await deps.mailer.send(message);
      if (result?.queued) queued++;
      else sent++;
    } catch (error) {
      console.error("[review mail] could not send to", person.email, error);
    }
  }
  return { notified: sent, queued, failed: people.length - sent - queued };
}
