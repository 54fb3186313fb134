"use server";

import { redirect } from "next/navigation";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { forAction } from "@/app/_lib/action-errors";
import { engineerSignUpInput } from "@/app/_lib/schemas/engagement";
import { signUpFromEngagement } from "@/app/_lib/services/engagements";

/**
 * An engineer with no account signs up from the engagement link (app/_lib/services/engagements.ts),
 * then lands on their review queue, where the engagement waits for Accept or Decline.
 */
export async function engineerSignUpAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const done = await forAction(() => signUpFromEngagement(String(form.get("token") ?? ""), () => engineerSignUpInput(form)), typedValues(form));
  if (!done.ok) return done.state;
  redirect("/queue");
}
