import { apiRoute } from "@/app/_lib/api";
import { AccessError, requireUser } from "@/app/_lib/auth";
import { revisionStanding } from "@/app/_lib/review/standing";
import { ownedRevision } from "@/app/_lib/review/workflow";
import { getObject } from "@/app/_lib/storage";
import { fileResponse } from "@/app/_lib/uploads";

export const dynamic = "force-dynamic";

/** The engineer's signed approval letter, for members of the organisation; always a download. */
export const GET = apiRoute<{ params: Promise<{ revisionId: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const ctx = await ownedRevision(user, (await params).revisionId, { engaged: true });
  const key = (await revisionStanding(ctx)).approval?.letterFileKey;
  if (!key) throw new AccessError(404, "No signed letter is on file for this revision.");
  const object = await getObject(key);
  return fileResponse(object.body, { fileName: `approval-letter-rev${ctx.number}`, cache: "private, no-store" });
});
