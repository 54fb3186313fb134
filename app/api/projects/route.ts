import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { listQueryFrom } from "@/app/_lib/schemas/project";
import { createProject } from "@/app/_lib/services/projects";
import { listProjects } from "@/db/queries/projects";

export const dynamic = "force-dynamic";

/**
 * The organisation's projects and those the caller is engaged on: `?q=&sort=name|state|jurisdiction|designCount|updatedAt&dir=&page=&pageSize=`.
 * `total` is exact without `q`; with `q` it is counted up to 1,000 (or a page past the asked one), and `capped: true` says there are more.
 */
export const GET = apiRoute(async (request) => {
  const user = await requireUser();
  const query = listQueryFrom(new URL(request.url).searchParams);
  // An outside engineer also sees the projects they are engaged on, each with the contractor's name.
  return Response.json(await listProjects(user.organisationId, query, user.userId));
});

/** A new project (designers and admins). */
export const POST = apiRoute(async (request) => {
  const project = await createProject(await requireUser(), () => readJson(request));
  return Response.json({ project }, { status: 201 });
});
