"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { forAction } from "@/app/_lib/action-errors";
import { requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { CRITERIA_KEYS } from "@/app/_lib/schemas/project";
import { saveCriteriaCard } from "@/app/_lib/services/criteria-cards";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { fromDisplay } from "@/components/format/quantity";
import { rangeMessageIn } from "@/components/format/quantity-text";
import { CRITERIA_NUMBER_KINDS } from "./_components/criteria-units";

const unitsOf = (form: FormData) => (form.get("units") === "metric" ? "metric" : "imperial");

/**
 * A criterion as the card stores it (mph, psf, in). In metric the typed number is converted back;
 * a value left exactly as the form showed it keeps the stored number (no drift by display rounding);
 * text that is not a number goes through unchanged, so the schema names the field as usual.
 */
function storedValue(form: FormData, k: string): string {
  const typed = String(form.get(`values.${k}`) ?? "");
  const kind = CRITERIA_NUMBER_KINDS[k as keyof typeof CRITERIA_NUMBER_KINDS];
  if (!kind || unitsOf(form) === "imperial") return typed;
  const shown = form.get(`shown.${k}`), stored = form.get(`stored.${k}`);
  if (shown !== null && stored !== null && typed.trim() === String(shown)) return String(stored);
  const n = Number(typed.trim().replace(/,/g, ""));
  return typed.trim() !== "" && Number.isFinite(n) ? String(fromDisplay(n, kind, "metric")) : typed;
}

function cardFrom(form: FormData) {
  const text = (k: string) => String(form.get(k) ?? "");
  return {
    jurisdiction: text("jurisdiction"),
    state: text("state"),
    values: Object.fromEntries(CRITERIA_KEYS.map((k) => [k, storedValue(form, k)])),
    sources: Object.fromEntries(CRITERIA_KEYS.map((k) => [k, { source: text(`sources.${k}.source`), checkedOn: text(`sources.${k}.checkedOn`) }])),
  };
}

/** A new criteria card for a jurisdiction, or changes to one (one per jurisdiction in the organisation). */
export async function saveCriteriaCardAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(() => requireUser());
  const saved = await forAction(() => saveCriteriaCard(user, String(form.get("cardId") ?? "") || null, () => cardFrom(form)), typedValues(form));
  if (!saved.ok) {
    // The typed values come back as typed (typedValues); a range message reads in the units typed.
    if (unitsOf(form) === "imperial" || !saved.state.fieldErrors) return saved.state;
    const fieldErrors = Object.fromEntries(Object.entries(saved.state.fieldErrors).map(([path, list]) => {
      const kind = CRITERIA_NUMBER_KINDS[path.replace(/^values\./, "") as keyof typeof CRITERIA_NUMBER_KINDS];
      return [path, kind ? list?.map((m) => rangeMessageIn(m, kind, "metric") ?? m) : list];
    }));
    return { ...saved.state, fieldErrors };
  }
  revalidatePath("/criteria");
  redirect("/criteria");
}
