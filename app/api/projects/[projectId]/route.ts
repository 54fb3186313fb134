import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { assertCanWrite, cardFor, projectFor } from "@/app/_lib/designs";
import { projectPatchSchema } from "@/app/_lib/schemas/project";
import { getProject, updateProject } from "@/db/queries/projects";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ projectId: string }> };

/** One project with its criteria card. */
export const GET = apiRoute<Context>(async (_request, { params }) => {
  const user = await requireUser();
  const project = await projectFor(user, (await params).projectId, { engaged: true });
  return Response.json({ project, criteriaCard: await cardFor(user, project.criteriaCardId, project) });
});

/** Change any of name, address, state, latitude, longitude, notes, criteriaCardId. */
export const PATCH = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const project = await projectFor(user, (await params).projectId);
  assertCanWrite(user);
  const patch = projectPatchSchema.parse(await readJson(request));
  if (patch.criteriaCardId) await cardFor(user, patch.criteriaCardId);
  await updateProject(project.id, patch);
  return Response.json({ project: await getProject(project.id) });
});
