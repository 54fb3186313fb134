import fs from "node:fs";
import path from "node:path";
import { MailDev } from "maildev";
// s3rver ships CommonJS without types.
// @ts-expect-error no type declarations for s3rver
import S3rver from "s3rver";

/**
 * Local stand-ins for the hosted services the product uses in production: an SMTP server with a
 * web viewer for e-mail, and an S3-compatible store for uploads. Both listen on 127.0.0.1 only
 * and run inside the process that starts them, so stopping that process stops them.
 */
export interface StandIns {
  smtpPort: number;
  mailWebPort: number;
  s3Port: number;
  bucket: string;
  stop(): Promise<void>;
}

export async function startStandIns(options: {
  smtpPort: number;
  mailWebPort: number;
  s3Port: number;
  s3Directory: string;
  /**
   * Where the SMTP stand-in keeps the e-mails it catches (a `mail` folder beside s3Directory when
   * not given). Never maildev's default, one shared /tmp/maildev: whoever made it first owns it,
   * so another user's run could not deliver mail, and runs would see each other's mail.
   */
  mailDirectory?: string;
  bucket: string;
}): Promise<StandIns> {
  const mailDirectory = options.mailDirectory ?? path.join(path.dirname(options.s3Directory), "mail");
  fs.mkdirSync(mailDirectory, { recursive: true });
  const mail = new MailDev({
    mailDirectory,
    smtp: options.smtpPort,
    ip: "127.0.0.1",
    web: options.mailWebPort,
    webIp: "127.0.0.1",
    silent: true,
  } as ConstructorParameters<typeof MailDev>[0]);
  await mail.start();

  fs.mkdirSync(options.s3Directory, { recursive: true });
  const files = new S3rver({
    address: "127.0.0.1",
    port: options.s3Port,
    directory: options.s3Directory,
    silent: true,
    configureBuckets: [{ name: options.bucket }],
  });
  await files.run();

  return {
    ...options,
    async stop() {
      await Promise.allSettled([mail.stop(), files.close()]);
    },
  };
}
