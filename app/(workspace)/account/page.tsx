import type { Metadata } from "next";
import { hasRole, requireUser } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { listLicences } from "@/db/queries/licences";
import { readSession } from "@/app/_lib/session";
import { activeSessions } from "@/db/queries/sessions";
import { signOutEverywhereAction } from "./actions";
import { ROLE_LABELS } from "@/db/roles";
import { LicenceForm } from "./_components/licence-form";
import { RemoveLicenceButton } from "./_components/remove-licence-button";
import { dateTimeInWords, todayInZone } from "@/components/ui/dates";

export const metadata: Metadata = { title: "Your account" };

async function AccountPage() {
  const user = await forPage(() => requireUser(), "/account");
  const isEngineer = hasRole(user, "engineer");
  const licences = isEngineer ? await listLicences(user.userId) : [];
  const today = todayInZone(user.timeZone);
  const sessions = await activeSessions(user.userId);
  const thisSession = (await readSession()).sessionId;
  return (
    <>
      <h1 className="text-2xl font-semibold">Your account</h1>
      <dl className="mt-4 grid max-w-xl grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-slate-500">Name</dt><dd>{user.name}</dd>
        <dt className="text-slate-500">E-mail</dt><dd className="break-all">{user.email}</dd>
        <dt className="text-slate-500">Organisation</dt><dd>{user.organisationName}</dd>
        <dt className="text-slate-500">Roles</dt><dd>{user.roles.map((r) => ROLE_LABELS[r]).join(", ")}</dd>
      </dl>

      <section aria-labelledby="licences-heading" className="mt-8">
        <h2 id="licences-heading" className="text-lg font-semibold">Engineering licences</h2>
        {isEngineer ? (
          <>
            <p className="mt-1 max-w-2xl text-sm text-slate-600">
              You can approve a design only for a project in a state where you hold a licence that has not expired. Record one
              licence per state; saving a state you already hold updates it.
            </p>
            {licences.length ? (
              <ul className="mt-3 divide-y divide-slate-200 rounded-lg border border-slate-200 bg-white">
                {licences.map((l) => {
                  const expired = l.expiresOn < today;
                  return (
                    <li key={l.state} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 text-sm">
                      <span className="w-10 font-semibold">{l.state}</span>
                      <span>{l.licenceNumber}</span>
                      <span className={expired ? "font-medium text-red-700" : "text-slate-600"}>
                        {expired ? `Expired on ${l.expiresOn}: you cannot approve in ${l.state}` : `Valid through ${l.expiresOn}`}
                      </span>
                      <span className="ml-auto"><RemoveLicenceButton state={l.state} /></span>
                    </li>
                  );
                })}
              </ul>
            ) : (
              <p className="mt-3 rounded-md border border-slate-200 bg-white px-4 py-3 text-sm">No licence recorded yet: you cannot approve designs until you add one.</p>
            )}
            <div className="mt-4 rounded-lg border border-slate-200 bg-white p-4">
              <h3 className="mb-3 font-medium">Add or update a licence</h3>
              <LicenceForm />
            </div>
          </>
        ) : (
          <p className="mt-1 text-sm text-slate-600">Licences are recorded by members with the reviewing engineer role.</p>
        )}
      </section>
      <section aria-labelledby="sessions-heading" className="mt-8">
        <h2 id="sessions-heading" className="text-lg font-semibold">Where you are signed in</h2>
        <p className="mt-1 max-w-2xl text-sm text-slate-600">
          Each sign-in lasts at most 12 hours. If you see a device you do not recognise, sign out everywhere and reset your password.
        </p>
        <ul className="mt-3 divide-y divide-slate-200 rounded-lg border border-slate-200 bg-white">
          {sessions.map((s) => (
            <li key={s.id} className="flex flex-wrap gap-x-4 gap-y-1 px-4 py-3 text-sm">
              <span className="font-medium">{s.id === thisSession ? "This device" : browserName(s.userAgent)}</span>
              <span className="text-slate-600">signed in {dateTimeInWords(s.createdAt, user.timeZone)}</span>
              <span className="text-slate-600">last active {dateTimeInWords(s.lastSeenAt, user.timeZone)}</span>
              {s.ip ? <span className="text-slate-600">from {s.ip}</span> : null}
            </li>
          ))}
        </ul>
        <form action={signOutEverywhereAction} className="mt-3">
          <button type="submit" className="rounded-md border border-red-300 bg-white px-3 py-1.5 text-sm font-medium text-red-800 hover:bg-red-50">
            Sign out everywhere
          </button>
        </form>
      </section>
    </>
  );
}

/** A short, human name for the browser that made a session, from its user-agent string. */
function browserName(userAgent: string | null): string {
  if (!userAgent) return "Unknown browser";
  const browser = /Edg\//.test(userAgent) ? "Edge" : /Firefox\//.test(userAgent) ? "Firefox" : /Chrome\//.test(userAgent) ? "Chrome" : /Safari\//.test(userAgent) ? "Safari" : "Another browser";
  const device = /iPhone|Android.*Mobile/.test(userAgent) ? "phone" : /iPad|Android/.test(userAgent) ? "tablet" : "computer";
  return `${browser} on a ${device}`;
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(AccountPage);
