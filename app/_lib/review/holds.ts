import { z } from "zod";
import { ConflictError } from "@/app/_lib/errors";
import { assertOwnedOrEngaged, type CurrentUser } from "@/app/_lib/auth";
import { env } from "@/app/_lib/env";
import { deliverSoon, enqueueMail } from "@/app/_lib/outbox";
import { composeMail } from "@/app/_lib/mail-template";
import { db } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { clearHoldRow, getHold, holdAudience, type HoldRecord } from "@/db/queries/holds";

export const clearHoldSchema = z.object({
  note: z.string().trim().min(3, { error: "Say how the hold was resolved and what the crew is to do (3 to 2000 characters)" }).max(2000, { error: "The note must be at most 2000 characters" }),
  confirm: z.literal(true, { error: "Tick the box to confirm that work may go on as your note says" }),
});

/** A hold of the user's organisation, or of a project an outside engineer is engaged on (404 otherwise). */
export async function holdFor(user: CurrentUser, holdId: string) {
  return assertOwnedOrEngaged(user, await getHold(holdId), (h) => ({ designId: h.designId }), "That hold");
}

/**
 * The steps of clearing a hold after the access checks (app/_lib/services/field.ts): the engineer
 * says how it was resolved and what the crew is to do (e.g. "pour as dug"). The designer and every
 * installer who logged a hole on the revision are e-mailed the note; it shows on the field spec
 * and in the as-built log from then on.
 */
export async function clearHold(user: CurrentUser, hold: HoldRecord & { organisationId: string }, note: string): Promise<{ told: string[] }> {
  const holdId = hold.id;
  const where = await db("designs as d").join("projects as p", "p.id", "d.project_id").where("d.id", hold.designId).first("d.name as designName", "p.name as projectName");
  const people = hold.revisionId ? await holdAudience(hold.revisionId) : [];
  const mail = composeMail({
    subject: `Hold cleared: ${where?.designName} (${where?.projectName})`,
    heading: "The hold is cleared",
    project: where?.projectName,
    revision: where?.designName,
    paragraphs: [
      `${user.name} cleared the hold on "${where?.designName}" (${where?.projectName}).`,
      `The hold was: ${hold.reason}`,
      `What to do now (the engineer's note): ${note}`,
    ],
    action: hold.revisionId ? { label: "Open the field spec", url: `${env.appUrl}/field/${hold.revisionId}` } : undefined,
  });
  // Clearing, its audit event and the e-mails commit together; the mails go out after commit.
  const mailIds = await db.transaction(async (trx) => {
    if (!(await clearHoldRow(hold.id, user.userId, note, trx))) throw new ConflictError("This hold was already cleared.");
    // The contractor's audit log holds it, also when an engaged outside engineer cleared the hold.
    await recordAudit({ organisationId: hold.organisationId, actorUserId: user.userId, action: "hold-cleared", subject: hold.designId, detail: { holdId, note } }, trx);
    const ids: string[] = [];
    for (const p of people) ids.push(await enqueueMail(trx, { organisationId: hold.organisationId, to: p.email, ...mail }));
    return ids;
  });
  await deliverSoon(mailIds);
  return { told: people.map((p) => p.name) };
}
