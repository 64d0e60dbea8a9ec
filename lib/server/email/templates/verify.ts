import "server-only";

import type { MailMessage } from "../../../shared/mail-types";
import { frameHtml } from "./frame";

export function verifyEmailMessage(opts: { to: string; name: string; url: string }): MailMessage {
  const subject = "Confirm your e-mail address for Craquelure";
  const lines = [
    `Hello ${opts.name},`,
    "Please confirm that this address is yours. The link works once and for 48 hours.",
  ];
  const footnote = "If you did not create an account, ignore this message; nothing will happen.";
  return {
    to: opts.to,
    subject,
    text: `${lines.join("\n\n")}\n\n${opts.url}\n\n${footnote}\n`,
    html: frameHtml({
      heading: "Confirm your e-mail address",
      paragraphs: lines,
      action: { label: "Confirm e-mail address", url: opts.url },
      footnote,
    }),
  };
}
