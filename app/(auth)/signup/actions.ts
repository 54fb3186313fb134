"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { controlCharacterState } from "@/app/_lib/action-errors";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { hashPassword } from "@/app/_lib/password";
import { requestIp } from "@/app/_lib/request-ip";
import { signUpInput, signUpSchema } from "@/app/_lib/schemas/account";
import { startSession } from "@/app/_lib/start-session";
import { recordAudit } from "@/db/queries/audit";
import { EmailInUseError, createOrganisationWithAdmin } from "@/db/queries/organisations";
import { findUserByEmail } from "@/db/queries/users";

const EMAIL_IN_USE = "That e-mail is already in use. Sign in instead, or ask your company's admin to invite you.";

/** Creates an organisation and its first admin in one transaction, signs them in and opens the members page. */
export async function signUpAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const values = { ...typedValues(form), extraRoles: form.getAll("extraRoles").join(",") };
  const refused = controlCharacterState(values); // NUL and the like: a field-named error, as the API gives
  if (refused) return refused;
  const parsed = signUpSchema.safeParse(signUpInput(form));
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  const input = parsed.data;
  if (await findUserByEmail(input.email)) return { message: "Check the highlighted fields.", fieldErrors: { email: [EMAIL_IN_USE] }, values };
  let created;
  try {
    created = await createOrganisationWithAdmin({
      organisationName: input.organisationName,
      name: input.name,
      email: input.email,
      passwordHash: await hashPassword(input.password),
      roles: ["admin", ...input.extraRoles],
    });
  } catch (error) {
    // Another sign-up took the e-mail between the check and the insert; nothing was created.
    if (error instanceof EmailInUseError) return { message: "Check the highlighted fields.", fieldErrors: { email: [EMAIL_IN_USE] }, values };
    throw error;
  }
  await recordAudit({ organisationId: created.organisationId, actorUserId: created.userId, action: "sign-up", subject: input.email, ip: await requestIp() });
  await startSession(created.userId, created.organisationId);
  redirect("/admin/members?welcome=1");
}
