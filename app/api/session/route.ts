import { apiRoute, errorResponse, readJson } from "@/app/_lib/api";
import { currentUser } from "@/app/_lib/auth";
import { signInSchema } from "@/app/_lib/schemas/account";
import { signIn, signOut } from "@/app/_lib/sign-in";

export const dynamic = "force-dynamic";

/** The current user, organisation and roles; 401 when signed out. */
export const GET = apiRoute(async () => {
  const user = await currentUser();
  if (!user) return errorResponse(401, [{ path: "", message: "Not signed in." }]);
  return Response.json({
    user: { id: user.userId, email: user.email, name: user.name },
    organisation: { id: user.organisationId, name: user.organisationName },
    roles: user.roles,
  });
});

/** Sign in with `{ email, password }`; sets the session cookie. */
export const POST = apiRoute(async (request) => {
  const input = signInSchema.parse(await readJson(request));
  const outcome = await signIn(input);
  if (!outcome.ok) return errorResponse(outcome.status, [{ path: "", message: outcome.message }]);
  return Response.json({ ok: true });
});

export const DELETE = apiRoute(async () => {
  await signOut();
  return Response.json({ ok: true });
});
