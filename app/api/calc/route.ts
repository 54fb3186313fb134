import { apiRoute, readJson } from "@/app/_lib/api";
import { pickSections, sectionsFrom } from "@/app/_lib/calc-sections";
import { computeResult } from "@/app/_lib/designs";
import { requireSignedInForCalculation } from "@/app/_lib/signed-in";
import { designInputSchema } from "@/engine";

export const dynamic = "force-dynamic";

/**
 * A design input in, the engine's result out (nothing is saved): for API callers; the editor
 * computes the same result in the browser. `?sections=footing,concrete` sends only those parts
 * (with the engine version and cautions). Bad input is a 422 naming each field, e.g. `site.windSpeedMph`.
 */
export const POST = apiRoute(async (request) => {
  // A pure calculation reads no organisation data: the cheaper signed-in check (app/_lib/signed-in.ts).
  await requireSignedInForCalculation();
  const sections = sectionsFrom(new URL(request.url));
  const input = designInputSchema.parse(await readJson(request));
  return Response.json({ result: pickSections(computeResult(input), sections) });
});
