import "server-only";
import { randomUUID } from "node:crypto";
import { assertRole, type CurrentUser } from "../auth";
import { ValidationError } from "../errors";
import { reviewSchema, submitSchema } from "../review/schemas";
import { decideRevision, ownedRevision, submitRevision } from "../review/workflow";
import { deleteObject, putObject } from "../storage";
import type { Body } from "./input";

/** A designer sends a revision to one of the organisation's engineers (`{ engineerId }`); the engineer is e-mailed. */
export async function submitForReview(user: CurrentUser, revisionId: string, body: Body): Promise<{ reviewId: string }> {
  const revision = await ownedRevision(user, revisionId);
  assertRole(user, "designer");
  const { engineerId } = submitSchema.parse(await body());
  return submitRevision(user, revision, engineerId);
}

const LETTER_LIMIT_BYTES = 10 * 1024 * 1024;

/**
 * An engineer decides a revision in review (`{ decision, comments }`), optionally attaching the
 * signed letter to an approval. The designer is e-mailed. A failed decision leaves no letter stored.
 */
export async function decideReview(user: CurrentUser, revisionId: string, body: Body, letter: File | null = null): Promise<{ status: "approved" | "changes_requested" }> {
  const revision = await ownedRevision(user, revisionId);
  assertRole(user, "engineer");
  const decision = reviewSchema.parse(await body());
  let letterKey: string | null = null;
  if (letter && letter.size > 0) {
    if (decision.decision !== "approve") throw ValidationError.field("letter", "Attach the letter only when approving");
    if (!/^(application\/pdf|image\/)/.test(letter.type) || letter.size > LETTER_LIMIT_BYTES) {
      throw ValidationError.field("letter", "The signed letter must be a PDF or an image of at most 10 MB");
    }
    letterKey = `orgs/${user.organisationId}/revisions/${revisionId}/letter-${randomUUID()}`;
    await putObject(letterKey, new Uint8Array(await letter.arrayBuffer()), letter.type);
  }
  try {
    return await decideRevision(user, revision, decision, letterKey);
  } catch (error) {
    if (letterKey) await deleteObject(letterKey).catch(() => undefined);
    throw error;
  }
}
