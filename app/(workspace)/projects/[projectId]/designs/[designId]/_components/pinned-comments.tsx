"use client";

import { createContext, useContext } from "react";
import { changedSince } from "@/components/design/pinned-change";
import type { PinnedCommentView } from "@/components/design/pinned-comments";

/**
 * The engineer's comments pinned to inputs, beside the fields they are pinned to (and listed at the
 * top of the editor with links to those fields, since some sit under "More … settings"). A field
 * whose saved value changed since the commented revision says "Resolved in this revision"; one
 * changed here but not saved yet says so. The list comes from the server (app/_lib/services/review-comments.ts).
 */
const PinnedContext = createContext<Map<string, PinnedCommentView[]>>(new Map());

export function PinnedCommentsProvider({ comments, children }: { comments: Map<string, PinnedCommentView[]>; children: React.ReactNode }) {
  return <PinnedContext.Provider value={comments}>{children}</PinnedContext.Provider>;
}

/** Whether any comment is pinned to a field under this prefix ("site."): its group's "More … settings" then starts open. */
export function usePinnedUnder(prefix: string): boolean {
  const comments = useContext(PinnedContext);
  for (const path of comments.keys()) if (path.startsWith(prefix)) return true;
  return false;
}

export function pinnedByPath(comments: PinnedCommentView[]): Map<string, PinnedCommentView[]> {
  const map = new Map<string, PinnedCommentView[]>();
  for (const c of comments) map.set(c.path, [...(map.get(c.path) ?? []), c]);
  return map;
}

const anchor = (path: string) => `in-${path.replace(/\./g, "-")}`;

function State({ comment, value }: { comment: PinnedCommentView; value: unknown }) {
  if (comment.resolved) {
    return <p className="font-semibold text-emerald-800">Resolved in this revision: {comment.valueThenText} in revision {comment.revisionNumber}, now {comment.valueNowText}.</p>;
  }
  if (changedSince(comment.valueThen, value)) return <p className="font-medium text-sky-900">Changed here: save a revision to resolve it.</p>;
  return <p className="text-slate-600">Open: unchanged since revision {comment.revisionNumber}.</p>;
}

/** The comments pinned to one field, under it. `value` is the field's current value in the form. */
export function PinnedNotes({ name, value }: { name: string; value: unknown }) {
  const comments = useContext(PinnedContext).get(name);
  if (!comments?.length) return null;
  return (
    <ul data-pinned-to={name} className="space-y-1">
      {comments.map((c) => (
        <li key={c.id} className={`rounded-md border px-2 py-1 text-xs ${c.resolved ? "border-emerald-300 bg-emerald-50" : "border-sky-300 bg-sky-50"} text-slate-900`}>
          <p>Engineer&apos;s comment from <span className="font-semibold">{c.engineerName}</span>, {c.whenText}, on revision {c.revisionNumber}:</p>
          <p className="text-sm">{c.body}</p>
          <State comment={c} value={value} />
        </li>
      ))}
    </ul>
  );
}

/** Every pinned comment at the top of the inputs, each linking to its field. */
export function PinnedCommentsPanel({ comments }: { comments: PinnedCommentView[] }) {
  if (!comments.length) return null;
  const open = comments.filter((c) => !c.resolved).length;
  return (
    <section aria-labelledby="pinned-h" className="rounded-lg border border-sky-300 bg-sky-50 p-3 text-sm text-sky-950">
      <h2 id="pinned-h" className="font-semibold">Engineer&apos;s comments on revision {comments[0].revisionNumber} ({open ? `${open} open` : "all resolved"})</h2>
      <ul className="mt-1 space-y-1">
        {comments.map((c) => (
          <li key={c.id}>
            <a href={`#${anchor(c.path)}`} className="font-medium underline">{c.label}</a>: {c.body} <span className="text-slate-700">({c.engineerName}{c.resolved ? "; resolved in this revision" : ""})</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
