"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { forAction } from "@/app/_lib/action-errors";
import { requireUser } from "@/app/_lib/auth";
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
