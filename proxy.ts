import { NextResponse, type NextRequest } from "next/server";
import { securityHeaders } from "@/app/_lib/security-headers";
import { servedOverHttps } from "@/app/_lib/forwarded";

/**
 * Runs before every request (Next.js 16's name for middleware): makes a fresh nonce, hands the
 * page's content-security policy to the renderer through the request headers (Next.js reads the
 * nonce from there and puts it on its scripts), and sets the security headers on the answer.
 */
export function proxy(request: NextRequest) {
  // A path that is not valid percent-encoding cannot name anything: 400 here, not a 500 deeper in.
  try {
    decodeURIComponent(request.nextUrl.pathname);
  } catch {
    return Response.json({ errors: [{ path: "", message: "The address is not valid: it has a broken %-escape." }] }, { status: 400, headers: { "x-content-type-options": "nosniff" } });
  }
  const nonce = Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString("base64");
  const headers = securityHeaders({
    nonce,
    pathname: request.nextUrl.pathname,
    // The same rule as the session cookie's Secure flag: APP_URL is https, or a trusted proxy says so.
    https: servedOverHttps(request.headers),
    development: process.env.NODE_ENV === "development",
  });
  const forward = new Headers(request.headers);
  forward.set("x-nonce", nonce);
  if (headers["content-security-policy"]) forward.set("content-security-policy", headers["content-security-policy"]);
  const response = NextResponse.next({ request: { headers: forward } });
  for (const [name, value] of Object.entries(headers)) response.headers.set(name, value);
  return response;
}

export const config = {
  // Built assets are immutable files with their own types; everything else gets the headers.
  matcher: ["/((?!_next/static|_next/image).*)"],
};
