import { createServer } from "node:net";

/**
 * The mail server "down" and back for outbox tests: the mail transport reads SMTP_PORT when it
 * sends, so pointing it at a port nothing listens on makes every delivery fail.
 */
const realSmtpPort = process.env.SMTP_PORT;

export function mailServerBack(): void {
  if (realSmtpPort === undefined) delete process.env.SMTP_PORT;
  else process.env.SMTP_PORT = realSmtpPort;
}

/** Points the mail transport at a port nothing listens on: the mail server is "down". */
export async function mailServerDown(): Promise<void> {
  const server = createServer();
  const port = await new Promise<number>((resolve) => server.listen(0, "127.0.0.1", () => resolve((server.address() as { port: number }).port)));
  await new Promise((resolve) => server.close(resolve));
  process.env.SMTP_PORT = String(port);
}
