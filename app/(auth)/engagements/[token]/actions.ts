"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { controlCharacterState } from "@/app/_lib/action-errors";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { hashPassword } from "@/app/_lib/password";
import { requestIp } from "@/app/_lib/request-ip";
import { engineerSignUpInput, engineerSignUpSchema } from "@/app/_lib/schemas/engagement";
import { startSession } from "@/app/_lib/start-session";
import { hashToken } from "@/app/_lib/tokens";
import { recordAudit } from "@/db/queries/audit";
import { findEngagementByToken } from "@/db/queries/engagements";
import { saveLicence } from "@/db/queries/licences";
import { EmailInUseError, createOrganisationWithAdmin } from "@/db/queries/organisations";
import { findUserByEmail } from "@/db/queries/users";

/**
 * An engineer with no account signs up from the engagement link: their organisation (their firm, or
 * just themselves), the account with the admin and engineer roles, and their licence; then they are
 * signed in and land on their review queue, where the engagement waits for Accept or Decline. The link's token is the permission, and the
 * e-mail is the one it was sent to.
 */
export async function engineerSignUpAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const token = String(form.get("token") ?? "");
  const values = typedValues(form);
  const refused = controlCharacterState(values); // NUL and the like: a field-named error, as the API gives
  if (refused) return refused;
  const engagement = token ? await findEngagementByToken(hashToken(token)) : undefined;
  if (!engagement || engagement.status !== "invited") return { message: "This engagement link is no longer open; ask the contractor to engage you again.", values };
  if (await findUserByEmail(engagement.email)) return { message: "An account with this e-mail exists already: sign in to answer.", values };
  const parsed = engineerSignUpSchema.safeParse(engineerSignUpInput(form));
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  const input = parsed.data;
  let created;
  try {
    created = await createOrganisationWithAdmin({
      organisationName: input.kind === "firm" ? input.firmName : `${input.name} (independent engineer)`,
      name: input.name,
      email: engagement.email,
      passwordHash: await hashPassword(input.password),
      roles: ["admin", "engineer"],
    });
  } catch (error) {
    if (error instanceof EmailInUseError) return { message: "An account with this e-mail exists already: sign in to answer.", values };
    throw error;
  }
  await saveLicence(created.userId, { state: input.state, licenceNumber: input.licenceNumber, expiresOn: input.expiresOn });
  await recordAudit({ organisationId: created.organisationId, actorUserId: created.userId, action: "sign-up", subject: engagement.email, detail: { fromEngagement: engagement.id }, ip: await requestIp() });
  await startSession(created.userId, created.organisationId);
  redirect("/queue");
}
