import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { revisionFor } from "@/app/_lib/designs";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ revisionId: string }> };

/** One revision, as saved: input, result, engine version, author, time, content hash, status. */
export const GET = apiRoute<Context>(async (_request, { params }) => {
  const user = await requireUser();
  return Response.json({ revision: await revisionFor(user, (await params).revisionId, { engaged: true }) });
});
