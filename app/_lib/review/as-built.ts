import { z } from "zod";
import { ConflictError, ValidationError } from "@/app/_lib/errors";
import type { CurrentUser } from "@/app/_lib/auth";
import { env } from "@/app/_lib/env";
import { deliverSoon, enqueueMail, type QueuedMail } from "@/app/_lib/outbox";
import { composeMail } from "@/app/_lib/mail-template";
import { deleteObject, putObject } from "@/app/_lib/storage";
import { acceptUpload, revisionObjectKey, UPLOAD_KINDS } from "@/app/_lib/uploads";
import type { DesignResult } from "@/engine";
import { imperialText, qty, says, type QuantityText } from "@/engine/quantity-text";
import { db } from "@/db/client";
import { GROUND_FOUND, insertAsBuilt } from "@/db/queries/as-built";
import { recordAudit } from "@/db/queries/audit";
import { insertHold } from "@/db/queries/holds";
import { userEmailAndName } from "@/db/queries/review-people";
import { reviewsOfRevision, type RevisionContext } from "@/db/queries/reviews";
import { GROUND_FOUND_LABELS } from "./ground-labels";


const number = (label: string, min: number, max: number) =>
  z.coerce.number({ error: `${label} must be a number between ${min} and ${max} in` })
    .min(min, { error: `${label} must be between ${min} and ${max} in` })
    .max(max, { error: `${label} must be between ${min} and ${max} in` });

/** One hole as the crew measured it. */
export const asBuiltSchema = z.object({
  postId: z.string({ error: "Choose the post this hole is for" }).min(1, { error: "Choose the post this hole is for" }),
  measuredDiameterIn: number("Measured diameter", 4, 120),
  measuredDepthIn: number("Measured depth", 1, 720),
  groundFound: z.enum(GROUND_FOUND, { error: "Ground found must be one of: as expected, rock, water, fill, caving" }),
  notes: z.string().max(2000, { error: "Notes must be at most 2000 characters" }).default(""),
});
export type AsBuiltInput = z.output<typeof asBuiltSchema>;

export const PHOTO_LIMITS = { count: 6, bytes: UPLOAD_KINDS.asBuiltPhoto.maxBytes };

/**
 * Why this hole stops the job, if it does: shallower or narrower than specified, or ground that
 * contradicts the presumed soil (the design's soil values and frost depth assumed none of these).
 * Saved as customary words (the e-mail and the API read them so); the sizes are quantities, so a
 * screen words the saved reason in the reader's units (components/format `composedIn`).
 */
export function holdReasons(result: DesignResult, entry: AsBuiltInput): string[] {
  const reasons: QuantityText[] = [];
  const spec = result.field.posts.find((p) => p.id === entry.postId);
  const depthIn = spec?.embedmentIn ?? result.footing.depthIn;
  // A size measured in mm and saved in inches reads to 0.1 in, not 39.37007874 in.
  if (entry.measuredDepthIn < depthIn) reasons.push(says`Hole ${entry.postId} is ${qty(entry.measuredDepthIn, "in")} deep, shallower than the ${qty(depthIn, "in")} specified.`);
  if (entry.measuredDiameterIn < result.footing.diameterIn) reasons.push(says`Hole ${entry.postId} is ${qty(entry.measuredDiameterIn, "in")} across, narrower than the ${qty(result.footing.diameterIn, "in")} specified.`);
  if (entry.groundFound !== "as_expected") {
    reasons.push([`Hole ${entry.postId}: ${GROUND_FOUND_LABELS[entry.groundFound].toLowerCase()} found, which contradicts the presumed soil and frost depth the design assumed.`]);
  }
  return reasons.map(imperialText);
}

/**
 * The steps of recording a hole after the access checks (app/_lib/services/field.ts): a hole of an
 * approved revision, with photos. When the hole contradicts the spec, the design goes on hold and
 * the approving engineer and the designer are e-mailed.
 */
