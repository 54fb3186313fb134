import type { Knex } from "knex";
import { db } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { sendMail } from "./mail";

/**
 * The e-mail outbox. A use case calls enqueueMail inside the transaction that changes state, so the
 * mail exists exactly when the change does; after commit it calls deliverSoon, which tries the rows
 * right away but never fails the caller because of the mail server. A sweep started on
 * first use retries what is still pending with a growing backoff; after MAX_ATTEMPTS failures the
 * row is given up and a "mail-failed" event goes to the organisation's audit log.
 */
export interface QueuedMail {
  organisationId: string | null;
  to: string;
  subject: string;
  text: string;
  html?: string | null;
  /** What the mail is ("invitation", "password-reset"…): kept when the body is scrubbed. */
  kind?: string;
  /**
   * The mail carries a link with a token in it (single-use invitation, reset and sign-up links, an
   * engagement link): once the row is done (sent, or given up) its links are replaced by a marker,
   * so the table never keeps a usable token (db/README.md).
   */
  secretLink?: boolean;
}

/** What stands in a delivered mail's stored body where its single-use link was. */
export const LINK_REMOVED = "[single-use link removed after delivery]";

/** The stored body with every link replaced by the marker. */
export function scrubLinks(body: string): string {
  return body.replace(/https?:\/\/[^\s"'<>]+/g, LINK_REMOVED);
}

export const MAX_ATTEMPTS = 8;
const SWEEP_EVERY_MS = 30_000;
const SWEEP_BATCH = 20;

/** Writes one mail in the caller's transaction; returns its outbox id for deliverSoon. */
export async function enqueueMail(trx: Knex.Transaction, mail: QueuedMail): Promise<string> {
  const [row] = await trx("email_outbox")
    .insert({
      organisation_id: mail.organisationId, to: mail.to, subject: mail.subject, text: mail.text, html: mail.html ?? null,
      kind: mail.kind ?? null, scrub_after_delivery: mail.secretLink ?? false,
    })
    .returning("id");
  return row.id as string;
}

/**
 * After commit: tries each row now. Never throws: a failure stays in the row for the sweep, and the
 * caller still reports success because the change is committed. It is awaited (sendMail bounds every
 * step, so a frozen server costs at most what it did before the outbox) so a mail that can go out
 * has gone out by the time the user sees the answer, in the order the changes happened.
 */
export async function deliverSoon(ids: string[]): Promise<void> {
  startSweep();
  await Promise.allSettled(ids.map((id) => deliverOne(id)));
}

/**
 * Claims one due row and sends it. Claiming moves next_attempt_at forward by the backoff first, so
 * a second sweeper (or the post-commit attempt) skips the row while this one is sending it.
 * Returns true when the mail went out.
 */
export async function deliverOne(id: string): Promise<boolean> {
  const [row] = await db("email_outbox")
    .where({ id }).whereNull("sent_at").whereNull("failed_at").where("next_attempt_at", "<=", db.fn.now())
    .update({
      attempts: db.raw("attempts + 1"),
      // Backoff after n attempts: 30 s, 1 min, 2 min … capped at 30 min (attempts here is the old value).
      next_attempt_at: db.raw("now() + make_interval(secs => least(30 * power(2, attempts), 1800))"),
    })
    .returning(["id", "organisation_id", "to", "subject", "text", "html", "attempts", "scrub_after_delivery"]);
  if (!row) return false;
  // A done row that carried a single-use link keeps recipient, subject, kind and times, not the link.
  const scrubbed = row.scrub_after_delivery ? { text: scrubLinks(row.text), html: row.html === null ? null : scrubLinks(row.html) } : {};
  try {
    await sendMail({ to: row.to, subject: row.subject, text: row.text, ...(row.html ? { html: row.html } : {}) });
    await db("email_outbox").where({ id }).update({ sent_at: db.fn.now(), last_error: null, ...scrubbed });
    return true;
  } catch (error) {
    const lastError = error instanceof Error ? error.message.slice(0, 500) : String(error).slice(0, 500);
    const givenUp = row.attempts >= MAX_ATTEMPTS;
    await db.transaction(async (trx) => {
      await trx("email_outbox").where({ id }).update({ last_error: lastError, ...(givenUp ? { failed_at: trx.fn.now(), ...scrubbed } : {}) });
      if (givenUp) {
        await recordAudit({
          organisationId: row.organisation_id, action: "mail-failed", subject: row.to,
          detail: { outboxId: id, mailSubject: row.subject, attempts: row.attempts, lastError },
        }, trx);
      }
    });
    return false;
  }
}

/** One pass of the sweep: every pending row that is due, oldest first. Returns how many went out. */
export async function deliverPending(): Promise<number> {
  const due = await db("email_outbox")
    .whereNull("sent_at").whereNull("failed_at").where("next_attempt_at", "<=", db.fn.now())
    .orderBy("next_attempt_at").limit(SWEEP_BATCH).pluck("id");
  let sent = 0;
  for (const id of due) if (await deliverOne(id).catch(() => false)) sent++;
  return sent;
}

const globalForOutbox = globalThis as unknown as { pierwiseOutboxSweep?: NodeJS.Timeout };

/** Starts the periodic sweep once per process; unref'd, so it never keeps the process alive. */
export function startSweep(): void {
  if (globalForOutbox.pierwiseOutboxSweep) return;
  let running = false;
  globalForOutbox.pierwiseOutboxSweep = setInterval(() => {
    if (running) return;
    running = true;
    deliverPending().catch(() => undefined).finally(() => { running = false; });
  }, SWEEP_EVERY_MS);
  globalForOutbox.pierwiseOutboxSweep.unref();
}
