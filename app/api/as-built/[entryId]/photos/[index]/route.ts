import { apiRoute } from "@/app/_lib/api";
import { AccessError, assertOwnedOrEngaged, requireUser } from "@/app/_lib/auth";
import { getObject } from "@/app/_lib/storage";
import { fileResponse } from "@/app/_lib/uploads";
import { getAsBuiltEntry } from "@/db/queries/as-built";

export const dynamic = "force-dynamic";

/** One photo of an as-built hole, for members of the organisation and engineers engaged on its project (through the one download helper). */
export const GET = apiRoute<{ params: Promise<{ entryId: string; index: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const { entryId, index } = await params;
  const entry = await assertOwnedOrEngaged(user, await getAsBuiltEntry(entryId), (e) => ({ revisionId: e.revisionId }), "That as-built entry");
  const key = /^\d{1,3}$/.test(index) ? entry.photoKeys[Number(index)] : undefined;
  if (!key) throw new AccessError(404, "That photo was not found.");
  const object = await getObject(key);
  return fileResponse(object.body, { fileName: `hole-${entry.postId}-photo-${Number(index) + 1}`, inlinePhotos: true });
});
