/** Reads what the app sent to the SMTP stand-in, through its REST API (MAIL_VIEWER_URL). */
export interface CaughtMail {
  id: string;
  subject: string;
  text: string;
  /** The HTML part, when the mail has one. */
  html?: string;
  to: { address: string }[];
}

export async function mailTo(address: string, options: { subject?: RegExp; timeoutMs?: number } = {}): Promise<CaughtMail> {
  // Generous: on a busy machine the app may take seconds to hand a mail to the stand-in.
  const deadline = Date.now() + (options.timeoutMs ?? 20_000);
  const viewer = process.env.MAIL_VIEWER_URL;
  if (!viewer) throw new Error("MAIL_VIEWER_URL is not set: run the suite through `npm test`.");
  while (Date.now() < deadline) {
    const mails = (await (await fetch(`${viewer}/api/email`)).json()) as CaughtMail[];
    const match = mails
      .filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()))
      .filter((m) => !options.subject || options.subject.test(m.subject))
      .at(-1);
    if (match) return match;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no e-mail to ${address} arrived`);
}

/** The first http(s) link in a mail's text. */
export function firstLink(mail: CaughtMail): string {
  const link = mail.text.match(/https?:\/\/\S+/)?.[0];
  if (!link) throw new Error(`no link in the e-mail "${mail.subject}"`);
  return link;
}
