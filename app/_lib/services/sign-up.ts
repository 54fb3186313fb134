import "server-only";
import { db } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { EmailInUseError, createOrganisationWithAdmin } from "@/db/queries/organisations";
import { claimSignUpRequest, createSignUpRequest, findSignUpRequest, lockAddress, recentSignUpMails } from "@/db/queries/sign-up-requests";
import { findSignInCandidate, findUserByEmail } from "@/db/queries/users";
import { signUpProblem } from "../account-messages";
import { env } from "../env";
import { ConflictError } from "../errors";
import { deliverSoon, enqueueMail } from "../outbox";
import { composeMail } from "../mail-template";
import { hashPassword } from "../password";
import { requestIp } from "../request-ip";
import { signUpSchema } from "../schemas/account";
import { startSession } from "../start-session";
import { SIGN_UP_TTL_MS, hashToken, newToken } from "../tokens";
import type { Body } from "./input";

/** More sign-up mails than this per hour to one address are not sent (someone may be flooding the inbox). */
const MAX_MAILS_PER_HOUR = 3;

/** The one answer to every valid sign-up form, whether or not the address has an account. */
export function signUpSentMessage(email: string): string {
  return `We have sent an e-mail to ${email}. Open the link in it to finish creating your organisation (the link works once, for 24 hours). Nothing there after a few minutes? Check your spam folder, or sign in if you already have an account.`;
}

/**
 * Sign-up, step 1 (anyone). The answer never tells whether the address has an account (hardening
 * issue, finding 11): both cases hash the password, write one e-mail in one transaction and answer
 * the same words. A new address gets a single-use link that finishes the sign-up (step 2,
 * completeSignUp); the owner of an existing account is told that someone tried, and how to sign in
 * or reset. A few mails an hour per address at most, past which nothing is sent (same answer).
 */
export async function requestSignUp(body: Body): Promise<{ email: string; message: string }> {
  const input = signUpSchema.parse(await body());
  const ip = await requestIp();
  // Hashed for both cases, so the time taken does not tell them apart either.
  const passwordHash = await hashPassword(input.password);
  const existing = await findUserByEmail(input.email);
  const home = existing ? await findSignInCandidate(existing.email) : undefined;
  const mailIds = await db.transaction(async (trx) => {
    await lockAddress(trx, input.email);
    if ((await recentSignUpMails(trx, input.email)) >= MAX_MAILS_PER_HOUR) return [];
    if (existing) {
      await recordAudit({ organisationId: home?.organisationId, action: "sign-up-attempt-existing", subject: input.email, ip }, trx);
      return [await enqueueMail(trx, {
        organisationId: home?.organisationId ?? null,
        to: existing.email,
        kind: "sign-up-existing",
        ...composeMail({
          subject: "Someone tried to create a Pierwise account with your address",
          heading: "Your address already has an account",
          paragraphs: [
            `Someone (perhaps you) filled in the Pierwise sign-up form with ${existing.email}, which already has an account.`,
            "No new account or organisation was made, and your account is unchanged.",
            "To join another company's organisation, ask its admin to invite this address.",
          ],
          action: { label: "Sign in", url: `${env.appUrl}/login` },
          links: [{ label: "Or choose a new password", url: `${env.appUrl}/reset` }],
          footnote: "If it was not you, you can ignore this e-mail.",
        }),
      })];
    }
    const { token, tokenHash } = newToken();
    await createSignUpRequest(trx, {
      email: input.email, organisationName: input.organisationName, name: input.name, passwordHash,
      roles: ["admin", ...input.extraRoles], tokenHash, expiresAt: new Date(Date.now() + SIGN_UP_TTL_MS),
    });
    await recordAudit({ action: "sign-up-requested", subject: input.email, detail: { organisationName: input.organisationName }, ip }, trx);
    return [await enqueueMail(trx, {
      organisationId: null,
      to: input.email,
      kind: "sign-up",
      secretLink: true,
      ...composeMail({
        subject: "Finish creating your organisation on Pierwise",
        heading: `Finish creating ${input.organisationName}`,
        paragraphs: [
          `Someone (we hope you) asked to create the organisation "${input.organisationName}" on Pierwise with this address.`,
          "The link works once, for 24 hours.",
        ],
        action: { label: "Finish sign-up", url: `${env.appUrl}/signup/${token}` },
        footnote: "If you did not ask, ignore this e-mail: nothing is created unless the link is opened and confirmed.",
      }),
    })];
  });
  await deliverSoon(mailIds);
  return { email: input.email, message: signUpSentMessage(input.email) };
}

/** What the link page shows before the person confirms: the organisation and name, or why the link cannot be used. */
export async function signUpLink(token: string) {
  const request = token ? await findSignUpRequest(hashToken(token)) : undefined;
  if (!request) return { ok: false as const, message: signUpProblem("unknown") };
  if (request.usedAt) return { ok: false as const, message: signUpProblem("used") };
  if (request.expiresAt.getTime() <= Date.now()) return { ok: false as const, message: signUpProblem("expired") };
  return { ok: true as const, organisationName: request.organisationName, name: request.name, email: request.email };
}

/**
 * Sign-up, step 2 (the link is the permission): claims the link and creates the organisation, its
 * first admin and the membership in one transaction with the audit event, then signs them in.
 * A link used twice, expired, or an address that got an account meanwhile is refused by name.
 */
export async function completeSignUp(token: string): Promise<{ organisationId: string; userId: string }> {
  const ip = await requestIp();
  let created: { organisationId: string; userId: string; email: string };
  try {
    created = await db.transaction(async (trx) => {
      const claim = await claimSignUpRequest(trx, hashToken(token));
      if (!claim.ok) throw new ConflictError(signUpProblem(claim.reason));
      const { request } = claim;
      const made = await createOrganisationWithAdmin({
        organisationName: request.organisationName, name: request.name, email: request.email, passwordHash: request.passwordHash!, roles: request.roles,
      }, trx);
      await recordAudit({ organisationId: made.organisationId, actorUserId: made.userId, action: "sign-up", subject: request.email, ip }, trx);
      return { ...made, email: request.email };
    });
  } catch (error) {
    // Someone else took the address between the form and the link (an invitation accepted meanwhile); nothing was created.
    if (error instanceof EmailInUseError) throw new ConflictError(signUpProblem("email-in-use"));
    throw error;
  }
  await startSession(created.userId, created.organisationId);
  return { organisationId: created.organisationId, userId: created.userId };
}
