import "server-only";
import { assertRole, type CurrentUser } from "../auth";
import { ValidationError } from "../errors";
import { reviewSchema, submitSchema } from "../review/schemas";
import { decideRevision, ownedRevision, submitRevision } from "../review/workflow";
import { letterIsRecorded } from "@/db/queries/reviews";
import { deleteObject, putObject } from "../storage";
import { acceptUpload, revisionObjectKey } from "../uploads";
import type { Body } from "./input";

/** A designer sends a revision to one of the organisation's engineers or an engaged outside engineer (`{ engineerId }`); the engineer is e-mailed. */
export async function submitForReview(user: CurrentUser, revisionId: string, body: Body): Promise<{ reviewId: string }> {
  const revision = await ownedRevision(user, revisionId);
  assertRole(user, "designer");
  const { engineerId } = submitSchema.parse(await body());
  return submitRevision(user, revision, engineerId);
}

/**
 * An engineer decides a revision in review (`{ decision, comments }`), optionally attaching the
 * signed letter to an approval. The designer is e-mailed. A failed decision leaves no letter stored.
 */
export async function decideReview(user: CurrentUser, revisionId: string, body: Body, letter: File | null = null): Promise<{ status: "approved" | "changes_requested" }> {
  // An outside engineer engaged on the project reviews too; decideRevision holds them to what was submitted to them.
  const revision = await ownedRevision(user, revisionId, { engaged: true });
  assertRole(user, "engineer");
  const decision = reviewSchema.parse(await body());
  let letterKey: string | null = null;
  if (letter && letter.size > 0) {
    if (decision.decision !== "approve") throw ValidationError.field("letter", "Attach the letter only when approving");
    // The one upload policy: a PDF or photo by content, at most 10 MB, never SVG or HTML.
    const accepted = await acceptUpload(letter, "signedLetter", "letter");
    // Stored under the revision's organisation, also when an outside engineer approves.
    letterKey = revisionObjectKey(revision.organisationId, revisionId, "letter");
    await putObject(letterKey, accepted.bytes, accepted.type.contentType);
  }
  try {
    return await decideRevision(user, revision, decision, letterKey);
  } catch (error) {
    // A letter stored for a decision that was never recorded is removed again; the letter of a
    // recorded decision (a later step failed) is kept.
    if (letterKey && !(await letterIsRecorded(letterKey))) await deleteObject(letterKey).catch(() => undefined);
    throw error;
  }
}
