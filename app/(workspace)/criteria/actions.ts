"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { forAction } from "@/app/_lib/action-errors";
import { requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { CRITERIA_KEYS } from "@/app/_lib/schemas/project";
import { saveCriteriaCard } from "@/app/_lib/services/criteria-cards";
import { typedValues, type ActionState } from "@/components/ui/action-state";

function cardFrom(form: FormData) {
  const text = (k: string) => String(form.get(k) ?? "");
  return {
    jurisdiction: text("jurisdiction"),
    state: text("state"),
    values: Object.fromEntries(CRITERIA_KEYS.map((k) => [k, text(`values.${k}`)])),
    sources: Object.fromEntries(CRITERIA_KEYS.map((k) => [k, { source: text(`sources.${k}.source`), checkedOn: text(`sources.${k}.checkedOn`) }])),
  };
}

/** A new criteria card for a jurisdiction, or changes to one (one per jurisdiction in the organisation). */
export async function saveCriteriaCardAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(() => requireUser());
  const saved = await forAction(() => saveCriteriaCard(user, String(form.get("cardId") ?? "") || null, () => cardFrom(form)), typedValues(form));
  if (!saved.ok) return saved.state;
  revalidatePath("/criteria");
  redirect("/criteria");
}
