/**
 * The SMTP stand-in keeps caught e-mails in the run's own folder, not maildev's shared
 * /tmp/maildev: that one belongs to whoever made it first, so a second user's `npm test` could not
 * deliver a single mail ("450 EACCES … /tmp/maildev/…"), and concurrent runs saw each other's mail.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import nodemailer from "nodemailer";
import { afterEach, describe, expect, it } from "vitest";
import { freePort } from "@/db/lib/ports";
import { startStandIns, type StandIns } from "@/db/lib/stand-ins";

let standIns: StandIns | undefined;
let dir: string | undefined;
afterEach(async () => {
  await standIns?.stop();
  if (dir) fs.rmSync(dir, { recursive: true, force: true });
});

describe("SMTP stand-in mail folder", () => {
  it("writes caught e-mails under the folder the run gives it", async () => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), "pierwise-standins-"));
    const mailDirectory = path.join(dir, "mail");
    standIns = await startStandIns({
      smtpPort: await freePort(), mailWebPort: await freePort(), s3Port: await freePort(),
      s3Directory: path.join(dir, "files"), mailDirectory, bucket: "pierwise-unit",
    });
    const transport = nodemailer.createTransport({ host: "127.0.0.1", port: standIns.smtpPort, secure: false, ignoreTLS: true });
    await transport.sendMail({ from: "Pierwise <no-reply@pierwise.test>", to: "crew@example.test", subject: "Folder check", text: "Hello" });
    const caught = fs.readdirSync(mailDirectory).filter((f) => f.endsWith(".eml"));
    expect(caught).toHaveLength(1);
    expect(fs.readFileSync(path.join(mailDirectory, caught[0]), "utf8")).toContain("Subject: Folder check");
  });
});
