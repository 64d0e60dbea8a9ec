import "server-only";

import nodemailer, { type Transporter } from "nodemailer";

import { getEnv } from "@/lib/server/access/env";

import type { Mailer } from "../../shared/mail-types";

let transporter: Transporter | undefined;

function getTransporter(): Transporter {
  const env = getEnv();
  // Plain SMTP to the configured relay (locally the fake server on loopback, no TLS there).
  transporter ??= nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_PORT === 465,
    ignoreTLS: env.SMTP_HOST === "127.0.0.1" || env.SMTP_HOST === "localhost",
  });
  return transporter;
}

export const smtpMailer: Mailer = {
  async send(message) {
    await getTransporter().sendMail({ from: getEnv().MAIL_FROM, ...message });
  },
};
