import "server-only";
import { createProject as insertProject, getProject, updateProject as writeProject, type Project } from "@/db/queries/projects";
import type { CurrentUser } from "../auth";
import { assertCanWrite, cardFor, projectFor } from "../designs";
import { projectPatchSchema, projectSchema } from "../schemas/project";
import type { Body } from "./input";

/** A new project for the user's organisation (designers and admins); its criteria card must be the organisation's. */
export async function createProject(user: CurrentUser, body: Body): Promise<Project> {
  assertCanWrite(user);
  const fields = projectSchema.parse(await body());
  await cardFor(user, fields.criteriaCardId);
  const id = await insertProject(user.organisationId, user.userId, fields);
  return (await getProject(id))!;
}

/**
 * Changes a project's details. `partial` (the API's PATCH) takes any subset of the fields; the
 * edit form sends them all.
 */
export async function updateProject(user: CurrentUser, projectId: string, body: Body, options: { partial?: boolean } = {}): Promise<Project> {
  const project = await projectFor(user, projectId);
  assertCanWrite(user);
  const patch = (options.partial ? projectPatchSchema : projectSchema).parse(await body());
  if (patch.criteriaCardId) await cardFor(user, patch.criteriaCardId);
  await writeProject(project.id, patch);
  return (await getProject(project.id))!;
}
