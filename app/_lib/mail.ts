import nodemailer from "nodemailer";
import { env } from "./env";
import { SERVICE_TIMEOUT_MS, withDeadline } from "./request-guards";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
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
  // Bounded waits at every step, so a frozen mail server costs a request ~10 s, not minutes.
  const transport = nodemailer.createTransport({ ...smtpTransportOptions(env.smtp), connectionTimeout: SERVICE_TIMEOUT_MS, greetingTimeout: SERVICE_TIMEOUT_MS, socketTimeout: SERVICE_TIMEOUT_MS });
  await withDeadline("The mail server", () => transport.sendMail({ from: env.mailFrom, ...mail }));
}
