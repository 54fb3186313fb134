import { headers } from "next/headers";

/** The caller's address as the proxy in front reports it, else "local" (the app listens on loopback). */
export async function requestIp(): Promise<string> {
  const h = await headers();
  return h.get("x-forwarded-for")?.split(",")[0]?.trim() || h.get("x-real-ip") || "local";
}
