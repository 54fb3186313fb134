/**
 * The e-mail outbox: a state change and its e-mail commit together, so a mail server that is down
 * never turns a committed change into an error. The mail waits in email_outbox and the sweep
 * delivers it once the server answers again; a mail that keeps failing is given up with a
 * "mail-failed" event in the audit log.
 */
import { afterEach, describe, expect, it } from "vitest";
import { recordAsBuiltAction } from "@/app/(workspace)/field/[revisionId]/actions";
import { clearHoldAction } from "@/app/(workspace)/reviews/[revisionId]/actions";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { MAX_ATTEMPTS, deliverOne, deliverPending } from "@/app/_lib/outbox";
import { db } from "@/db/client";
import { listAuditEvents } from "@/db/queries/audit";
import { openHolds } from "@/db/queries/holds";
import { mailTo } from "../support/mailbox";
import { actAs, jsonRequest, outcomeOf, params } from "../support/next-context";
import { DEMO_PASSWORD, DESIGNER, ENGINEER, INSTALLER, makeDesign, userId } from "../support/review-fixtures";
import { mailServerBack, mailServerDown } from "../support/mail-server";

afterEach(mailServerBack);

const outboxRow = (to: string, subject: string) => db("email_outbox").where({ to }).whereLike("subject", `%${subject}%`).first();

/** The post-commit attempt runs in the background; wait until it has failed and said why. */
async function failedOnce(to: string, subject: string) {
  for (let i = 0; i < 200; i++) {
    const row = await outboxRow(to, subject);
    if (row?.last_error) return row;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`the outbox row to ${to} was never attempted`);
}

describe("e-mail outbox", () => {
  it("answers success for submit and approve with the mail server down, and the sweep delivers the mails later", async () => {
    const name = `Outbox row ${Date.now()}`;
    const { revisionId } = await makeDesign({ name });
    await mailServerDown();

    await actAs(DESIGNER);
    const submitted = await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId }));
    expect(submitted.status).toBe(200);
    expect((await db("revisions").where({ id: revisionId }).first("status")).status).toBe("in_review");
    const request = await failedOnce(ENGINEER, name);
    expect(request).toMatchObject({ sent_at: null, attempts: 1 });
    // The audit event committed with the change.
    expect(await db("audit_events").where({ action: "revision-submitted", subject: revisionId }).first()).toBeTruthy();

    await actAs(ENGINEER);
    const approved = await review(jsonRequest("POST", "/x", { decision: "approve", password: DEMO_PASSWORD }), params({ revisionId }));
    expect(approved.status).toBe(200);
    expect((await db("revisions").where({ id: revisionId }).first("status")).status).toBe("approved");
    expect(await failedOnce(DESIGNER, name)).toMatchObject({ sent_at: null, attempts: 1 });

    // The server is back and the backoff has passed: one sweep sends both.
    mailServerBack();
    await db("email_outbox").whereIn("id", [request.id, (await outboxRow(DESIGNER, name)).id]).update({ next_attempt_at: db.fn.now() });
    await deliverPending();
    expect((await outboxRow(ENGINEER, name)).sent_at).not.toBeNull();
    expect((await outboxRow(DESIGNER, name)).sent_at).not.toBeNull();
    expect((await mailTo(ENGINEER, { subject: new RegExp(`Review requested: .*${name}`) })).text).toContain(`/reviews/${revisionId}`);
    expect((await mailTo(DESIGNER, { subject: new RegExp(`${name} approved`) })).text).toContain(`/field/${revisionId}`);
  });

  it("puts a design on hold and clears the hold with the mail server down, the mails waiting in the outbox", async () => {
    const name = `Outbox hold ${Date.now()}`;
    const { designId, revisionId } = await makeDesign({ name });
    await actAs(DESIGNER);
    await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId }));
    await actAs(ENGINEER);
    await review(jsonRequest("POST", "/x", { decision: "approve", password: DEMO_PASSWORD }), params({ revisionId }));
    const depthIn = (await db("revisions").where({ id: revisionId }).first("result")).result.footing.depthIn as number;
    await mailServerDown();

    const hole = new FormData();
    // A hole 6 in shallower than specified puts the design on hold (app/_lib/review/as-built.ts).
    for (const [k, v] of Object.entries({ revisionId, postId: "P1", measuredDiameterIn: "12", measuredDepthIn: String(depthIn - 6), groundFound: "as_expected" })) hole.append(k, v);
    await actAs(INSTALLER);
    expect(await outcomeOf(() => recordAsBuiltAction({}, hole))).toMatchObject({ kind: "value", value: { ok: true } });
    const [hold] = await openHolds(designId);
    expect(hold).toBeTruthy();
    expect(await failedOnce(ENGINEER, `On hold: ${name}`)).toMatchObject({ sent_at: null });

    const clear = new FormData();
    clear.append("holdId", hold.id);
    clear.append("note", "Hole re-bored to the specified depth and inspected.");
    clear.append("confirm", "yes");
    await actAs(ENGINEER);
    expect(await outcomeOf(() => clearHoldAction({}, clear))).toMatchObject({ value: { ok: true } });
    expect(await openHolds(designId)).toEqual([]);
    expect(await failedOnce(DESIGNER, `Hold cleared: ${name}`)).toMatchObject({ sent_at: null });
    expect(await db("audit_events").where({ action: "hold-cleared", subject: designId }).first()).toBeTruthy();
  });

  it("gives a mail up after the last attempt and says so in the organisation's audit log", async () => {
    const organisationId = (await db("memberships").where({ user_id: await userId(DESIGNER) }).first("organisation_id")).organisation_id;
    const subject = `Undeliverable ${Date.now()}`;
    const [{ id }] = await db("email_outbox")
      .insert({ organisation_id: organisationId, to: DESIGNER, subject, text: "x", attempts: MAX_ATTEMPTS - 1 })
      .returning("id");
    await mailServerDown();
    expect(await deliverOne(id)).toBe(false);
    const row = await db("email_outbox").where({ id }).first();
    expect(row).toMatchObject({ attempts: MAX_ATTEMPTS, sent_at: null });
    expect(row.failed_at).not.toBeNull();
    expect(row.last_error).toBeTruthy();
    const log = await listAuditEvents(organisationId, { limit: 20 });
    const event = log.rows.find((r) => r.action === "mail-failed" && r.detail.outboxId === id);
    expect(event).toMatchObject({ subject: DESIGNER, detail: { mailSubject: subject, attempts: MAX_ATTEMPTS } });
    // Given up: the sweep never tries it again.
    mailServerBack();
    await db("email_outbox").where({ id }).update({ next_attempt_at: db.fn.now() });
    expect(await deliverOne(id)).toBe(false);
  });
});
