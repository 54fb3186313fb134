import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { assertCanWrite, designFor, saveRevision } from "@/app/_lib/designs";
import { revisionCreateSchema } from "@/app/_lib/schemas/project";
import { getRevision } from "@/db/queries/revisions";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ designId: string }> };

/**
 * Save the next revision: `{ baseRevisionId, input, note? }`. 409 with `latestRevisionId` when
 * someone saved since `baseRevisionId`; 422 naming `input.site.windSpeedMph` etc. for bad input.
 */
export const POST = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const design = await designFor(user, (await params).designId);
  assertCanWrite(user);
  const body = revisionCreateSchema.parse(await readJson(request));
  const saved = await saveRevision(user, design, body);
  return Response.json({ revision: await getRevision(saved.id) }, { status: 201 });
});
