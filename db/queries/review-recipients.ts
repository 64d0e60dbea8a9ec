import { and, eq, inArray, ne, or, sql, type SQL } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { scenarioRevisions, scenarios } from "@/db/schema/scenarios";
import { memberships } from "@/db/schema/teams";
import { users } from "@/db/schema/users";

import { VERDICT_ROLES } from "./team-reviewers";

export interface Recipient {
  id: string;
  email: string;
  name: string;
}

/**
 * Who hears about a verdict: the scenario's editors (its creator and the authors of its
 * revisions, while they still edit in this team) and any extra people (the one who requested
 * the review). The person who acted is never among them: nobody is mailed about their own
 * verdict.
 */
export async function reviewRecipients(
  db: Executor,
  opts: {
    teamId: string;
    scenarioId: string;
    extra?: string[];
    actorId: string;
  },
): Promise<Recipient[]> {
  const contributors = sql`(
    select ${scenarioRevisions.authorId} from ${scenarioRevisions}
    where ${scenarioRevisions.scenarioId} = ${opts.scenarioId}
    union select ${scenarios.createdBy} from ${scenarios} where ${scenarios.id} = ${opts.scenarioId}
  )`;
  const who: SQL[] = [
    and(
      sql`${memberships.userId} in ${contributors}`,
      inArray(memberships.role, ["owner", "editor"]),
    )!,
  ];
  if (opts.extra?.length) who.push(inArray(memberships.userId, opts.extra));
  return db
    .selectDistinct({ id: users.id, email: users.email, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(
      and(eq(memberships.teamId, opts.teamId), ne(memberships.userId, opts.actorId), or(...who)),
    )
    .orderBy(users.email);
}

/**
 * Who hears about a review request: the reviewers it was asked of, while they are still
 * reviewers or owners of the team; never the requester.
 */
export async function chosenReviewerRecipients(
  db: Executor,
  opts: { teamId: string; chosen: string[]; actorId: string },
): Promise<Recipient[]> {
  if (opts.chosen.length === 0) return [];
  return db
    .selectDistinct({ id: users.id, email: users.email, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(
      and(
        eq(memberships.teamId, opts.teamId),
        inArray(memberships.userId, opts.chosen),
        inArray(memberships.role, [...VERDICT_ROLES]),
        ne(memberships.userId, opts.actorId),
      ),
    )
    .orderBy(users.email);
}
