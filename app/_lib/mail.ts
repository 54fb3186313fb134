import nodemailer from "nodemailer";
import { env } from "./env";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

/**
 * How to reach the SMTP server. The local stand-in on the loopback address speaks plain SMTP; any
 * other server gets STARTTLS when it offers it (or TLS from the start with SMTP_SECURE=true) and a
 * login when SMTP_USER is set.
 */
export function smtpTransportOptions(smtp: typeof env.smtp) {
  const loopback = /^(127\.\d+\.\d+\.\d+|localhost|::1)$/.test(smtp.host);
  return {
    host: smtp.host,
    port: smtp.port,
    secure: smtp.secure,
    ignoreTLS: loopback && !smtp.secure,
    ...(smtp.user ? { auth: { user: smtp.user, pass: smtp.password } } : {}),
  };
}

/** Sends one e-mail through the configured SMTP server (the local stand-in in development and tests). */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  const transport = nodemailer.createTransport(smtpTransportOptions(env.smtp));
  await transport.sendMail({ from: env.mailFrom, ...mail });
}
