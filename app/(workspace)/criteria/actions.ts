"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { requireUser } from "@/app/_lib/auth";
import { assertCanWrite, cardFor } from "@/app/_lib/designs";
import { forPage } from "@/app/_lib/page-access";
import { CRITERIA_KEYS, criteriaCardSchema } from "@/app/_lib/schemas/project";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { createCriteriaCard, jurisdictionTaken, updateCriteriaCard } from "@/db/queries/criteria-cards";

function cardFrom(form: FormData) {
  const text = (k: string) => String(form.get(k) ?? "");
  return {
    jurisdiction: text("jurisdiction"),
    state: text("state"),
    values: Object.fromEntries(CRITERIA_KEYS.map((k) => [k, text(`values.${k}`)])),
    sources: Object.fromEntries(CRITERIA_KEYS.map((k) => [k, { source: text(`sources.${k}.source`), checkedOn: text(`sources.${k}.checkedOn`) }])),
  };
}

function refused(form: FormData, issues: { path: PropertyKey[]; message: string }[]): ActionState {
  const fieldErrors: Record<string, string[]> = {};
  for (const i of issues) (fieldErrors[i.path.map(String).join(".")] ??= []).push(i.message);
  return { message: "Check the highlighted fields.", fieldErrors, values: typedValues(form) };
}

/** A new criteria card for a jurisdiction (one per jurisdiction in the organisation). */
export async function saveCriteriaCardAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const cardId = String(form.get("cardId") ?? "");
  const user = await forPage(async () => {
    const u = await requireUser();
    if (cardId) await cardFor(u, cardId);
    assertCanWrite(u);
    return u;
  });
  const parsed = criteriaCardSchema.safeParse(cardFrom(form));
  if (!parsed.success) return refused(form, parsed.error.issues);
  if (await jurisdictionTaken(user.organisationId, parsed.data.jurisdiction, cardId || undefined)) {
    return refused(form, [{ path: ["jurisdiction"], message: `Your organisation already has a card for ${parsed.data.jurisdiction}; edit that one instead` }]);
  }
  if (cardId) await updateCriteriaCard(cardId, parsed.data);
  else await createCriteriaCard({ ...parsed.data, organisationId: user.organisationId, createdBy: user.userId });
  revalidatePath("/criteria");
  redirect("/criteria");
}
