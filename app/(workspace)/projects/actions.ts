"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { forAction } from "@/app/_lib/action-errors";
import { requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { createProject, updateProject } from "@/app/_lib/services/projects";
import { typedValues, type ActionState } from "@/components/ui/action-state";

function fieldsFrom(form: FormData) {
  const text = (k: string) => (typeof form.get(k) === "string" ? (form.get(k) as string) : undefined);
  return { name: text("name"), address: text("address"), state: text("state"), latitude: text("latitude"), longitude: text("longitude"), notes: text("notes"), criteriaCardId: text("criteriaCardId") };
}

/** New project from the form; designers and admins. */
export async function createProjectAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(() => requireUser());
  const created = await forAction(() => createProject(user, () => fieldsFrom(form)), typedValues(form));
  if (!created.ok) return created.state;
  revalidatePath("/projects");
  redirect(`/projects/${created.value.id}`);
}

/** Edit a project's details and criteria card. */
export async function updateProjectAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(() => requireUser());
  const updated = await forAction(() => updateProject(user, String(form.get("projectId") ?? ""), () => fieldsFrom(form)), typedValues(form));
  if (!updated.ok) return updated.state;
  revalidatePath(`/projects/${updated.value.id}`);
  redirect(`/projects/${updated.value.id}`);
}
