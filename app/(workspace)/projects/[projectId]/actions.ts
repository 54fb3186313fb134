"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { forAction } from "@/app/_lib/action-errors";
import { requireUser } from "@/app/_lib/auth";
import { engageEngineer, revokeEngagement } from "@/app/_lib/services/engagements";
import { forPage } from "@/app/_lib/page-access";
import { createDesign } from "@/app/_lib/services/designs";
import { typedValues, type ActionState } from "@/components/ui/action-state";

/** A new design on the project, starting from the defaults with the project's criteria card applied. */
export async function createDesignAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(() => requireUser());
  const created = await forAction(() => createDesign(user, String(form.get("projectId") ?? ""), () => ({ name: form.get("name") ?? "" })), typedValues(form));
  if (!created.ok) return created.state;
  const { projectId, id } = created.value.design;
  revalidatePath(`/projects/${projectId}`);
  redirect(`/projects/${projectId}/designs/${id}`);
}

/** Engage an outside reviewing engineer on this project by e-mail (designers, admins). */
export async function engageEngineerAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const projectId = String(form.get("projectId") ?? "");
  const user = await forPage(() => requireUser());
  const engaged = await forAction(() => engageEngineer(user, projectId, () => ({ email: form.get("email") ?? undefined, message: form.get("message") ?? undefined })), typedValues(form));
  if (!engaged.ok) return engaged.state;
  revalidatePath(`/projects/${projectId}`);
  return { ok: true, message: `Invitation e-mailed to ${engaged.value.email}.` };
}

/** Revoke an engagement: the engineer loses access to the project at once (designers, admins). */
export async function revokeEngagementAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const projectId = String(form.get("projectId") ?? "");
  const user = await forPage(() => requireUser());
  const revoked = await forAction(() => revokeEngagement(user, projectId, String(form.get("engagementId") ?? "")), typedValues(form));
  if (!revoked.ok) return revoked.state;
  revalidatePath(`/projects/${projectId}`);
  return { ok: true, message: "Engagement revoked." };
}
