/**
 * What a 404 or 403 page says, in one place: app/not-found.tsx and app/forbidden.tsx render it
 * styled; components/ui/access-refused.tsx writes it into the server HTML as plain markup with
 * inline styles (that HTML carries no stylesheet), with a plain link: it is rendered outside the
 * app's router.
 */
import Link from "next/link";

export type RefusalStatus = 403 | 404;

const WORDS: Record<RefusalStatus, { kicker: string; title: string; body: string; link: { href: string; label: string } }> = {
  404: {
    kicker: "404 — not found",
    title: "Nothing here",
    body: "The page does not exist, or it belongs to an organisation you are not a member of.",
    link: { href: "/", label: "Go to the start page" },
  },
  403: {
    kicker: "403 — not allowed",
    title: "Your role does not allow this page",
    body: "You are signed in, but this needs a role you do not hold in this organisation. Ask an admin of your organisation to add the role if you need it.",
    link: { href: "/projects", label: "Back to projects" },
  },
};

export function RefusalText({ status, plain = false }: { status: RefusalStatus; plain?: boolean }) {
  const w = WORDS[status];
  // The plain form's styles copy the styled one's look closely enough that the switch to it is quiet.
  const s = (css: React.CSSProperties) => (plain ? { style: css } : {});
  return (
    <main className="mx-auto max-w-lg px-5 py-16" {...s({ maxWidth: "32rem", margin: "0 auto", padding: "4rem 1.25rem", fontFamily: "system-ui, sans-serif", color: "#0f172a" })}>
      <p className="text-sm font-medium text-slate-500" {...s({ fontSize: "0.875rem", fontWeight: 500, color: "#64748b", margin: 0 })}>{w.kicker}</p>
      <h1 className="mt-2 text-2xl font-semibold" {...s({ fontSize: "1.5rem", fontWeight: 600, margin: "0.5rem 0 0" })}>{w.title}</h1>
      <p className="mt-3 text-slate-600" {...s({ color: "#475569", margin: "0.75rem 0 0" })}>{w.body}</p>
      {plain
        ? <a href={w.link.href} style={{ display: "inline-block", marginTop: "1.5rem", color: "#0f766e" }}>{w.link.label}</a>
        : <Link href={w.link.href} className="mt-6 inline-block text-accent-700 underline">{w.link.label}</Link>}
    </main>
  );
}
