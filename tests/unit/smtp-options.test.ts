/**
 * The SMTP settings several app servers share ("Running more than one app server" in the README):
 * the local stand-in gets plain SMTP, an outside mail service STARTTLS or TLS and a login.
 */
import { describe, expect, it } from "vitest";
import { smtpTransportOptions } from "@/app/_lib/mail";

const base = { host: "127.0.0.1", port: 1025, user: "", password: "", secure: false };

describe("SMTP transport options", () => {
  it("speaks plain SMTP without a login to the local stand-in", () => {
    expect(smtpTransportOptions(base)).toEqual({ host: "127.0.0.1", port: 1025, secure: false, ignoreTLS: true });
  });

  it("uses STARTTLS and a login for an outside mail service", () => {
    const options = smtpTransportOptions({ host: "smtp.mail.example.test", port: 587, user: "pierwise", password: "app-password", secure: false });
    expect(options).toEqual({ host: "smtp.mail.example.test", port: 587, secure: false, ignoreTLS: false, auth: { user: "pierwise", pass: "app-password" } });
  });

  it("uses TLS from the start with SMTP_SECURE=true (port 465)", () => {
    expect(smtpTransportOptions({ ...base, host: "smtp.mail.example.test", port: 465, secure: true })).toMatchObject({ secure: true, ignoreTLS: false });
  });
});
