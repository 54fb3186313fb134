"use server";

import { revalidatePath } from "next/cache";
import { forAction } from "@/app/_lib/action-errors";
import { requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { clearHold } from "@/app/_lib/services/field";
import { decideReview, submitForReview } from "@/app/_lib/services/review";
import { typedValues, type ActionState } from "@/components/ui/action-state";

const text = (form: FormData, name: string) => String(form.get(name) ?? "");

/** The designer sends this revision to the engineer chosen in the form. */
export async function submitForReviewAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const revisionId = text(form, "revisionId");
  const user = await forPage(() => requireUser());
  const submitted = await forAction(() => submitForReview(user, revisionId, () => ({ engineerId: text(form, "engineerId") })), typedValues(form));
  if (!submitted.ok) return submitted.state;
  revalidatePath(`/reviews/${revisionId}`);
  return { ok: true, message: "Submitted for review: the engineer has been e-mailed." };
}

/** Comments come as comment.N.body / comment.N.fieldPath pairs; blank ones are skipped. */
function decisionFrom(form: FormData) {
  const comments: { fieldPath: string | null; body: string }[] = [];
  for (let i = 0; i < 50; i++) {
    const body = text(form, `comment.${i}.body`).trim();
    if (body) comments.push({ body, fieldPath: text(form, `comment.${i}.fieldPath`) || null });
  }
  // One reason per failing check, in the order the form lists them (override.N.checkId / .reason).
  const overrides: { checkId: string; reason: string }[] = [];
  for (let i = 0; i < 20 && form.has(`override.${i}.checkId`); i++) overrides.push({ checkId: text(form, `override.${i}.checkId`), reason: text(form, `override.${i}.reason`) });
  const approving = text(form, "decision") === "approve";
  return { decision: text(form, "decision"), comments, password: text(form, "password"), overrides: approving ? overrides : [] };
}

/** The engineer's decision; a signed letter (PDF or image) may be attached to an approval. */
export async function decideReviewAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const revisionId = text(form, "revisionId");
  const user = await forPage(() => requireUser());
  const letter = form.get("letter");
  const decided = await forAction(() => decideReview(user, revisionId, () => decisionFrom(form), letter instanceof File ? letter : null), typedValues(form));
  if (!decided.ok) return decided.state;
  revalidatePath(`/reviews/${revisionId}`);
  return { ok: true, message: decided.value.status === "approved" ? "Approved: the revision is pinned and the designer has been e-mailed." : "Changes requested: the designer has been e-mailed." };
}

/** An engineer clears a hold, saying how it was resolved. */
export async function clearHoldAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(() => requireUser());
  const cleared = await forAction(() => clearHold(user, text(form, "holdId"), () => ({ note: text(form, "note"), confirm: form.get("confirm") === "yes" })), typedValues(form));
  if (!cleared.ok) return cleared.state;
  const { told } = cleared.value;
  revalidatePath("/reviews");
  return { ok: true, message: `Hold cleared. ${told.length ? `E-mailed your note to ${told.join(", ")}.` : "Nobody else was on this revision to e-mail."} The note shows on the field spec and in the as-built log.` };
}
