import "server-only";
import { assertRole, hasRole, type CurrentUser } from "../auth";
import { AccessError, ConflictError, ValidationError } from "../errors";
import { projectFor } from "../designs";
import { env } from "../env";
import { deliverSoon, enqueueMail } from "../outbox";
import { composeMail } from "../mail-template";
import { hashPassword } from "../password";
import { requestIp } from "../request-ip";
import { engagementSchema, engineerSignUpSchema, type EngagementInput } from "../schemas/engagement";
import { startSession } from "../start-session";
import { hashToken, newToken } from "../tokens";
import type { Body } from "./input";
import type { Knex } from "knex";
import { db } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import {
  createEngagement, EngagementExistsError, engagementsOfPerson, findEngagementByToken, getEngagement, projectEngagements, setEngagementStatus, type Engagement,
} from "@/db/queries/engagements";
import { listLicences, saveLicence } from "@/db/queries/licences";
import { EmailInUseError, createOrganisationWithAdmin } from "@/db/queries/organisations";
import { findUserByEmail } from "@/db/queries/users";
import { userEmailAndName } from "@/db/queries/review-people";

/**
 * Engagements of outside reviewing engineers, one function per use case; the route handlers and the
 * server actions are thin doors to these. Contractor side: engage, list, revoke (members of the
 * project's organisation). Engineer side: list own, accept, decline (only the invited person).
 * Each change, its audit event and its e-mail commit together; the outbox sends the mail after commit.
 */

export const ENGAGEMENT_STATUS_LABELS = { invited: "Invited", accepted: "Accepted", declined: "Declined", revoked: "Revoked" } as const;

export function engagementUrl(token: string): string {
  return `${env.appUrl}/engagements/${token}`;
}

/** The contractor's view of one engagement (what the API answers). */
export function engagementView(e: Engagement) {
  return {
    id: e.id, status: e.status, email: e.email, message: e.message, projectId: e.projectId,
    engineer: e.engineerUserId ? { id: e.engineerUserId, name: e.engineerName } : null,
    invitedBy: e.invitedByName, invitedAt: e.invitedAt, respondedAt: e.respondedAt, revokedAt: e.revokedAt,
  };
}

/**
 * A designer or admin engages an outside engineer on one project; the engineer is e-mailed a link.
 * The body is read only after the access checks, so another organisation learns nothing from a 422.
 */
export async function engageEngineer(user: CurrentUser, projectId: string, body: () => Promise<unknown> | unknown) {
  const project = await projectFor(user, projectId);
  assertRole(user, "designer", "admin");
  const input: EngagementInput = engagementSchema.parse(await body());
  if (input.email === user.email.toLowerCase()) throw invalid("email", "Enter the outside engineer's e-mail, not your own");
  const members = await db("memberships as m").join("users as u", "u.id", "m.user_id")
    .where({ "m.organisation_id": project.organisationId, "u.email": input.email }).whereNull("m.deactivated_at").first("u.id");
  if (members) throw invalid("email", "That person is already a member of your organisation: submit to them directly");
  const { token, tokenHash } = newToken();
  let id: string;
  let mailId: string;
  try {
    ({ id, mailId } = await db.transaction(async (trx) => {
      const id = await createEngagement({ organisationId: project.organisationId, projectId: project.id, email: input.email, message: input.message, tokenHash, invitedBy: user.userId }, trx);
      await recordAudit({ organisationId: project.organisationId, actorUserId: user.userId, action: "engagement-invited", subject: project.id, detail: { engagementId: id, email: input.email } }, trx);
      const mailId = await enqueueMail(trx, {
        organisationId: project.organisationId,
        to: input.email,
        kind: "engagement",
        secretLink: true,
        ...composeMail({
          subject: `Review engagement: ${project.name} for ${user.organisationName}`,
          heading: "You are asked to review a project",
          project: `${project.name} (${project.state})`,
          paragraphs: [
            `${user.name} of ${user.organisationName} asks you to be the reviewing engineer for the project "${project.name}" (${project.state}).`,
            ...(input.message ? [input.message] : []),
          ],
          action: { label: "Accept or decline", url: engagementUrl(token) },
          footnote: "No Pierwise account yet? The link lets you sign up, as yourself or as your engineering firm. Accepting needs your engineer's licence on file.",
        }),
      });
      return { id, mailId };
    }));
  } catch (error) {
    if (error instanceof EngagementExistsError) throw new ConflictError(`${input.email} is already invited to or engaged on this project.`);
    throw error;
  }
  await deliverSoon([mailId]);
  return engagementView((await getEngagement(id))!);
}

