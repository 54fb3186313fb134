import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { projectFor } from "@/app/_lib/designs";
import { listQueryFrom } from "@/app/_lib/schemas/project";
import { createDesign } from "@/app/_lib/services/designs";
import { listDesigns } from "@/db/queries/designs";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ projectId: string }> };

/** The project's designs with their latest revision's number, status and footing. */
export const GET = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const project = await projectFor(user, (await params).projectId, { engaged: true });
  return Response.json(await listDesigns(project.id, listQueryFrom(new URL(request.url).searchParams)));
});

/**
 * A new design with its revision 1: from `input` when given, else from the defaults with the
 * project's criteria card applied.
 */
export const POST = apiRoute<Context>(async (request, { params }) => {
  const created = await createDesign(await requireUser(), (await params).projectId, () => readJson(request));
  return Response.json(created, { status: 201 });
});
