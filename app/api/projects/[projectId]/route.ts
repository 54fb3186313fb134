import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { cardFor, projectFor } from "@/app/_lib/designs";
import { updateProject } from "@/app/_lib/services/projects";

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
  const project = await updateProject(await requireUser(), (await params).projectId, () => readJson(request), { partial: true });
  return Response.json({ project });
});
