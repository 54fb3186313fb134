import { apiRoute, readJson } from "@/app/_lib/api";
import { calculate } from "@/app/_lib/services/designs";

export const dynamic = "force-dynamic";

/**
 * Live results for the editor: a design input in, the engine's result out (nothing is saved).
 * Bad input is a 422 naming each field, e.g. `site.windSpeedMph`.
 */
export const POST = apiRoute(async (request) => Response.json({ result: await calculate(() => readJson(request)) }));
