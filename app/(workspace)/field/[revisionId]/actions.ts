"use server";

import { revalidatePath } from "next/cache";
import { forAction } from "@/app/_lib/action-errors";
import { requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { recordAsBuilt } from "@/app/_lib/services/field";
import { tickChecklistItem } from "@/app/_lib/services/field-checklist";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { fromDisplay } from "@/components/format/quantity";
import { composedIn, rangeMessageIn } from "@/components/format/quantity-text";

/** The crew records one hole as dug; a hole that contradicts the spec puts the design on hold. */
export async function recordAsBuiltAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const revisionId = String(form.get("revisionId") ?? "");
  const user = await forPage(() => requireUser());
  // A crew working in metric types millimetres: converted to the inches the service stores; text
  // that is not a number goes through unchanged, so the service names the field as usual.
  const metric = form.get("units") === "metric";
  const inches = (v: FormDataEntryValue | null) => {
    if (!v || !metric) return v || undefined;
    const n = Number(String(v).trim().replace(/,/g, ""));
    return Number.isFinite(n) && String(v).trim() !== "" ? String(fromDisplay(n, "in", "metric")) : v;
  };
  const fields = () => ({
    postId: form.get("postId") ?? undefined,
    measuredDiameterIn: inches(form.get("measuredDiameterIn")),
    measuredDepthIn: inches(form.get("measuredDepthIn")),
    groundFound: form.get("groundFound") ?? undefined,
    notes: form.get("notes") ?? "",
  });
  const photos = form.getAll("photos").filter((p): p is File => p instanceof File);
  const recorded = await forAction(() => recordAsBuilt(user, revisionId, fields, photos), typedValues(form));
  if (!recorded.ok) {
    if (!metric || !recorded.state.fieldErrors) return recorded.state;
    const fieldErrors = Object.fromEntries(Object.entries(recorded.state.fieldErrors).map(([k, list]) => [k, list?.map((m) => rangeMessageIn(m, "in", "metric") ?? m)]));
    return { ...recorded.state, fieldErrors };
  }
  revalidatePath(`/field/${revisionId}`);
  const out = recorded.value;
  if (out.holdId) return { ok: true, message: `Recorded. The design is now ON HOLD: ${out.reasons.map((r) => composedIn(r, metric ? "metric" : "imperial")).join(" ")} Do not pour; the engineer and designer have been e-mailed.` };
  return { ok: true, message: `Hole ${form.get("postId")} recorded.` };
}

/** A tick of the crew's field checklist, saved at once (the box keeps its state across reloads and devices). */
export async function tickChecklistAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const revisionId = String(form.get("revisionId") ?? "");
  const outcome = await forAction(async () => {
    const user = await requireUser();
    await tickChecklistItem(user, revisionId, { itemKey: form.get("itemKey"), ticked: form.get("ticked") === "true" });
  }, undefined, `/field/${revisionId}`);
  if (!outcome.ok) return outcome.state;
  revalidatePath(`/field/${revisionId}`);
  return { ok: true, message: "Saved." };
}
