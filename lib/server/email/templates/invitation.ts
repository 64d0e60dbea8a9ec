import "server-only";

import type { MailMessage } from "../../../shared/mail-types";
import { frameHtml } from "./frame";

export function invitationMessage(opts: {
  to: string;
  inviterName: string;
  teamName: string;
  roleLabel: string;
  url: string;
}): MailMessage {
  const subject = `${opts.inviterName} invited you to ${opts.teamName} on Craquelure`;
  const lines = [
    `${opts.inviterName} invited you to join the team "${opts.teamName}" as ${opts.roleLabel.toLowerCase()}.`,
    `Sign in (or create an account) with this e-mail address, ${opts.to}, then accept. ` +
      "The link works once and for 7 days.",
  ];
  const footnote = "If you did not expect this, ignore the message; nothing changes.";
  return {
    to: opts.to,
    subject,
    text: `${lines.join("\n\n")}\n\n${opts.url}\n\n${footnote}\n`,
    html: frameHtml({
      heading: `Join ${opts.teamName}`,
      paragraphs: lines,
      action: { label: "See the invitation", url: opts.url },
      footnote,
    }),
  };
}
