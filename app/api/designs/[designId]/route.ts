import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { designFor } from "@/app/_lib/designs";
import { listQueryFrom } from "@/app/_lib/schemas/project";
import { latestRevision, listRevisions } from "@/db/queries/revisions";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ designId: string }> };

/** A design, its latest revision (input and result) and one page of its revisions (`?q=&sort=&dir=&page=&pageSize=`). */
export const GET = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const design = await designFor(user, (await params).designId, { engaged: true });
  const [latest, revisions] = await Promise.all([latestRevision(design.id), listRevisions(design.id, listQueryFrom(new URL(request.url).searchParams))]);
  return Response.json({ design, latestRevision: latest ?? null, revisions });
});
