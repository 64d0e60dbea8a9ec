import "server-only";

import type { MailMessage } from "../../../shared/mail-types";
import { frameHtml } from "./frame";

interface ReviewMailBase {
  to: string;
  actorName: string;
  teamName: string;
  scenarioName: string;
  revision: number;
  note: string;
  url: string;
}

const FOOTNOTE = "You get this because you edit this scenario or review in this team.";

function compose(base: ReviewMailBase, subject: string, heading: string, lines: string[]) {
  const all = base.note ? [...lines, `Note: ${base.note}`] : lines;
  return {
    to: base.to,
    subject,
    text: `${all.join("\n\n")}\n\n${base.url}\n\n${FOOTNOTE}\n`,
    html: frameHtml({
      heading,
      paragraphs: all,
      action: { label: "Open the revision", url: base.url },
      footnote: FOOTNOTE,
    }),
  } satisfies MailMessage;
}

export function reviewRequestedMessage(base: ReviewMailBase): MailMessage {
  const what = `"${base.scenarioName}", revision ${base.revision}`;
  return compose(base, `Review requested: ${what}`, "Review requested", [
    `${base.actorName} asked for a review of ${what} in ${base.teamName}.`,
    "Reviewers can comment on the revision and approve it or request changes.",
  ]);
}

export function reviewVerdictMessage(
  base: ReviewMailBase & { verdict: "approved" | "changes_requested" },
): MailMessage {
  const what = `"${base.scenarioName}", revision ${base.revision}`;
  const said = base.verdict === "approved" ? "approved" : "requested changes to";
  const short = base.verdict === "approved" ? "Approved" : "Changes requested";
  return compose(base, `${short}: ${what}`, short, [
    `${base.actorName} ${said} ${what} in ${base.teamName}.`,
  ]);
}
