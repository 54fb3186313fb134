"use server";

import { z } from "zod";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { env } from "@/app/_lib/env";
import { sendMail } from "@/app/_lib/mail";
import { composeMail } from "@/app/_lib/mail-template";
import { requestIp } from "@/app/_lib/request-ip";
import { resetRequestSchema } from "@/app/_lib/schemas/account";
import { PASSWORD_RESET_TTL_MS, newToken } from "@/app/_lib/tokens";
import { recordAudit } from "@/db/queries/audit";
import { createPasswordReset } from "@/db/queries/password-resets";
import { findSignInCandidate, findUserByEmail } from "@/db/queries/users";

/** More links than this per hour for one person are not sent (someone may be flooding their inbox). */
const MAX_LINKS_PER_HOUR = 3;

async function issueResetLink(email: string, ip: string): Promise<void> {
  const user = await findUserByEmail(email);
  if (!user) return;
  const { token, tokenHash } = newToken();
  if (!(await createPasswordReset(user.id, tokenHash, new Date(Date.now() + PASSWORD_RESET_TTL_MS), MAX_LINKS_PER_HOUR))) return;
  await sendMail({
    to: user.email,
    ...composeMail({
      subject: "Set a new Pierwise password",
      heading: "Set a new password",
      paragraphs: [
        `Someone (we hope you) asked to set a new password for the Pierwise account ${user.email}.`,
        "The link works once, for 1 hour.",
      ],
      action: { label: "Choose a new password", url: `${env.appUrl}/reset/${token}` },
      footnote: "If you did not ask, ignore this e-mail: your password stays as it is.",
    }),
  });
  const membership = await findSignInCandidate(user.email);
  await recordAudit({ organisationId: membership?.organisationId, action: "password-reset-requested", subject: user.email, ip });
}

/**
 * Always gives the same answer, and answers before the e-mail is made and sent, so neither the
 * words nor the time taken tell whether an account uses the address.
 */
export async function requestPasswordResetAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const parsed = resetRequestSchema.safeParse({ email: form.get("email") ?? undefined });
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values: typedValues(form) };
  const ip = await requestIp();
  void issueResetLink(parsed.data.email, ip).catch((error) => console.error("password reset e-mail failed", error));
  return {
    ok: true,
    message: `If a Pierwise account uses ${parsed.data.email}, we have sent it a link to set a new password. The link works once, for 1 hour.`,
    values: typedValues(form),
  };
}
