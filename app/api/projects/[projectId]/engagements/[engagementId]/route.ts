import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { revokeEngagement } from "@/app/_lib/services/engagements";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ projectId: string; engagementId: string }> };

/** Revoke an engagement at once (designers, admins); the engineer loses access to the project. */
export const DELETE = apiRoute<Context>(async (_request, { params }) => {
  const user = await requireUser();
  const { projectId, engagementId } = await params;
  return Response.json(await revokeEngagement(user, projectId, engagementId));
});
