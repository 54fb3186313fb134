import { randomBytes } from "node:crypto";
import { assertOwned, assertOwnedOrEngaged, type CurrentUser } from "@/app/_lib/auth";
import { AccessError, ConflictError, ValidationError } from "@/app/_lib/errors";
import { env } from "@/app/_lib/env";
import { deliverSoon, enqueueMail } from "@/app/_lib/outbox";
import { db } from "@/db/client";
import { STATUS_PHRASES } from "@/db/revision-status";
import { recordAudit } from "@/db/queries/audit";
import { activeMember, userEmailAndName } from "@/db/queries/review-people";
import { engagedEngineers } from "@/db/queries/engagements";
import {
  designAuthorIds, factsOf, getRevisionContext, insertReview, latestRevisionNumber, lockDesign, lockRevisionStatus, recordDecision,
  reviewsOfRevision, setRevisionStatus, type RevisionContext,
} from "@/db/queries/reviews";
import { confirmSignature, decideOverrides } from "./approval-signature";
import { formatRatio } from "@/components/format/ratio";
import { composeMail } from "@/app/_lib/mail-template";
import { fieldLabel } from "@/components/design/fields";
import { engineerEligibility, licenceEligibility } from "./eligibility";
import type { ReviewBody } from "./schemas";


const invalid = ValidationError.field;

/**
 * Loads a revision the user's organisation owns (404 otherwise, so ids cannot be probed). With
 * `{ engaged: true }` an outside engineer engaged on its project may load it too (reads, review).
 */
export async function ownedRevision(user: CurrentUser, revisionId: string, reach: { engaged?: boolean } = {}): Promise<RevisionContext> {
  const revision = await getRevisionContext(revisionId);
  if (reach.engaged) return assertOwnedOrEngaged(user, revision, (r) => ({ projectId: r.projectId }), "That revision");
  return assertOwned(user, revision, "That revision");
}

/** A member engineer of the organisation, or an outside engineer with an accepted engagement on the project. */
async function chosenEngineer(organisationId: string, projectId: string, engineerId: string) {
  const member = await activeMember(organisationId, engineerId);
  if (member) return member.roles.includes("engineer") ? member : undefined;
  const engaged = (await engagedEngineers(projectId)).find((e) => e.userId === engineerId);
  return engaged ? { ...engaged, roles: ["engineer" as const] } : undefined;
}

export function reviewUrl(revisionId: string): string {
  return `${env.appUrl}/reviews/${revisionId}`;
}

/**
 * The steps of submitting after the access checks (app/_lib/services/review.ts): a draft (or a
 * revision with changes requested) goes to one of the organisation's engineers. The revision must
 * be the design's newest; the engineer must be able to decide it.
 */
export async function submitRevision(user: CurrentUser, revision: RevisionContext, engineerId: string): Promise<{ reviewId: string }> {
  const revisionId = revision.id;
  const engineer = await chosenEngineer(user.organisationId, revision.projectId, engineerId);
  if (!engineer) throw invalid("engineerId", "Choose a reviewing engineer who is an active member of your organisation or engaged on this project");
  if (engineer.userId === user.userId) throw invalid("engineerId", "Choose another engineer: nobody can review their own design");
  if ((await designAuthorIds(revision.designId)).includes(engineer.userId)) {
    throw invalid("engineerId", `${engineer.name} authored a revision of this design and cannot review it; choose another engineer`);
  }
  const eligible = await engineerEligibility(engineer.userId, engineer.name, revision.projectState);
  if (!eligible.ok) throw invalid("engineerId", eligible.message);

  // The state change, its audit event and its e-mail commit together; the mail goes out after commit.
  const { reviewId, mailId } = await db.transaction(async (trx) => {
    // Revision first, then design: the order a decision takes (its status change updates the design
    // through the trigger of 20261202500000), so the two can never wait on each other in a cycle.
    const status = await lockRevisionStatus(trx, revisionId);
    await lockDesign(trx, revision.designId);
    if (status !== "draft" && status !== "changes_requested") {
      throw new ConflictError(`Only a draft or a revision with changes requested can be submitted; revision ${revision.number} is ${STATUS_PHRASES[status!]}.`, { status });
    }
    const latest = await latestRevisionNumber(revision.designId, trx);
    if (latest !== revision.number) throw new ConflictError(`Revision ${revision.number} is not the newest (revision ${latest} is); submit the newest revision.`);
    await setRevisionStatus(trx, revisionId, ["draft", "changes_requested"], "in_review");
    const reviewId = await insertReview(trx, { revisionId, organisationId: user.organisationId, engineerId: engineer.userId, submittedBy: user.userId });
    await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "revision-submitted", subject: revisionId, detail: { engineerId } }, trx);
    const mailId = await enqueueMail(trx, {
      organisationId: user.organisationId,
      to: engineer.email,
      ...composeMail({
        subject: `Review requested: ${revision.projectName} — ${revision.designName}, revision ${revision.number}`,
        heading: "A revision is waiting for your review",
        project: `${revision.projectName} (${revision.projectState})`,
        revision: `${revision.designName}, revision ${revision.number}`,
        paragraphs: [
          `${user.name} asks you to review revision ${revision.number} of "${revision.designName}" (${revision.projectName}, ${revision.projectState}).`,
          "You can approve it or request changes with comments pinned to the inputs.",
        ],
        action: { label: "Open the review", url: reviewUrl(revisionId) },
      }),
    });
    return { reviewId, mailId };
  });
  await deliverSoon([mailId]);
  return { reviewId };
}

