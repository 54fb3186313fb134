"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { requireUser } from "@/app/_lib/auth";
import { assertCanWrite, cardFor, projectFor } from "@/app/_lib/designs";
import { forPage } from "@/app/_lib/page-access";
import { projectSchema } from "@/app/_lib/schemas/project";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { createProject, updateProject } from "@/db/queries/projects";

function fieldsFrom(form: FormData) {
  const text = (k: string) => (typeof form.get(k) === "string" ? (form.get(k) as string) : undefined);
  return { name: text("name"), address: text("address"), state: text("state"), latitude: text("latitude"), longitude: text("longitude"), notes: text("notes"), criteriaCardId: text("criteriaCardId") };
}

/** New project from the form; designers and admins. */
export async function createProjectAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(async () => {
    const u = await requireUser();
    assertCanWrite(u);
    return u;
  });
  const parsed = projectSchema.safeParse(fieldsFrom(form));
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values: typedValues(form) };
  await forPage(() => cardFor(user, parsed.data.criteriaCardId));
  const id = await createProject(user.organisationId, user.userId, parsed.data);
  revalidatePath("/projects");
  redirect(`/projects/${id}`);
}

/** Edit a project's details and criteria card. */
export async function updateProjectAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const project = await forPage(async () => {
    const u = await requireUser();
    const p = await projectFor(u, String(form.get("projectId") ?? ""));
    assertCanWrite(u);
    return p;
  });
  const parsed = projectSchema.safeParse(fieldsFrom(form));
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values: typedValues(form) };
  await forPage(async () => cardFor(await requireUser(), parsed.data.criteriaCardId));
  await updateProject(project.id, parsed.data);
  revalidatePath(`/projects/${project.id}`);
  redirect(`/projects/${project.id}`);
}
