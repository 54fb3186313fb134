import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { computeResult } from "@/app/_lib/designs";
import { designInputSchema } from "@/engine";

export const dynamic = "force-dynamic";

/**
 * Live results for the editor: a design input in, the engine's result out (nothing is saved).
 * Bad input is a 422 naming each field, e.g. `site.windSpeedMph`.
 */
export const POST = apiRoute(async (request) => {
  await requireUser();
  const input = designInputSchema.parse(await readJson(request));
  return Response.json({ result: computeResult(input) });
});