/**
 * The steps of an engineer's decision after ownership and role (app/_lib/services/review.ts). Both decisions need an engineer licensed in
 * the project's state who authored no revision of the design. Approval records name, licence
 * number, state and time; from then on the database refuses any change to the revision.
 */
export async function decideRevision(
  user: CurrentUser,
  revision: RevisionContext,
  body: ReviewBody,
  letterFileKey: string | null = null,
): Promise<{ status: "approved" | "changes_requested" }> {
  const revisionId = revision.id;
  if ((await designAuthorIds(revision.designId)).includes(user.userId)) {
    throw new AccessError(403, body.decision === "approve" ? "You cannot approve a design you authored." : "You cannot review a design you authored.", true);
  }
  const eligible = await licenceEligibility(user.userId, revision.projectState);
  if (!eligible.ok) throw new AccessError(403, eligible.message, true);
  const inputKeys = new Set(flattenKeys(revision.input));
  body.comments.forEach((c, i) => {
    if (c.fieldPath && !inputKeys.has(c.fieldPath)) throw invalid(`comments.${i}.fieldPath`, `"${c.fieldPath}" is not an input of this revision; pin the comment to an input shown on the page or leave it unpinned`);
  });
  const approving = body.decision === "approve";
  if (!approving && body.overrides.length) throw invalid("overrides", "Overrides go with an approval; remove them to request changes");
  const overrides = approving ? decideOverrides(revision.result, body.overrides) : [];
  // Last, so a refused approval for any other reason never costs a password attempt.
  if (approving) await confirmSignature(user, body.password);

  const to = body.decision === "approve" ? "approved" : "changes_requested";
  const mailIds = await db.transaction(async (trx) => {
    const status = await lockRevisionStatus(trx, revisionId);
    if (status !== "in_review") throw new ConflictError(`Only a revision in review can be decided; revision ${revision.number} is ${STATUS_PHRASES[status!]}.`, { status });
    const open = (await reviewsOfRevision(revisionId, trx)).find((r) => r.decision === null);
    if (!open) throw new ConflictError("This revision has no open review to decide.");
    // An outside engineer decides only what was submitted to them.
    if (revision.organisationId !== user.organisationId && open.engineerId !== user.userId) {
      throw new AccessError(403, "This revision was submitted to another engineer; only they can decide it.", true);
    }
    await recordDecision(trx, open.id, {
      decision: body.decision === "approve" ? "approve" : "request_changes",
      decidedBy: user.userId,
      engineerName: user.name,
      licence: { number: eligible.licence.licenceNumber, state: eligible.licence.state, expiresOn: eligible.licence.expiresOn },
      letterFileKey,
      comments: body.comments,
      // 16 random bytes: the public verify code cannot be guessed or walked.
      approval: approving ? { overrides, facts: factsOf(revision), verifyCode: randomBytes(16).toString("base64url") } : undefined,
    });
    await setRevisionStatus(trx, revisionId, ["in_review"], to);
    // The contractor's audit log holds the decision, also when an outside engineer made it.
    await recordAudit({ organisationId: revision.organisationId, actorUserId: user.userId, action: `revision-${to.replace("_", "-")}`, subject: revisionId }, trx);
    // The decision, its audit event and the designer's e-mail commit together.
    const designer = await userEmailAndName(open.submittedBy);
    if (!designer) return [];
    const words = to === "approved" ? "approved" : "sent back with changes requested";
    return [await enqueueMail(trx, {
      organisationId: revision.organisationId,
      to: designer.email,
      ...composeMail({
        subject: `Revision ${revision.number} of ${revision.designName} ${to === "approved" ? "approved" : "needs changes"}`,
        heading: to === "approved" ? "Revision approved" : "Changes requested",
        project: revision.projectName,
        revision: `${revision.designName}, revision ${revision.number}`,
        paragraphs: [
          `${user.name} (licence ${eligible.licence.licenceNumber}, ${eligible.licence.state}) ${words} revision ${revision.number} of "${revision.designName}" (${revision.projectName}).`,
          ...(overrides.length || body.comments.length ? [overrides.length ? "Approved although checks fail, for the reasons given; and the engineer's comments:" : "The engineer's comments:"] : []),
        ],
        list: [
          ...overrides.map((o) => `Fails, accepted: ${o.title} (ratio ${formatRatio(o.ratio)}): ${o.reason}`),
          ...body.comments.map((c) => `${c.fieldPath ? `[${fieldLabel(c.fieldPath)}] ` : ""}${c.body}`),
        ],
        action: { label: "Open the review", url: reviewUrl(revisionId) },
        links: to === "approved" ? [{ label: "Field spec for the crew", url: `${env.appUrl}/field/${revisionId}` }] : [],
      }),
    })];
  });
  await deliverSoon(mailIds);
  return { status: to };
}

/** Every leaf path of an input object ("site.soil.soilClass"), for pinning comments. */
export function flattenKeys(value: unknown, prefix = ""): string[] {
  if (value === null || typeof value !== "object" || Array.isArray(value)) return prefix ? [prefix] : [];
  return Object.entries(value as Record<string, unknown>).flatMap(([k, v]) => flattenKeys(v, prefix ? `${prefix}.${k}` : k));
}
