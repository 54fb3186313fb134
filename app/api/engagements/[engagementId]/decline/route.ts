import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { answerEngagement } from "@/app/_lib/services/engagements";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ engagementId: string }> };

/** Only the invited engineer may decline (also after accepting: they step back); anyone else gets 404. */
export const POST = apiRoute<Context>(async (_request, { params }) => {
  const user = await requireUser();
  return Response.json(await answerEngagement(user, (await params).engagementId, "decline"));
});
