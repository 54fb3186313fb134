import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { renderReportPdf } from "@/app/_lib/review/report-pdf";
import { revisionStanding } from "@/app/_lib/review/standing";
import { ownedRevision } from "@/app/_lib/review/workflow";
import { readerUnits } from "@/app/_lib/unit-preference";
import { parseUnitSystem } from "@/components/format/unit-preference";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

/**
 * The calculation report of one revision, for any member of its organisation, in the reader's unit
 * system (`?units=metric|imperial`, else the units preference cookie).
 */
export const GET = apiRoute<{ params: Promise<{ revisionId: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const ctx = await ownedRevision(user, (await params).revisionId, { engaged: true });
  const asked = new URL(request.url).searchParams.get("units");
  const units = asked ? parseUnitSystem(asked) : await readerUnits();
  const pdf = await renderReportPdf(ctx, await revisionStanding(ctx), new Date(), units);
  const name = `pierwise-${ctx.designName.replace(/[^a-z0-9]+/gi, "-").toLowerCase()}-rev${ctx.number}.pdf`;
  return new Response(new Uint8Array(pdf), {
    headers: { "content-type": "application/pdf", "content-disposition": `attachment; filename="${name}"`, "cache-control": "private, no-store" },
  });
});
