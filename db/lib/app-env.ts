import { fileURLToPath } from "node:url";

/**
 * The environment the Next server reads (see app/_lib/env.ts). The start script and the test
 * runner both build it here, so the two cannot drift apart.
 */
export function appEnvironment(options: {
  databaseUrl: string;
  sessionSecret: string;
  appPort: number;
  smtpPort: number;
  mailWebPort: number;
  s3Port: number;
  bucket: string;
}): Record<string, string> {
  return {
    DATABASE_URL: options.databaseUrl,
    SESSION_SECRET: options.sessionSecret,
    APP_URL: `http://127.0.0.1:${options.appPort}`,
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(options.smtpPort),
    MAIL_FROM: "Pierwise <no-reply@pierwise.test>",
    MAIL_VIEWER_URL: `http://127.0.0.1:${options.mailWebPort}`,
    S3_ENDPOINT: `http://127.0.0.1:${options.s3Port}`,
    S3_BUCKET: options.bucket,
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    NEXT_TELEMETRY_DISABLED: "1",
    // The web server learns each caller's socket address (db/lib/peer-address.cjs, read by app/_lib/request-ip.ts).
    NODE_OPTIONS: [process.env.NODE_OPTIONS, `--require ${JSON.stringify(fileURLToPath(new URL("./peer-address.cjs", import.meta.url)))}`].filter(Boolean).join(" "),
  };
}
