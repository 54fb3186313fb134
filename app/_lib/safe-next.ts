/**
 * Where to go after sign-in: only a path on this site. The value is resolved the way a browser
 * would resolve it (backslashes as slashes, tabs and newlines dropped, percent-decoding of the
 * host) against a placeholder origin; anything that lands on another origin, or is not a plain
 * path, falls back to the projects list.
 */
const PLACEHOLDER = "http://pierwise.invalid";
export const DEFAULT_NEXT = "/projects";

export function safeNext(value: unknown): string {
  if (typeof value !== "string" || !value.startsWith("/") || value.length > 2000) return DEFAULT_NEXT;
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f\\]/.test(value) || value.startsWith("//")) return DEFAULT_NEXT;
  let url: URL;
  try {
    url = new URL(value, PLACEHOLDER);
  } catch {
    return DEFAULT_NEXT;
  }
  if (url.origin !== PLACEHOLDER) return DEFAULT_NEXT;
  const path = `${url.pathname}${url.search}${url.hash}`;
  return path.startsWith("/") && !path.startsWith("//") ? path : DEFAULT_NEXT;
}
