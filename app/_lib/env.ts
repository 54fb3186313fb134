/**
 * Settings the server reads from its environment. The start script and the test runner set them
 * (db/lib/app-env.ts); the defaults are for a developer running `next dev` beside a started stack.
 */
function read(name: string, fallback: string): string {
  return process.env[name] ?? fallback;
}

export const env = {
  get appUrl() {
    return read("APP_URL", "http://127.0.0.1:3000");
  },
  get sessionSecret() {
    const secret = read("SESSION_SECRET", "");
    if (secret.length >= 32) return secret;
    if (process.env.NODE_ENV === "production") {
      throw new Error("SESSION_SECRET must be set to at least 32 characters (npm start makes one under .data/).");
    }
    return "development-only-secret-not-for-production-use-0000";
  },
  get smtp() {
    return {
      host: read("SMTP_HOST", "127.0.0.1"),
      port: Number(read("SMTP_PORT", "1025")),
      // For a mail service that wants a login and TLS (several app servers share one); unset for the local stand-in.
      user: read("SMTP_USER", ""),
      password: read("SMTP_PASSWORD", ""),
      secure: read("SMTP_SECURE", "") === "true",
    };
  },
  get mailFrom() {
    return read("MAIL_FROM", "Pierwise <no-reply@pierwise.test>");
  },
  get s3() {
    return {
      endpoint: read("S3_ENDPOINT", "http://127.0.0.1:4569"),
      bucket: read("S3_BUCKET", "pierwise-uploads"),
      region: read("S3_REGION", "us-east-1"),
      accessKeyId: read("S3_ACCESS_KEY_ID", "S3RVER"),
      secretAccessKey: read("S3_SECRET_ACCESS_KEY", "S3RVER"),
    };
  },
};
