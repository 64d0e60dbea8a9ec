// Services send mail through this narrow interface so tests can hand in a recorder instead of SMTP.
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export interface Mailer {
  send(message: MailMessage): Promise<void>;
}

/** What a service needs to send a link: the mailer and the public base URL for the link. */
export interface MailDeps {
  mailer: Mailer;
  appUrl: string;
}

export function linkTo(appUrl: string, path: string): string {
  return new URL(path, appUrl).toString();
}
