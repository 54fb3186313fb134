"use server";

import { revalidatePath } from "next/cache";
import { assertRole, requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { actionState } from "@/app/_lib/action-errors";
import { asBuiltSchema, recordAsBuilt } from "@/app/_lib/review/as-built";
import { ownedRevision } from "@/app/_lib/review/workflow";
import { typedValues, type ActionState } from "@/components/ui/action-state";

/** The crew records one hole as dug; a hole that contradicts the spec puts the design on hold. */
export async function recordAsBuiltAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const revisionId = String(form.get("revisionId") ?? "");
  const values = typedValues(form);
  const user = await forPage(async () => {
    const user = await requireUser();
    await ownedRevision(user, revisionId);
    assertRole(user, "installer", "engineer");
    return user;
  });
  const parsed = asBuiltSchema.safeParse({
    postId: form.get("postId") ?? undefined,
    measuredDiameterIn: form.get("measuredDiameterIn") || undefined,
    measuredDepthIn: form.get("measuredDepthIn") || undefined,
    groundFound: form.get("groundFound") ?? undefined,
    notes: form.get("notes") ?? "",
  });
  if (!parsed.success) return actionState(parsed.error, values);
  const photos = form.getAll("photos").filter((p): p is File => p instanceof File);
  try {
    const out = await recordAsBuilt(user, revisionId, parsed.data, photos);
    revalidatePath(`/field/${revisionId}`);
    if (out.holdId) return { ok: true, message: `Recorded. The design is now ON HOLD: ${out.reasons.join(" ")} Do not pour; the engineer and designer have been e-mailed.` };
    return { ok: true, message: `Hole ${parsed.data.postId} recorded.` };
  } catch (error) {
    return actionState(error, values);
  }
}
