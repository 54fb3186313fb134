"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { controlCharacterState } from "@/app/_lib/action-errors";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { hashPassword, verifyPassword } from "@/app/_lib/password";
import { requestIp } from "@/app/_lib/request-ip";
import { acceptAsExistingSchema, acceptAsNewSchema } from "@/app/_lib/schemas/account";
import { startSession } from "@/app/_lib/start-session";
import { hashToken } from "@/app/_lib/tokens";
import { recordAudit } from "@/db/queries/audit";
import { acceptInvitation, findInvitation } from "@/db/queries/invitations";
import { attemptSucceeded, reserveAttempt } from "@/db/queries/sign-in-throttle";
import { findUserByEmail } from "@/db/queries/users";
import { invitationProblem } from "./messages";

/**
 * Accepts an invitation: a new person gives a name and password, someone who already has an account
 * proves it with their password (throttled like sign-in). Then they are signed in to the organisation.
 */
export async function acceptInvitationAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const values = typedValues(form, ["password", "token"]);
  const refused = controlCharacterState(values); // NUL and the like: a field-named error, as the API gives
  if (refused) return refused;
  const tokenHash = hashToken(String(form.get("token") ?? ""));
  const invitation = await findInvitation(tokenHash);
  if (!invitation) return { message: invitationProblem("unknown") };
  if (invitation.acceptedAt) return { message: invitationProblem("used") };
  if (invitation.expiresAt.getTime() <= Date.now()) return { message: invitationProblem("expired", invitation.organisationName) };

  const ip = await requestIp();
  const existing = await findUserByEmail(invitation.email);
  let who: Parameters<typeof acceptInvitation>[1];
  if (existing) {
    const parsed = acceptAsExistingSchema.safeParse({ password: form.get("password") ?? undefined });
    if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
    const attempt = await reserveAttempt(invitation.email, ip);
    if (!attempt.ok) return { message: `Too many failed attempts. Try again in ${Math.ceil(attempt.waitSeconds / 60)} minutes, or reset your password.`, values };
    if (!(await verifyPassword(existing.passwordHash, parsed.data.password))) {
      await recordAudit({ organisationId: invitation.organisationId, action: "sign-in-failed", subject: invitation.email, detail: { via: "invitation" }, ip });
      return { message: "Check the highlighted fields.", fieldErrors: { password: [`That is not the password of the Pierwise account for ${invitation.email}.`] }, values };
    }
    await attemptSucceeded(attempt.attemptId, invitation.email, ip);
    who = { existingUserId: existing.id };
  } else {
    const parsed = acceptAsNewSchema.safeParse({ name: form.get("name") ?? undefined, password: form.get("password") ?? undefined });
    if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
    who = { newUser: { name: parsed.data.name, passwordHash: await hashPassword(parsed.data.password) } };
  }

  const result = await acceptInvitation(tokenHash, who);
  if (!result.ok) return { message: invitationProblem(result.reason, invitation.organisationName), values };
  await recordAudit({ organisationId: result.organisationId, actorUserId: result.userId, action: "invitation-accepted", subject: result.email, detail: { roles: result.roles }, ip });
  await startSession(result.userId, result.organisationId);
  redirect("/projects");
}
