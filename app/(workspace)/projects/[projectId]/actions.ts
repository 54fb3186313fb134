"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { assertRole, requireUser } from "@/app/_lib/auth";
import { engageEngineer, revokeEngagement } from "@/app/_lib/engagements/service";
import { actionState } from "@/app/_lib/action-errors";
import { startingInput } from "@/app/_lib/design-defaults";
import { assertCanWrite, cardFor, computeResult, projectFor } from "@/app/_lib/designs";
import { forPage } from "@/app/_lib/page-access";
import { designCreateSchema } from "@/app/_lib/schemas/project";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { createDesignWithRevision } from "@/db/queries/designs";
import { designInputSchema, ENGINE_VERSION } from "@/engine";

/** A new design on the project, starting from the defaults with the project's criteria card applied. */
export async function createDesignAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const { user, project } = await forPage(async () => {
    const u = await requireUser();
    const p = await projectFor(u, String(form.get("projectId") ?? ""));
    assertCanWrite(u);
    return { user: u, project: p };
  });
  const parsed = designCreateSchema.safeParse({ name: form.get("name") ?? "" });
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values: typedValues(form) };
  const card = await forPage(() => cardFor(user, project.criteriaCardId));
  const input = designInputSchema.parse(startingInput(card?.values, project.name));
  const created = await createDesignWithRevision({
    projectId: project.id, organisationId: user.organisationId, name: parsed.data.name, authorId: user.userId,
    input, result: computeResult(input), engineVersion: ENGINE_VERSION,
    note: card ? `Started from the ${card.jurisdiction} criteria card.` : "Started from the default design.",
  });
  revalidatePath(`/projects/${project.id}`);
  redirect(`/projects/${project.id}/designs/${created.designId}`);
}

/** Engage an outside reviewing engineer on this project by e-mail (designers, admins). */
export async function engageEngineerAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const projectId = String(form.get("projectId") ?? "");
  const user = await forPage(async () => {
    const u = await requireUser();
    await projectFor(u, projectId);
    assertRole(u, "designer", "admin");
    return u;
  });
  try {
    const e = await engageEngineer(user, projectId, () => ({ email: form.get("email") ?? undefined, message: form.get("message") ?? undefined }));
    revalidatePath(`/projects/${projectId}`);
    return { ok: true, message: `Invitation e-mailed to ${e.email}.` };
  } catch (error) {
    return actionState(error, typedValues(form));
  }
}

/** Revoke an engagement: the engineer loses access to the project at once (designers, admins). */
export async function revokeEngagementAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const projectId = String(form.get("projectId") ?? "");
  const user = await forPage(async () => {
    const u = await requireUser();
    await projectFor(u, projectId);
    assertRole(u, "designer", "admin");
    return u;
  });
  try {
    await forPage(() => revokeEngagement(user, projectId, String(form.get("engagementId") ?? "")));
  } catch (error) {
    return actionState(error, typedValues(form));
  }
  revalidatePath(`/projects/${projectId}`);
  return { ok: true, message: "Engagement revoked." };
}
