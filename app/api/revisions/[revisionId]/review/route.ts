import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { decideReview } from "@/app/_lib/services/review";

export const dynamic = "force-dynamic";

/**
 * An engineer decides a revision in review: `{ decision: "approve" | "request-changes", comments }`,
 * comments being a text or a list of `{ fieldPath?, body }`. The designer is e-mailed.
 */
export const POST = apiRoute<{ params: Promise<{ revisionId: string }> }>(async (request, { params }) => {
  const { revisionId: id } = await params;
  const { status } = await decideReview(await requireUser(), id, () => readJson(request));
  return Response.json({ revisionId: id, status });
});
