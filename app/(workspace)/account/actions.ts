"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { controlCharacterState } from "@/app/_lib/action-errors";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { redirect } from "next/navigation";
import { requireRole, requireUser } from "@/app/_lib/auth";
import { getSession } from "@/app/_lib/session";
import { endSessionsOf } from "@/db/queries/sessions";
import { forPage } from "@/app/_lib/page-access";
import { requestIp } from "@/app/_lib/request-ip";
import { licenceInput, licenceSchema, LICENSING_STATES } from "@/app/_lib/schemas/licence";
import { recordAudit } from "@/db/queries/audit";
import { removeLicence, saveLicence } from "@/db/queries/licences";

/** Adds a licence for a state, or updates the number and expiry of the one already held there. */
export async function saveLicenceAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(() => requireRole("engineer"), "/account");
  const values = typedValues(form);
  const refused = controlCharacterState(values); // NUL and the like: a field-named error, as the API gives
  if (refused) return refused;
  const parsed = licenceSchema.safeParse(licenceInput(form));
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  await saveLicence(user.userId, parsed.data);
  await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "licence-saved", subject: user.email, detail: parsed.data, ip: await requestIp() });
  revalidatePath("/account");
  return { ok: true, message: `Licence for ${parsed.data.state} saved, valid through ${parsed.data.expiresOn}.` };
}

export async function removeLicenceAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(() => requireRole("engineer"), "/account");
  const state = String(form.get("state") ?? "").toUpperCase();
  if (!(LICENSING_STATES as readonly string[]).includes(state)) return { message: "Licensing state must be a US state, DC or territory code such as CO." };
  const removed = await removeLicence(user.userId, state);
  if (!removed) return { message: `You hold no recorded licence in ${state}.` };
  await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "licence-removed", subject: user.email, detail: { state }, ip: await requestIp() });
  revalidatePath("/account");
  return { ok: true, message: `Licence for ${state} removed.` };
}

/** Ends every session of this person, on every device, this one included, and goes to sign-in. */
export async function signOutEverywhereAction(): Promise<void> {
  const user = await forPage(() => requireUser(), "/account");
  const ended = await endSessionsOf(user.userId);
  await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "signed-out-everywhere", subject: user.email, detail: { sessions: ended }, ip: await requestIp() });
  (await getSession()).destroy();
  redirect("/login");
}
