import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { assertCanWrite, cardFor } from "@/app/_lib/designs";
import { listQueryFrom, projectSchema } from "@/app/_lib/schemas/project";
import { createProject, getProject, listProjects } from "@/db/queries/projects";

export const dynamic = "force-dynamic";

/** The organisation's projects and those the caller is engaged on: `?q=&sort=name|state|jurisdiction|designCount|updatedAt&dir=&page=&pageSize=`. */
export const GET = apiRoute(async (request) => {
  const user = await requireUser();
  const query = listQueryFrom(new URL(request.url).searchParams);
  // An outside engineer also sees the projects they are engaged on, each with the contractor's name.
  return Response.json(await listProjects(user.organisationId, query, user.userId));
});

/** A new project (designers and admins). */
export const POST = apiRoute(async (request) => {
  const user = await requireUser();
  assertCanWrite(user);
  const fields = projectSchema.parse(await readJson(request));
  await cardFor(user, fields.criteriaCardId);
  const id = await createProject(user.organisationId, user.userId, fields);
  return Response.json({ project: await getProject(id) }, { status: 201 });
});
