import { apiRoute } from "@/app/_lib/api";
import { AccessError, assertOwnedOrEngaged, requireUser } from "@/app/_lib/auth";
import { getObject } from "@/app/_lib/storage";
import { getAsBuiltEntry } from "@/db/queries/as-built";

export const dynamic = "force-dynamic";

/** One photo of an as-built hole, for members of the organisation and engineers engaged on its project. */
export const GET = apiRoute<{ params: Promise<{ entryId: string; index: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { entryId, index } = await params;
  const entry = await assertOwnedOrEngaged(user, await getAsBuiltEntry(entryId), (e) => ({ revisionId: e.revisionId }), "That as-built entry");
  const key = entry.photoKeys[Number(index)];
  if (!/^\d+$/.test(index) || !key) throw new AccessError(404, "That photo was not found.");
  const object = await getObject(key);
  return new Response(object.body as BodyInit, {
    headers: { "content-type": object.contentType.startsWith("image/") ? object.contentType : "application/octet-stream", "x-content-type-options": "nosniff", "cache-control": "private, max-age=300" },
  });
});
