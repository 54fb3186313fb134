import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { designFor } from "@/app/_lib/designs";
import { listQueryFrom } from "@/app/_lib/schemas/project";
import { latestRevision, listRevisions } from "@/db/queries/revisions";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ designId: string }> };

/**
 * A design, its latest revision (input and result) and one page of its revisions (`?q=&sort=&dir=&page=&pageSize=`).
 * `revisions.total` is exact without `q` (the design's kept count); with `q` it is counted up to 1,000 (or a page past
 * the asked one), and `revisions.capped: true` says there are more.
 */
export const GET = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const design = await designFor(user, (await params).designId, { engaged: true });
  const [latest, revisions] = await Promise.all([latestRevision(design.id), listRevisions(design.id, listQueryFrom(new URL(request.url).searchParams))]);
  return Response.json({ design, latestRevision: latest ?? null, revisions });
});
