"use server";

import { revalidatePath } from "next/cache";
import { randomUUID } from "node:crypto";
import { z } from "zod";
import { assertRole, requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { actionState } from "@/app/_lib/action-errors";
import { clearHold, clearHoldSchema, holdFor } from "@/app/_lib/review/holds";
import { reviewSchema } from "@/app/_lib/review/schemas";
import { decideRevision, ownedRevision, submitRevision } from "@/app/_lib/review/workflow";
import { putObject } from "@/app/_lib/storage";
import { typedValues, type ActionState } from "@/components/ui/action-state";

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

const LETTER_LIMIT_BYTES = 10 * 1024 * 1024;

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
  const parsed = reviewSchema.safeParse({ decision: text(form, "decision"), comments });
  if (!parsed.success) return actionState(parsed.error, values);
  const letter = form.get("letter");
  let letterKey: string | null = null;
  try {
    if (letter instanceof File && letter.size > 0) {
      if (parsed.data.decision !== "approve") return { message: "A signed letter goes with an approval; remove it to request changes.", fieldErrors: { letter: ["Attach the letter only when approving"] }, values };
      if (!/^(application\/pdf|image\/)/.test(letter.type) || letter.size > LETTER_LIMIT_BYTES) {
        return { message: "Check the highlighted fields.", fieldErrors: { letter: ["The signed letter must be a PDF or an image of at most 10 MB"] }, values };
      }
      letterKey = `orgs/${ctx.organisationId}/revisions/${revisionId}/letter-${randomUUID()}`;
      await putObject(letterKey, new Uint8Array(await letter.arrayBuffer()), letter.type);
    }
    const { status } = await decideRevision(user, revisionId, parsed.data, letterKey);
    revalidatePath(`/reviews/${revisionId}`);
    return { ok: true, message: status === "approved" ? "Approved: the revision is pinned and the designer has been e-mailed." : "Changes requested: the designer has been e-mailed." };
  } catch (error) {
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
  const parsed = clearHoldSchema.safeParse({ note: text(form, "note") });
  if (!parsed.success) return actionState(parsed.error, values);
  try {
    await clearHold(user, holdId, parsed.data.note);
  } catch (error) {
    return actionState(error, values);
  }
  revalidatePath("/reviews");
  return { ok: true, message: "Hold cleared." };
}