/** The project's engagements, newest first (any member of the project's organisation). */
export async function listEngagements(user: CurrentUser, projectId: string) {
  const project = await projectFor(user, projectId);
  return (await projectEngagements(project.id)).map(engagementView);
}

/**
 * Ends an engagement at once. Reviews still open with that engineer on the project go back to the
 * designer (the revision returns to draft and the unanswered request is withdrawn); decisions the
 * engineer already made stay in the record.
 */
export async function revokeEngagement(user: CurrentUser, projectId: string, engagementId: string) {
  const project = await projectFor(user, projectId);
  assertRole(user, "designer", "admin");
  const engagement = await getEngagement(engagementId);
  if (!engagement || engagement.projectId !== project.id) throw new AccessError(404, "That engagement was not found.");
  const { withdrawn, mailId } = await db.transaction(async (trx) => {
    const n = await trx("engagements").where({ id: engagement.id }).whereIn("status", ["invited", "accepted"])
      .update({ status: "revoked", revoked_by: user.userId, revoked_at: trx.fn.now() });
    if (n !== 1) throw new ConflictError(`This engagement is already ${engagement.status}.`, { status: engagement.status });
    const withdrawn = await withdrawOpenReviews(trx);
    await recordAudit({ organisationId: project.organisationId, actorUserId: user.userId, action: "engagement-revoked", subject: project.id, detail: { engagementId, withdrawnRevisionIds: withdrawn } }, trx);
    const mailId = await enqueueMail(trx, {
      organisationId: project.organisationId,
      to: engagement.email,
      kind: "engagement-ended",
      ...composeMail({
        subject: `Engagement ended: ${project.name}`,
        heading: "Your engagement has ended",
        project: project.name,
        paragraphs: [`${user.name} of ${user.organisationName} ended your engagement on "${project.name}". You no longer have access to it; decisions you made stay on record.`],
        action: { label: "Open Pierwise", url: `${env.appUrl}/queue` },
      }),
    });
    return { withdrawn, mailId };
  });
  await deliverSoon([mailId]);
  return engagementView((await getEngagement(engagement.id))!);

  async function withdrawOpenReviews(trx: Knex.Transaction): Promise<string[]> {
    if (!engagement!.engineerUserId) return [];
    const open = await trx("reviews as v").join("revisions as r", "r.id", "v.revision_id").join("designs as d", "d.id", "r.design_id")
      .where({ "d.project_id": project.id, "v.engineer_id": engagement!.engineerUserId }).whereNull("v.decision").select("v.id", "v.revision_id as revisionId");
    for (const o of open) {
      await trx("reviews").where({ id: o.id }).whereNull("decision").delete();
      await trx("revisions").where({ id: o.revisionId, status: "in_review" }).update({ status: "draft" });
    }
    return open.map((o) => o.revisionId as string);
  }
}

/** The engineer's engagements across every contractor. */
export async function myEngagements(user: CurrentUser) {
  const rows = await engagementsOfPerson(user.userId, user.email);
  return rows.map((e) => ({
    id: e.id, status: e.status, message: e.message, invitedBy: e.invitedByName, invitedAt: e.invitedAt,
    organisation: { id: e.organisationId, name: e.organisationName },
    project: { id: e.projectId, name: e.projectName, state: e.projectState },
  }));
}

/** The engagement addressed to this person (by e-mail, or by account once answered); 404 for anyone else. */
async function addressedTo(user: CurrentUser, engagementId: string): Promise<Engagement> {
  const e = await getEngagement(engagementId);
  const mine = e && (e.engineerUserId ? e.engineerUserId === user.userId : e.email === user.email.toLowerCase());
  if (!e || !mine) throw new AccessError(404, "That engagement was not found.");
  return e;
}

