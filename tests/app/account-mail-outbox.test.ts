/**
 * Invitation and password-reset e-mails go through the outbox (app/_lib/outbox.ts): written in the
 * transaction that makes the invitation or reset link and its audit event, so the change and its
 * e-mail never disagree. A mail server that is down does not undo an invitation; the outbox
 * delivers it later. Their links are single-use secrets: once a row is done (delivered or given
 * up) its links are replaced by a marker, so email_outbox keeps no usable token.
 */
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { acceptInvitationAction } from "@/app/(auth)/invite/[token]/actions";
import { requestPasswordResetAction } from "@/app/(auth)/reset/actions";
import { inviteMemberAction } from "@/app/(workspace)/admin/members/actions";
import { POST as engage } from "@/app/api/projects/[projectId]/engagements/route";
import { LINK_REMOVED, MAX_ATTEMPTS, deliverOne, deliverPending } from "@/app/_lib/outbox";
import { hashToken } from "@/app/_lib/tokens";
import { db } from "@/db/client";
import { formArgs } from "../support/access-matrix";
import { freshMember, uniqueEmail } from "../support/accounts";
import { firstLink, mailTo } from "../support/mailbox";
import { actAs, jsonRequest, outcomeOf, params, resetRequest } from "../support/next-context";
import { freshProject } from "../support/project-fixtures";
import { mailServerBack, mailServerDown } from "../support/mail-server";

beforeEach(() => resetRequest());
afterEach(mailServerBack);

/** The outbox row of one kind to one address, once its first attempt has been made (it may run in the background). */
async function attempted(to: string, kind: string) {
  for (let i = 0; i < 200; i++) {
    const row = await db("email_outbox").where({ to, kind }).first();
    if (row && (row.last_error || row.sent_at)) return row;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no ${kind} mail to ${to} was attempted`);
}

/** The server is back and the backoff has passed: one sweep sends what waits. */
async function sweepNow(to: string): Promise<void> {
  mailServerBack();
  await db("email_outbox").where({ to }).whereNull("sent_at").update({ next_attempt_at: db.fn.now() });
  await deliverPending();
}

type State = { ok?: boolean; message?: string };
const run = async (action: (p: never, f: FormData) => Promise<unknown>, fields: Record<string, string | string[]>) =>
  ((await outcomeOf(() => action(...(formArgs(fields) as [never, FormData])))) as { value: State }).value;

describe("invitation and reset e-mails through the outbox", () => {
  it("with the mail server down, an invitation is still made and reported as sent; the outbox delivers it later and the link works", async () => {
    const email = uniqueEmail("outbox-invitee");
    await mailServerDown();
    await actAs("admin@demo.pierwise.test");
    const sent = await run(inviteMemberAction, { email, roles: ["installer"] });
    expect(sent).toMatchObject({ ok: true, message: expect.stringMatching(`Invitation sent to ${email}`) });
    const invitation = await db("invitations").where({ email }).first("id", "expires_at");
    expect(new Date(invitation.expires_at).getTime()).toBeGreaterThan(Date.now()); // still usable
    expect(await db("audit_events").where({ action: "invitation-sent", subject: email }).first()).toBeTruthy();
    const waiting = await attempted(email, "invitation");
    expect(waiting).toMatchObject({ sent_at: null, attempts: 1 });

    await sweepNow(email);
    const link = firstLink(await mailTo(email, { subject: /invited you/ }));
    const token = link.split("/invite/")[1];
    expect((await db("invitations").where({ email }).first("token_hash")).token_hash).toBe(hashToken(token));
    resetRequest();
    expect(await outcomeOf(() => acceptInvitationAction(...(formArgs({ token, name: "Otto Outbox", password: "outbox-password-1" }) as [never, FormData]))))
      .toEqual({ kind: "redirect", location: "/projects" });
  });

  it("keeps recipient, subject, kind and times of a delivered invitation, but not its link", async () => {
    const email = uniqueEmail("scrub-invitee");
    await actAs("admin@demo.pierwise.test");
    expect(await run(inviteMemberAction, { email, roles: ["designer"] })).toMatchObject({ ok: true });
    const token = firstLink(await mailTo(email, { subject: /invited you/ })).split("/invite/")[1];
    const row = await db("email_outbox").where({ to: email }).first();
    expect(row).toMatchObject({ to: email, kind: "invitation", subject: expect.stringMatching(/invited you to Example Ground-Mount/) });
    expect(row.sent_at).not.toBeNull();
    expect(row.created_at).not.toBeNull();
    expect(row.text).not.toContain(token);
    expect(row.text).not.toMatch(/\/invite\//);
    expect(row.text).toContain(LINK_REMOVED);
    // The HTML part too: its button and its written-out link.
    expect(row.html).toBeTruthy();
    expect(row.html).not.toContain(token);
    expect(JSON.stringify(await db("email_outbox").where({ to: email }))).not.toContain(token);
  });

  it("a reset link asked for while the mail server is down is delivered later, then scrubbed from the outbox", async () => {
    const { email } = await freshMember();
    await mailServerDown();
    expect(await run(requestPasswordResetAction, { email })).toMatchObject({ ok: true });
    const waiting = await attempted(email, "password-reset");
    expect(waiting.sent_at).toBeNull();
    expect(waiting.text).toMatch(/\/reset\/\S+/); // still to deliver: the link waits with it
    expect(await db("audit_events").where({ action: "password-reset-requested", subject: email }).first()).toBeTruthy();

    await sweepNow(email);
    const token = firstLink(await mailTo(email, { subject: /new Pierwise password/ })).split("/reset/")[1];
    const row = await db("email_outbox").where({ id: waiting.id }).first();
    expect(row.sent_at).not.toBeNull();
    expect(row.text).not.toContain(token);
    expect(row.text).toContain(LINK_REMOVED);
  });

  it("scrubs a link-carrying mail that is given up too", async () => {
    const email = uniqueEmail("given-up");
    await actAs("admin@demo.pierwise.test");
    await mailServerDown();
    expect(await run(inviteMemberAction, { email, roles: ["installer"] })).toMatchObject({ ok: true });
    const row = await attempted(email, "invitation");
    await db("email_outbox").where({ id: row.id }).update({ attempts: MAX_ATTEMPTS - 1, next_attempt_at: db.fn.now() });
    expect(await deliverOne(row.id)).toBe(false);
    const given = await db("email_outbox").where({ id: row.id }).first();
    expect(given.failed_at).not.toBeNull();
    expect(given.text).not.toMatch(/\/invite\//);
    expect(given.text).toContain(LINK_REMOVED);
  });

  it("engages an outside engineer with the mail server down: engaged (201), the mail waits in the outbox", async () => {
    const projectId = await freshProject();
    const email = uniqueEmail("outbox-engineer");
    await mailServerDown();
    await actAs("designer@demo.pierwise.test");
    const response = await engage(jsonRequest("POST", "/x", { email }), params({ projectId }));
    expect(response.status).toBe(201);
    expect(await db("engagements").where({ project_id: projectId, email }).first("status")).toEqual({ status: "invited" });
    expect(await attempted(email, "engagement")).toMatchObject({ sent_at: null });
    await sweepNow(email);
    expect((await mailTo(email, { subject: /Review engagement/ })).text).toMatch(/\/engagements\//);
    expect((await db("email_outbox").where({ to: email, kind: "engagement" }).first()).text).toContain(LINK_REMOVED);
  });
});
