import "server-only";

import type { MailMessage } from "../../../shared/mail-types";
import { frameHtml } from "./frame";

export function resetPasswordMessage(opts: { to: string; name: string; url: string }): MailMessage {
  const subject = "Choose a new Craquelure password";
  const lines = [
    `Hello ${opts.name},`,
    "Someone asked to reset the password of this account. The link works once and for 1 hour; " +
      "using it signs out every open session.",
  ];
  const footnote = "If it was not you, ignore this message: your password stays as it is.";
  return {
    to: opts.to,
    subject,
    text: `${lines.join("\n\n")}\n\n${opts.url}\n\n${footnote}\n`,
    html: frameHtml({
      heading: "Choose a new password",
      paragraphs: lines,
      action: { label: "Choose a new password", url: opts.url },
      footnote,
    }),
  };
}
