/**
 * Dates as people read them, in the organisation's time zone: "December 2, 2026" and
 * "December 2, 2026 at 3:40 AM MST". Raw ISO stamps never reach a page or a report.
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
