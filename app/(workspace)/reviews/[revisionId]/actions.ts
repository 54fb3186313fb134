"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { assertRole, requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { actionState } from "@/app/_lib/action-errors";
import { clearHold, clearHoldSchema, holdFor } from "@/app/_lib/review/holds";
import { reviewSchema } from "@/app/_lib/review/schemas";
import { decideRevision, ownedRevision, submitRevision } from "@/app/_lib/review/workflow";
import { deleteObject, putObject } from "@/app/_lib/storage";
import { acceptUpload, revisionObjectKey } from "@/app/_lib/uploads";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { letterIsRecorded } from "@/db/queries/reviews";

const text = (form: FormData, name: string) => String(form.get(name) ?? "");

/** The designer sends this revision to the engineer chosen in the form. */
export async function submitForReviewAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const revisionId = text(form, "revisionId");
  const values = typedValues(form);
  const user = await forPage(async () => {
    const user = await requireUser();
    await ownedRevision(user, revisionId);
    assertRole(user, "designer");
    return user;
  });
  try {
    await submitRevision(user, revisionId, z.string().uuid({ error: "Choose the reviewing engineer" }).parse(text(form, "engineerId")));
  } catch (error) {
    const state = actionState(error, values);
    if (state.fieldErrors?.["form"]) state.fieldErrors.engineerId = state.fieldErrors.form;
    return state;
  }
  revalidatePath(`/reviews/${revisionId}`);
  return { ok: true, message: "Submitted for review: the engineer has been e-mailed." };
}

/**
 * The engineer's decision. Comments come as comment.N.body / comment.N.fieldPath pairs; a signed
 * letter (PDF or image) may be attached to an approval.
 */
export async function decideReviewAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const revisionId = text(form, "revisionId");
  const values = typedValues(form);
  const { user, ctx } = await forPage(async () => {
    const user = await requireUser();
    const ctx = await ownedRevision(user, revisionId, { engaged: true });
    assertRole(user, "engineer");
    return { user, ctx };
  });
  const comments: { fieldPath: string | null; body: string }[] = [];
  for (let i = 0; i < 50; i++) {
    const body = text(form, `comment.${i}.body`).trim();
    if (body) comments.push({ body, fieldPath: text(form, `comment.${i}.fieldPath`) || null });
  }
  // One reason per failing check, in the order the form lists them (override.N.checkId / .reason).
  const overrides: { checkId: string; reason: string }[] = [];
  for (let i = 0; i < 20 && form.has(`override.${i}.checkId`); i++) overrides.push({ checkId: text(form, `override.${i}.checkId`), reason: text(form, `override.${i}.reason`) });
  const approving = text(form, "decision") === "approve";
  const parsed = reviewSchema.safeParse({ decision: text(form, "decision"), comments, password: text(form, "password"), overrides: approving ? overrides : [] });
  if (!parsed.success) return actionState(parsed.error, values);
  const letter = form.get("letter");
  let letterKey: string | null = null;
  let decided = false;
  try {
    if (letter instanceof File && letter.size > 0) {
      if (parsed.data.decision !== "approve") return { message: "A signed letter goes with an approval; remove it to request changes.", fieldErrors: { letter: ["Attach the letter only when approving"] }, values };
      // The one upload policy: a PDF or photo by content, at most 10 MB, never SVG or HTML.
      const accepted = await acceptUpload(letter, "signedLetter", "letter");
      letterKey = revisionObjectKey(ctx.organisationId, revisionId, "letter");
      await putObject(letterKey, accepted.bytes, accepted.type.contentType);
    }
    const { status } = await decideRevision(user, revisionId, parsed.data, letterKey);
    decided = true;
    revalidatePath(`/reviews/${revisionId}`);
    return { ok: true, message: status === "approved" ? "Approved: the revision is pinned and the designer has been e-mailed." : "Changes requested: the designer has been e-mailed." };
  } catch (error) {
    // A letter stored for a decision that was never recorded is removed again; the letter of a
    // recorded decision (a later step failed) is kept.
    if (letterKey && !decided && !(await letterIsRecorded(letterKey))) await deleteObject(letterKey).catch(() => undefined);
    return actionState(error, values);
  }
}

/** An engineer clears a hold, saying how it was resolved. */
export async function clearHoldAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const holdId = text(form, "holdId");
  const values = typedValues(form);
  const user = await forPage(async () => {
    const user = await requireUser();
    await holdFor(user, holdId);
    assertRole(user, "engineer");
    return user;
  });
  const parsed = clearHoldSchema.safeParse({ note: text(form, "note"), confirm: form.get("confirm") === "yes" });
  if (!parsed.success) return actionState(parsed.error, values);
  let told: string[];
  try {
    ({ told } = await clearHold(user, holdId, parsed.data.note));
  } catch (error) {
    return actionState(error, values);
  }
  revalidatePath("/reviews");
  return { ok: true, message: `Hold cleared. ${told.length ? `E-mailed your note to ${told.join(", ")}.` : "Nobody else was on this revision to e-mail."} The note shows on the field spec and in the as-built log.` };
}
