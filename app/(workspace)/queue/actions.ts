"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { requireUser } from "@/app/_lib/auth";
import { answerEngagement } from "@/app/_lib/services/engagements";
import { forPage } from "@/app/_lib/page-access";
import { actionState } from "@/app/_lib/action-errors";
import { typedValues, type ActionState } from "@/components/ui/action-state";

/** The invited engineer accepts or declines an engagement (from the e-mailed link or the queue). */
export async function answerEngagementAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const returnTo = String(form.get("returnTo") ?? "");
  const user = await forPage(() => requireUser(), returnTo.startsWith("/") && !returnTo.startsWith("//") ? returnTo : "/queue");
  const answer = form.get("answer") === "accept" ? "accept" : "decline";
  try {
    await forPage(() => answerEngagement(user, String(form.get("engagementId") ?? ""), answer));
  } catch (error) {
    const state = actionState(error, typedValues(form));
    if (state.fieldErrors?.licence) state.message = state.fieldErrors.licence.join(" ");
    return state;
  }
  revalidatePath("/queue");
  if (answer === "accept") redirect("/queue?accepted=1");
  return { ok: true, message: "Declined: the contractor has been told." };
}
