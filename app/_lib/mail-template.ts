import { DEFER_TO_CODE } from "@/engine/notices";

/**
 * The one way an e-mail is composed: a structured message becomes an HTML part and a plain-text
 * part that say the same thing (heading, paragraphs, the action as a button with the same link in
 * the text, the project and revision named, the preliminary-sizing caution). Every value is
 * escaped in the HTML: project, design and people's names are typed by users and are hostile input.
 * No templating package: a few lines of string building with one escape function.
 */
export interface MailAction {
  label: string;
  url: string;
}

export interface MailMessage {
  subject: string;
  heading: string;
  /** Plain sentences (no markup); an empty string is a paragraph break only in the text part. */
  paragraphs: string[];
  /** Optional bullet points after the paragraphs (failing checks, comments, hold reasons). */
  list?: string[];
  /** The one thing to do, drawn as a button; its link is also written out in the text part. */
  action?: MailAction;
  /** Further links, after the button (e.g. the field spec beside the review). */
  links?: MailAction[];
  /** Named in a line of its own in both parts. */
  project?: string;
  /** "Design name, revision 3" when the mail is about a revision. */
  revision?: string;
  /** Words after the action, e.g. "If you did not ask, ignore this e-mail". */
  footnote?: string;
}

export interface ComposedMail {
  subject: string;
  text: string;
  html: string;
}

const ESCAPES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };

/** Escapes text for an HTML element or a double-quoted attribute. */
export function escapeHtml(value: string): string {
  return String(value).replace(/[&<>"']/g, (c) => ESCAPES[c]);
}

/** Only web links go into a button: anything else (javascript:, data:) is refused loudly, it is a bug. */
function safeUrl(url: string): string {
  const parsed = new URL(url);
  if (parsed.protocol !== "https:" && parsed.protocol !== "http:") throw new Error(`Refusing a mail link with the scheme ${parsed.protocol}`);
  return parsed.toString();
}

/** The caution every e-mail carries (DEFER_TO_CODE from the engine). */
export const MAIL_CAUTION = `Caution: ${DEFER_TO_CODE}`;

function contextLines(m: MailMessage): string[] {
  return [m.project ? `Project: ${m.project}` : null, m.revision ? `Revision: ${m.revision}` : null].filter((l): l is string => l !== null);
}

function textPart(m: MailMessage, action: MailAction | null, links: MailAction[]): string {
  const lines: string[] = [m.heading, "", ...contextLines(m)];
  if (contextLines(m).length) lines.push("");
  for (const p of m.paragraphs) lines.push(p, "");
  if (m.list?.length) lines.push(...m.list.map((i) => `- ${i}`), "");
  // The link on its own line, so every mail reader makes it clickable.
  if (action) lines.push(`${action.label}:`, action.url, "");
  for (const l of links) lines.push(`${l.label}:`, l.url, "");
  if (m.footnote) lines.push(m.footnote, "");
  lines.push(MAIL_CAUTION);
  return lines.join("\n").replace(/\n{3,}/g, "\n\n");
}

const FONT = "font-family:Arial,Helvetica,sans-serif;color:#0f172a;";

function htmlPart(m: MailMessage, action: MailAction | null, links: MailAction[]): string {
  const e = escapeHtml;
  const context = contextLines(m).map((l) => `<p style="margin:0 0 4px;font-size:14px;color:#334155;">${e(l)}</p>`).join("");
  const paragraphs = m.paragraphs.filter((p) => p.trim() !== "").map((p) => `<p style="margin:0 0 12px;font-size:15px;line-height:1.5;">${e(p)}</p>`).join("");
  const list = m.list?.length ? `<ul style="margin:0 0 12px;padding-left:20px;font-size:15px;line-height:1.5;">${m.list.map((i) => `<li>${e(i)}</li>`).join("")}</ul>` : "";
  const button = action
    ? `<p style="margin:20px 0;"><a href="${e(action.url)}" style="display:inline-block;background:#0f5c56;color:#ffffff;text-decoration:none;font-weight:bold;font-size:15px;padding:12px 20px;border-radius:6px;">${e(action.label)}</a></p>`
      + `<p style="margin:0 0 12px;font-size:12px;color:#475569;">Or open this link: <a href="${e(action.url)}" style="color:#0f5c56;">${e(action.url)}</a></p>`
    : "";
  const more = links.map((l) => `<p style="margin:0 0 8px;font-size:14px;">${e(l.label)}: <a href="${e(l.url)}" style="color:#0f5c56;">${e(l.url)}</a></p>`).join("");
  const footnote = m.footnote ? `<p style="margin:12px 0;font-size:13px;color:#475569;">${e(m.footnote)}</p>` : "";
  return [
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${e(m.subject)}</title></head>`,
    `<body style="margin:0;padding:0;background:#f8fafc;"><div style="${FONT}max-width:600px;margin:0 auto;padding:24px;background:#ffffff;">`,
    `<p style="margin:0 0 16px;font-weight:bold;font-size:14px;color:#0f5c56;">Pierwise</p>`,
    `<h1 style="margin:0 0 12px;font-size:20px;">${e(m.heading)}</h1>`,
    context ? `<div style="margin:0 0 16px;">${context}</div>` : "",
    paragraphs, list, button, more, footnote,
    `<p style="margin:24px 0 0;padding:12px;border:1px solid #f59e0b;background:#fffbeb;color:#78350f;font-size:13px;line-height:1.4;"><strong>Caution:</strong> ${e(DEFER_TO_CODE)}</p>`,
    `</div></body></html>`,
  ].join("");
}

/** A structured message → subject, plain text and HTML (what sendMail and the outbox carry). */
export function composeMail(m: MailMessage): ComposedMail {
  const action = m.action ? { label: m.action.label, url: safeUrl(m.action.url) } : null;
  const links = (m.links ?? []).map((l) => ({ label: l.label, url: safeUrl(l.url) }));
  return { subject: m.subject, text: textPart(m, action, links), html: htmlPart(m, action, links) };
}
