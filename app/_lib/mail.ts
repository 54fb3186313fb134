import nodemailer from "nodemailer";
import { env } from "./env";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

/** Sends one e-mail through the configured SMTP server (the local stand-in in development and tests). */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  const transport = nodemailer.createTransport({ host: env.smtp.host, port: env.smtp.port, secure: false, ignoreTLS: true });
  await transport.sendMail({ from: env.mailFrom, ...mail });
}
