import type { Metadata } from "next";
import { allowRequest } from "@/app/_lib/rate-limit";
import { requestIp } from "@/app/_lib/request-ip";
import { dateInWords } from "@/components/ui/dates";
import { tapeInches } from "@/components/format/tape";
import type { UnitSystem } from "@/components/format/quantity";
import { readerUnits } from "@/app/_lib/unit-preference";
import { cityOf, VERIFY_STATUS_WORDS, verifyStatus } from "@/app/_lib/review/verify";
import { Brand } from "@/components/ui/brand";
import { approvalByCode, type VerifiedApproval } from "@/db/queries/verify";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Approval check", robots: { index: false, follow: false }, referrer: "no-referrer" };

/** Checks per address per minute: plenty for an inspector, too few to walk the code space. */
const LIMIT = { requests: 30, windowMs: 60_000 };

/**
 * The public approval check an inspector opens from the QR code on the crew's field spec or the
 * report. No sign-in. It shows only what proves the approval (revision, hash, status now,
 * engineer and licence, date, city and state, footing) and nothing else of the project. An unknown
 * code gets the same page with "no such approval", so the answer tells a guesser nothing more.
 */
export default async function VerifyPage({ params }: { params: Promise<{ code: string }> }) {
  const { code } = await params;
  const units = await readerUnits();
  const allowed = allowRequest(`verify:${await requestIp()}`, LIMIT.requests, LIMIT.windowMs);
  const approval = allowed ? await approvalByCode(code) : undefined;
  return (
    <main className="mx-auto max-w-xl space-y-4 p-4">
      <header className="flex items-center justify-between gap-3 border-b border-slate-200 pb-3">
        <Brand />
        <p className="text-sm text-slate-600">Approval check</p>
      </header>
      {!allowed ? (
        <Panel tone="neutral" title="Too many checks from this address">
          <p>Wait a minute and open the link again.</p>
        </Panel>
      ) : approval ? <Found a={approval} units={units} /> : (
        <Panel tone="bad" title="No such approval">
          <p>This link or code does not match any approved revision. Do not build from a spec that carries it: ask the contractor for the current field spec.</p>
        </Panel>
      )}
      <section className="rounded-lg border border-slate-200 bg-white p-4 text-sm text-slate-700">
        <h2 className="font-semibold text-slate-900">How to read this page</h2>
        <p className="mt-1">The code printed beside the QR code on a field spec or calculation report opens this page. Compare the revision number and content hash with the paper in front of you: they must match.</p>
        <p className="mt-1">This page shows preliminary footing sizing approved by the engineer named; the local building code and the authority having jurisdiction govern.</p>
      </section>
    </main>
  );
}

function Found({ a, units }: { a: VerifiedApproval; units: UnitSystem }) {
  const status = verifyStatus(a);
  const words = VERIFY_STATUS_WORDS[status];
  const city = cityOf(a.facts.projectAddress, a.facts.projectState);
  return (
    <>
      <Panel tone={status === "current" ? "good" : "bad"} title={words.title}>
        <p>{words.detail}</p>
      </Panel>
      <section aria-label="Approval" className="rounded-lg border border-slate-200 bg-white p-4">
        <dl className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-2 text-base">
          <dt className="text-slate-600">Revision</dt><dd className="font-semibold">{a.number}</dd>
          <dt className="text-slate-600">Content hash</dt><dd className="break-all font-mono text-sm">{a.contentHash}</dd>
          <dt className="text-slate-600">Engineer</dt><dd className="font-semibold">{a.engineerName}</dd>
          <dt className="text-slate-600">Licence</dt><dd>{a.licenceNumber}, {a.licenceState}</dd>
          <dt className="text-slate-600">Approved on</dt><dd>{dateInWords(a.decidedAt, a.timeZone)}</dd>
          <dt className="text-slate-600">Site</dt><dd>{city ? `${city}, ` : ""}{a.facts.projectState}</dd>
          <dt className="text-slate-600">Footings</dt><dd className="font-semibold">{a.posts} posts, each hole {tapeInches(a.diameterIn, units)} across × {tapeInches(a.depthIn, units)} deep</dd>
        </dl>
      </section>
      <section aria-label="Contractor" className="rounded-lg border border-slate-200 bg-white p-4 text-sm">
        <h2 className="font-semibold">The contractor</h2>
        <p className="mt-1">{a.organisationName}. For the site, the permit set or anything this page does not show, write to <a className="underline" href={`mailto:${a.contactEmail}`}>{a.contactEmail}</a> or ask the crew lead on site.</p>
      </section>
    </>
  );
}

function Panel({ tone, title, children }: { tone: "good" | "bad" | "neutral"; title: string; children: React.ReactNode }) {
  const colours = { good: "border-emerald-600 bg-emerald-50 text-emerald-950", bad: "border-red-600 bg-red-50 text-red-950", neutral: "border-slate-400 bg-slate-50 text-slate-900" }[tone];
  return (
    <section role="status" className={`rounded-lg border-2 p-4 ${colours}`}>
      <h1 className="text-2xl font-bold">{title}</h1>
      <div className="mt-1 text-base">{children}</div>
    </section>
  );
}