export async function recordAsBuilt(user: CurrentUser, revision: RevisionContext, input: AsBuiltInput, photos: File[]): Promise<{ entryId: string; holdId: string | null; reasons: string[] }> {
  const revisionId = revision.id;
  if (revision.status !== "approved") throw new ConflictError("As-built entries are recorded only against an approved revision.");
  if (!revision.result.field.posts.some((p) => p.id === input.postId)) {
    throw ValidationError.field("postId", `Post must be one of ${revision.result.field.posts.map((p) => p.id).join(", ")}`);
  }
  const real = photos.filter((p) => p.size > 0);
  if (real.length > PHOTO_LIMITS.count) throw ValidationError.field("photos", `Attach at most ${PHOTO_LIMITS.count} photos per hole`);
  // The one upload policy: sniffed by content, size and pixel limits, refusals naming the file.
  const accepted = [];
  for (const p of real) accepted.push(await acceptUpload(p, "asBuiltPhoto", "photos"));
  const keys: string[] = [];
  let committed = false;
  try {
    for (const p of accepted) {
      const key = revisionObjectKey(user.organisationId, revisionId, "as-built");
      await putObject(key, p.bytes, p.type.contentType);
      keys.push(key);
    }
    const reasons = holdReasons(revision.result, input);
    const holdMails = reasons.length ? await holdMail(user.organisationId, revisionId, revision.designName, revision.projectName, user.name, reasons) : [];
    // The entry, the hold, its audit event and its e-mails commit together; the mails go out after commit.
    const { mailIds, ...out } = await db.transaction(async (trx) => {
      const entryId = await insertAsBuilt(trx, { ...input, revisionId, organisationId: user.organisationId, photoKeys: keys, recordedBy: user.userId });
      const holdId = reasons.length
        ? await insertHold(trx, { designId: revision.designId, organisationId: user.organisationId, revisionId, asBuiltEntryId: entryId, reason: reasons.join(" "), raisedBy: user.userId })
        : null;
      await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: holdId ? "design-held" : "as-built-recorded", subject: revisionId, detail: { postId: input.postId } }, trx);
      const mailIds: string[] = [];
      if (holdId) for (const m of holdMails) mailIds.push(await enqueueMail(trx, m));
      return { entryId, holdId, mailIds };
    });
    committed = true;
    await deliverSoon(mailIds);
    return { ...out, reasons };
  } catch (error) {
    // Photos whose entry was never saved are removed; photos of a saved entry are never touched.
    if (!committed) await Promise.allSettled(keys.map((k) => deleteObject(k)));
    throw error;
  }
}

/** The hold e-mails to the approving engineer and whoever submitted the revision, ready for the outbox. */
async function holdMail(organisationId: string, revisionId: string, designName: string, projectName: string, raisedBy: string, reasons: string[]): Promise<QueuedMail[]> {
  const reviews = await reviewsOfRevision(revisionId);
  const people = new Set<string>();
  for (const r of reviews) {
    if (r.decision === "approve" && r.decidedBy) people.add(r.decidedBy);
    people.add(r.submittedBy);
  }
  const mail = composeMail({
    subject: `On hold: ${designName} (${projectName})`,
    heading: "ON HOLD: a hole does not match the approved spec",
    project: projectName,
    revision: designName,
    paragraphs: [`${raisedBy} recorded a hole on "${designName}" (${projectName}) that does not match the approved spec:`],
    list: reasons,
    footnote: "The design is ON HOLD: no concrete is to be placed until an engineer reviews it and clears the hold.",
    action: { label: "Open the review", url: `${env.appUrl}/reviews/${revisionId}` },
  });
  const mails: QueuedMail[] = [];
  for (const id of people) {
    const person = await userEmailAndName(id);
    if (person) mails.push({ organisationId, to: person.email, ...mail });
  }
  return mails;
}
