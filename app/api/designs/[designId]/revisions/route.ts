import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { saveRevision } from "@/app/_lib/services/designs";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ designId: string }> };

/**
 * Save the next revision: `{ baseRevisionId, input, note? }`. 409 with `latestRevisionId` when
 * someone saved since `baseRevisionId`; 422 naming `input.site.windSpeedMph` etc. for bad input.
 */
export const POST = apiRoute<Context>(async (request, { params }) => {
  const revision = await saveRevision(await requireUser(), (await params).designId, () => readJson(request));
  return Response.json({ revision }, { status: 201 });
});
