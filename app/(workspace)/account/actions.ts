"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { forAction } from "@/app/_lib/action-errors";
import { requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { getSession } from "@/app/_lib/session";
import { licenceInput } from "@/app/_lib/schemas/licence";
import { removeLicence, saveLicence, signOutEverywhere } from "@/app/_lib/services/account";

const PAGE = "/account";
const signedIn = () => forPage(() => requireUser(), PAGE);

/** Adds a licence for a state, or updates the number and expiry of the one already held there. */
export async function saveLicenceAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await signedIn();
  const saved = await forAction(() => saveLicence(user, () => licenceInput(form)), typedValues(form), PAGE);
  if (!saved.ok) return saved.state;
  revalidatePath(PAGE);
  return { ok: true, message: `Licence for ${saved.value.state} saved, valid through ${saved.value.expiresOn}.` };
}

export async function removeLicenceAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await signedIn();
  const removed = await forAction(() => removeLicence(user, () => ({ state: form.get("state") ?? undefined })), undefined, PAGE);
  if (!removed.ok) return removed.state;
  revalidatePath(PAGE);
  return { ok: true, message: `Licence for ${removed.value.state} removed.` };
}

/** Ends every session of this person, on every device, this one included, and goes to sign-in. */
export async function signOutEverywhereAction(): Promise<void> {
  const user = await signedIn();
  await signOutEverywhere(user);
  (await getSession()).destroy();
  redirect("/login");
}