/** The invited engineer accepts (needs the engineer role and a licence on file) or declines. */
export async function answerEngagement(user: CurrentUser, engagementId: string, answer: "accept" | "decline") {
  const e = await addressedTo(user, engagementId);
  if (answer === "accept") {
    assertRole(user, "engineer");
    if ((await listLicences(user.userId)).length === 0) {
      throw invalid("licence", "Add your engineer's licence (state, number, expiry) under Account before accepting");
    }
  }
  const from: Engagement["status"][] = answer === "accept" ? ["invited"] : ["invited", "accepted"];
  const to = answer === "accept" ? "accepted" : "declined";
  const inviter = await db("engagements").where({ id: e.id }).first("invited_by");
  const to_ = inviter ? await userEmailAndName(inviter.invited_by) : undefined;
  const mailIds = await db.transaction(async (trx) => {
    if (!(await setEngagementStatus(e.id, from, to, { engineerUserId: user.userId }, trx))) {
      throw new ConflictError(`This engagement is ${e.status} and can no longer be ${answer === "accept" ? "accepted" : "declined"}.`, { status: e.status });
    }
    await recordAudit({ organisationId: e.organisationId, actorUserId: user.userId, action: `engagement-${to}`, subject: e.projectId, detail: { engagementId: e.id } }, trx);
    if (!to_) return [];
    return [await enqueueMail(trx, {
      organisationId: e.organisationId,
      to: to_.email,
      kind: `engagement-${to}`,
      ...composeMail({
        subject: `${user.name} ${to} the engagement on ${e.projectName}`,
        heading: `Engagement ${to}`,
        project: e.projectName,
        paragraphs: [
          `${user.name} (${user.organisationName}) ${to} your engagement on "${e.projectName}".`,
          ...(to === "accepted" ? ["You can now submit revisions of this project to them for review."] : []),
        ],
        action: { label: "Open the project", url: `${env.appUrl}/projects/${e.projectId}` },
      }),
    })];
  });
  await deliverSoon(mailIds);
  return { id: e.id, status: to };
}

/** The engineer's standing, for the engagement page: may they accept right now? */
export async function canAccept(user: CurrentUser): Promise<{ ok: true } | { ok: false; message: string }> {
  if (!hasRole(user, "engineer")) return { ok: false, message: `You are signed in to ${user.organisationName} without the reviewing-engineer role; ask its admin to add it.` };
  if ((await listLicences(user.userId)).length === 0) return { ok: false, message: "Add your engineer's licence under Account before accepting." };
  return { ok: true };
}

const invalid = ValidationError.field;

/**
 * An engineer with no account signs up from the engagement link: their organisation (their firm, or
 * just themselves), the account with the admin and engineer roles, and their licence, with the
 * audit event, in one transaction; then they are signed in. The link's token is the permission,
 * and the e-mail is the one it was sent to (its owner got the link, so saying the address has an
 * account tells them nothing new).
 */
export async function signUpFromEngagement(token: string, body: Body): Promise<{ userId: string; organisationId: string }> {
  const engagement = token ? await findEngagementByToken(hashToken(token)) : undefined;
  if (!engagement || engagement.status !== "invited") throw new ConflictError("This engagement link is no longer open; ask the contractor to engage you again.");
  const emailInUse = () => new ConflictError("An account with this e-mail exists already: sign in to answer.");
  if (await findUserByEmail(engagement.email)) throw emailInUse();
  const input = engineerSignUpSchema.parse(await body());
  const passwordHash = await hashPassword(input.password);
  const ip = await requestIp();
  let created: { organisationId: string; userId: string };
  try {
    created = await db.transaction(async (trx) => {
      const made = await createOrganisationWithAdmin({
        organisationName: input.kind === "firm" ? input.firmName : `${input.name} (independent engineer)`,
        name: input.name,
        email: engagement.email,
        passwordHash,
        roles: ["admin", "engineer"],
      }, trx);
      await saveLicence(made.userId, { state: input.state, licenceNumber: input.licenceNumber, expiresOn: input.expiresOn }, trx);
      await recordAudit({ organisationId: made.organisationId, actorUserId: made.userId, action: "sign-up", subject: engagement.email, detail: { fromEngagement: engagement.id }, ip }, trx);
      return made;
    });
  } catch (error) {
    if (error instanceof EmailInUseError) throw emailInUse();
    throw error;
  }
  await startSession(created.userId, created.organisationId);
  return created;
}
