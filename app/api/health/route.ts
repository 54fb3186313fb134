import { databaseIsUp } from "@/db/client";

export const dynamic = "force-dynamic";

/** Liveness for people and scripts: the app answers, and says whether PostgreSQL does. */
export async function GET() {
  const up = await databaseIsUp();
  return Response.json({ ok: up, db: up ? "up" : "down" }, { status: up ? 200 : 503 });
}
