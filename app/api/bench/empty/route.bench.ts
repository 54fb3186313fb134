/**
 * The empty route handler `npm run bench:web` compares `POST /api/calc` with: same server, same
 * framework path, no work. The `.bench.ts` extension is a page extension only in builds made with
 * PIERWISE_BENCH_BUILD=1 (next.config.mjs), so this route does not exist in any other build.
 */
export const dynamic = "force-dynamic";

export async function POST(): Promise<Response> {
  return Response.json({ ok: true });
}
