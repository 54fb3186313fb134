/**
 * Finding 2 of the hardening issue: after sign-in, `next` is followed only when it is a path on
 * this site. Each hostile value below is one a browser resolves to another host (WHATWG URL
 * Standard, "special" schemes: a backslash is a path separator and tab/newline are stripped).
 */
import { describe, expect, it } from "vitest";
import { signInAction } from "@/app/(auth)/login/actions";
import { safeNext } from "@/app/_lib/safe-next";
import { outcomeOf, resetRequest } from "../support/next-context";

const HOSTILE = [
  "/%5Cevil.example/phish", // the finding's request, as the form receives it after one decoding
  "/\\evil.example/phish",
  "\\/evil.example",
  "//evil.example",
  "/\t/evil.example",
  "/\n/evil.example",
  "https://evil.example",
  "javascript:alert(1)",
  "/%2F%2Fevil.example",
  "",
];

async function signInWith(next: string) {
  resetRequest({ ip: "198.51.100.77" });
  const form = new FormData();
  form.append("email", "designer@demo.pierwise.test");
  form.append("password", "pierwise-demo");
  form.append("next", next);
  return outcomeOf(() => signInAction({}, form));
}

describe("the sign-in redirect", () => {
  it("never leaves the site, whatever next says", async () => {
    for (const next of HOSTILE) {
      const out = await signInWith(next.includes("%5C") ? decodeURIComponent(next) : next);
      expect(out.kind).toBe("redirect");
      const location = (out as { location: string }).location;
      // Resolved as a browser would against the app's origin, the target is still the app.
      expect(new URL(location, "http://127.0.0.1:3000").origin, `next=${JSON.stringify(next)}`).toBe("http://127.0.0.1:3000");
      expect(location.startsWith("//")).toBe(false);
    }
  });

  it("keeps a same-site path with its query", async () => {
    const out = await signInWith("/projects?q=ridge&page=2");
    expect(out).toEqual({ kind: "redirect", location: "/projects?q=ridge&page=2" });
    expect(safeNext("/reviews/abc#comments")).toBe("/reviews/abc#comments");
    expect(safeNext("/\\evil.example")).toBe("/projects");
  });
});
