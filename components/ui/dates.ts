/**
 * The one place dates and times are formatted, always with Intl.DateTimeFormat in the
 * organisation's time zone (`user.timeZone`, `ctx.timeZone`): "December 2, 2026",
 * "December 2, 2026 at 3:40 AM MST", in tables "Dec 2, 2026" and "Dec 2, 2026, 3:40 AM MST".
 * Raw ISO stamps never reach a page or a report (a `<time dateTime>` attribute may carry one).
 * Client-safe: tables in client components use it too.
 */
function zone(timeZone: string | undefined): string {
  try {
    new Intl.DateTimeFormat("en-US", { timeZone });
    return timeZone ?? "UTC";
  } catch {
    return "UTC"; // an unknown zone name must not take a page down
  }
}

export function dateInWords(d: Date | string | null | undefined, timeZone?: string): string {
  if (!d) return "—";
  return new Intl.DateTimeFormat("en-US", { timeZone: zone(timeZone), dateStyle: "long" }).format(new Date(d));
}

export function dateTimeInWords(d: Date | string | null | undefined, timeZone?: string): string {
  if (!d) return "—";
  const tz = zone(timeZone);
  const date = new Intl.DateTimeFormat("en-US", { timeZone: tz, dateStyle: "long" }).format(new Date(d));
  const time = new Intl.DateTimeFormat("en-US", { timeZone: tz, hour: "numeric", minute: "2-digit", timeZoneName: "short" }).format(new Date(d));
  return `${date} at ${time}`;
}

/** A calendar date stored as YYYY-MM-DD (a licence expiry), in words, with no time-zone shift. */
export function calendarDateInWords(ymd: string | null | undefined): string {
  if (!ymd) return "—";
  return new Intl.DateTimeFormat("en-US", { timeZone: "UTC", dateStyle: "long" }).format(new Date(`${ymd}T12:00:00Z`));
}

/** Short, for table cells: "Dec 2, 2026". */
export function shortDate(d: Date | string | null | undefined, timeZone?: string): string {
  if (!d) return "—";
  return new Intl.DateTimeFormat("en-US", { timeZone: zone(timeZone), dateStyle: "medium" }).format(new Date(d));
}

/** Short, for table cells and logs: "Dec 2, 2026, 3:40 AM MST". */
export function shortDateTime(d: Date | string | null | undefined, timeZone?: string): string {
  if (!d) return "—";
  const tz = zone(timeZone);
  return `${new Intl.DateTimeFormat("en-US", { timeZone: tz, dateStyle: "medium", timeStyle: "short" }).format(new Date(d))} ${zoneName(new Date(d), tz)}`;
}

function zoneName(d: Date, timeZone: string): string {
  return new Intl.DateTimeFormat("en-US", { timeZone, timeZoneName: "short" }).formatToParts(d).find((p) => p.type === "timeZoneName")?.value ?? timeZone;
}

/** Today's date in the organisation's zone as YYYY-MM-DD, the form a date input takes. */
export function todayInZone(timeZone?: string, now: Date = new Date()): string {
  const parts = new Intl.DateTimeFormat("en-US", { timeZone: zone(timeZone), year: "numeric", month: "2-digit", day: "2-digit" }).formatToParts(now);
  const part = (type: string) => parts.find((p) => p.type === type)?.value ?? "";
  return `${part("year")}-${part("month")}-${part("day")}`;
}
