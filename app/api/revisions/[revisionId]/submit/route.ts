import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { submitForReview } from "@/app/_lib/services/review";

export const dynamic = "force-dynamic";

/** A designer submits a revision for review: `{ engineerId }`. The engineer is e-mailed a link. */
export const POST = apiRoute<{ params: Promise<{ revisionId: string }> }>(async (request, { params }) => {
  const { revisionId: id } = await params;
  const { reviewId } = await submitForReview(await requireUser(), id, () => readJson(request));
  return Response.json({ revisionId: id, status: "in_review", reviewId });
});
