import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { renderReportPdf } from "@/app/_lib/review/report-pdf";
import { revisionStanding } from "@/app/_lib/review/standing";
import { ownedRevision } from "@/app/_lib/review/workflow";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

/** The calculation report of one revision, for any member of its organisation. */
export const GET = apiRoute<{ params: Promise<{ revisionId: string }> }>(async (_request, { params }) => {
  const user = await requireUser();
  const ctx = await ownedRevision(user, (await params).revisionId, { engaged: true });
  const pdf = await renderReportPdf(ctx, await revisionStanding(ctx));
  const name = `pierwise-${ctx.designName.replace(/[^a-z0-9]+/gi, "-").toLowerCase()}-rev${ctx.number}.pdf`;
  return new Response(new Uint8Array(pdf), {
    headers: { "content-type": "application/pdf", "content-disposition": `attachment; filename="${name}"`, "cache-control": "private, no-store" },
  });
});
