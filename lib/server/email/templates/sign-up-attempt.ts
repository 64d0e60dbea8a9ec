import "server-only";

import type { MailMessage } from "../../../shared/mail-types";
import { frameHtml } from "./frame";

/** To the owner of an address someone tried to sign up with again: no account is created. */
export function signUpAttemptMessage(opts: {
  to: string;
  name: string;
  signInUrl: string;
  resetUrl: string;
}): MailMessage {
  const subject = "Someone tried to sign up for Craquelure with your address";
  const lines = [
    `Hello ${opts.name},`,
    "Someone tried to create a Craquelure account with this e-mail address. You have an account already, so nothing was changed.",
    "If it was you, sign in instead, or set a new password if you have forgotten it.",
  ];
  const footnote = "If it was not you, ignore this message; your account is unchanged.";
  return {
    to: opts.to,
    subject,
    text: `${lines.join("\n\n")}\n\nSign in: ${opts.signInUrl}\nNew password: ${opts.resetUrl}\n\n${footnote}\n`,
    html: frameHtml({
      heading: "A sign-up with your address",
      paragraphs: [...lines, `Forgotten the password? ${opts.resetUrl}`],
      action: { label: "Sign in", url: opts.signInUrl },
      footnote,
    }),
  };
}
