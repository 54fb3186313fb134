"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import type { ActionState } from "@/components/ui/action-state";
import { hashPassword } from "@/app/_lib/password";
import { requestIp } from "@/app/_lib/request-ip";
import { newPasswordSchema } from "@/app/_lib/schemas/account";
import { startSession } from "@/app/_lib/start-session";
import { hashToken } from "@/app/_lib/tokens";
import { recordAudit } from "@/db/queries/audit";
import { consumePasswordReset } from "@/db/queries/password-resets";
import { findSignInCandidate } from "@/db/queries/users";
import { resetProblem } from "./messages";

/** Sets the new password through a single-use link, then signs the person in with a fresh session. */
export async function setNewPasswordAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const parsed = newPasswordSchema.safeParse({ password: form.get("password") ?? undefined });
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors };
  const result = await consumePasswordReset(hashToken(String(form.get("token") ?? "")), await hashPassword(parsed.data.password));
  if (!result.ok) return { message: resetProblem(result.reason) };
  await recordAudit({ organisationId: result.organisationId, actorUserId: result.userId, action: "password-reset", subject: result.email, ip: await requestIp() });
  const membership = await findSignInCandidate(result.email);
  if (!membership) redirect("/login");
  await startSession(result.userId, membership.organisationId);
  redirect("/projects");
}
