// Services send mail through this narrow interface so tests can hand in a recorder instead of SMTP.
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** queued: the mail server could not take it now; it is kept and sent when the server is back. */
export interface MailSendResult {
  queued: boolean;
}

export interface Mailer {
  send(message: MailMessage): Promise<MailSendResult | void>;
}

/** What to tell the person who caused a mail that could not go out yet. */
export const MAIL_QUEUED_NOTICE =
  "The mail server is not reachable right now; the e-mail will be sent when it is back.";

/** What a service needs to send a link: the mailer and the public base URL for the link. */
export interface MailDeps {
  mailer: Mailer;
  appUrl: string;
  /** Tells the outbox sender that mail was queued for it (the app starts its sender here). */
  wakeOutbox?: () => void;
}

export function linkTo(appUrl: string, path: string): string {
  return new URL(path, appUrl).toString();
}
