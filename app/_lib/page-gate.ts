import "server-only";
import { headers } from "next/headers";
import { AccessError, requireRole, requireUser, type CurrentUser } from "./auth";
import { assertCanWrite, cardFor, designFor, projectFor } from "./designs";
import { accessInterrupt } from "./page-access";
import { ownedRevision } from "./review/workflow";

/**
 * The first access check of a workspace page, run by the workspace layout before anything is sent.
 *
 * Every page checks access itself (forPage), but the workspace's loading.tsx starts streaming the
 * answer, status 200, as soon as a page waits for data; a 404 or 403 found by the page after that is
 * shown with status 200 (Next.js docs, loading.js "Status codes"). The layout sits outside that
 * boundary, so running the same check there first gives the answer its real status (and a signed-out
 * visitor a real redirect). This only decides the status early; the page's own check stays the
 * authority, and a page not listed here is unchanged. Each row repeats the page's own first step.
 */
const GATES: { path: RegExp; check: (user: CurrentUser, ids: string[]) => Promise<unknown> }[] = [
  { path: /^\/projects\/new$/, check: async (u) => assertCanWrite(u) },
  { path: /^\/projects\/([^/]+)\/edit$/, check: async (u, [p]) => { await projectFor(u, p); assertCanWrite(u); } },
  { path: /^\/projects\/([^/]+)\/designs\/([^/]+)(?:\/diff)?$/, check: async (u, [p, d]) => {
    const project = await projectFor(u, p, { engaged: true });
    const design = await designFor(u, d, { engaged: true });
    if (design.projectId !== project.id) throw new AccessError(404, "That design was not found.");
  } },
  { path: /^\/projects\/([^/]+)$/, check: (u, [p]) => projectFor(u, p, { engaged: true }) },
  { path: /^\/reviews\/([^/]+)$/, check: (u, [r]) => ownedRevision(u, r, { engaged: true }) },
  { path: /^\/field\/([^/]+)$/, check: (u, [r]) => ownedRevision(u, r) },
  { path: /^\/criteria\/([^/]+)$/, check: async (u, [c]) => { await cardFor(u, c); assertCanWrite(u); } },
  { path: /^\/admin(?:\/.*)?$/, check: () => requireRole("admin") },
];

/** Header the proxy (proxy.ts) sets to the requested path, for this gate only. */
export const PAGE_PATH_HEADER = "x-pierwise-page-path";

export async function gateWorkspacePage(): Promise<void> {
  const pathname = (await headers()).get(PAGE_PATH_HEADER);
  if (!pathname) return;
  const gate = GATES.find((g) => g.path.test(pathname));
  try {
    const user = await requireUser();
    if (gate) await gate.check(user, gate.path.exec(pathname)!.slice(1).map(decodeURIComponent));
  } catch (error) {
    if (error instanceof AccessError) accessInterrupt(error, pathname);
    // Anything else is the page's to report through its own error boundary.
  }
}
