// The audit trail in words. Details are stored as the services wrote them; only a few known
// fields are read, everything else is left out rather than guessed at.

const VERBS: Record<string, string> = {
  "scenario.create": "created scenario",
  "scenario.update": "renamed or retagged scenario",
  "scenario.delete": "deleted scenario",
  "revision.save": "saved a revision",
  "comment.create": "commented",
  "comment.edit": "edited a comment",
  "review.request": "requested a review",
  "review.approve": "approved",
  "review.request-changes": "requested changes",
  "share-link.create": "created a share link",
  "share-link.revoke": "revoked a share link",
  "parameter-set.create": "created parameter set",
  "parameter-set.update": "changed parameter set",
  "parameter-set.delete": "deleted parameter set",
  "team.create": "created the team",
  "team.rename": "renamed the team",
  "team.export": "exported the team",
  "team.import": "imported into the team",
  "invitation.create": "invited someone",
  "invitation.accept": "accepted an invitation",
  "invitation.revoke": "withdrew an invitation",
  "member.change-role": "changed a role",
  "member.remove": "removed a member",
  "member.leave": "left the team",
  "test-record.create": "uploaded a test record",
  "fit.create": "ran a fit",
};

function text(value: unknown): string | null {
  return typeof value === "string" && value.trim() ? value : null;
}

function num(value: unknown): number | null {
  return typeof value === "number" && Number.isFinite(value) ? value : null;
}

/** One line of the trail after the actor's name, e.g. `saved a revision (rev 3, on rev 2)`. */
export function describeAuditEvent(action: string, detail: unknown): string {
  const d = (detail && typeof detail === "object" ? detail : {}) as Record<string, unknown>;
  const verb = VERBS[action] ?? action.replace(/[._-]/g, " ");
  const name = text(d.name);
  const extras: string[] = [];
  const revision = num(d.revision) ?? num(d.number);
  if (revision !== null) extras.push(`rev ${revision}`);
  const base = num(d.base);
  if (base !== null) extras.push(`on rev ${base}`);
  const days = num(d.days);
  if (days !== null) extras.push(`${days} days`);
  if (text(d.from) && text(d.to)) extras.push(`${d.from} → ${d.to}`);
  const head = name ? `${verb} “${name}”` : verb;
  return extras.length ? `${head} (${extras.join(", ")})` : head;
}
