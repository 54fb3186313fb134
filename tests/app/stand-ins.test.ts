import crypto from "node:crypto";
import { describe, expect, it } from "vitest";
import { sendMail } from "@/app/_lib/mail";
import { deleteObject, getObject, putObject } from "@/app/_lib/storage";
import { mailTo } from "../support/mailbox";

describe("local stand-ins for hosted services", () => {
  it("delivers an e-mail to the SMTP stand-in, readable from its viewer", async () => {
    const to = `smoke-${crypto.randomUUID()}@example.test`;
    await sendMail({ to, subject: "Smoke test", text: "Hello from the test suite." });
    const mail = await mailTo(to);
    expect(mail.subject).toBe("Smoke test");
    expect(mail.text).toContain("Hello from the test suite.");
  });

  it("stores and returns an object through the S3 API", async () => {
    const key = `smoke/${crypto.randomUUID()}.txt`;
    const body = new TextEncoder().encode("footing photo stand-in");
    await putObject(key, body, "text/plain");
    const back = await getObject(key);
    expect(new TextDecoder().decode(back.body)).toBe("footing photo stand-in");
    expect(back.contentType).toBe("text/plain");
    await deleteObject(key);
    await expect(getObject(key)).rejects.toThrow();
  });
});
