/**
 * The engineer's comments pinned to inputs, as the design editor shows them beside their fields:
 * the field by its worded label (never the dotted path), who and when, and whether the field's value
 * changed since the revision the comment was made on ("resolved in this revision"). Pure: the page
 * builds these on the server from the stored comments; no engine run.
 */
import type { PinnedCommentRow } from "@/db/queries/review-comments";
import type { UnitSystem } from "@/components/format/quantity";
import { shortDateTime } from "@/components/ui/dates";
import { fieldLabel } from "./fields";
import { inputValueText } from "./input-values";
import { sameValue } from "./pinned-change";
import { flatten, type DiffValue } from "./revision-diff";

/** The stored comment as the query reads it (db/queries/review-comments.ts). */
export type PinnedCommentSource = PinnedCommentRow;

export interface PinnedCommentView {
  id: string;
  /** Which editor field it sits beside (the schema path; never shown). */
  path: string;
  label: string;
  body: string;
  engineerName: string;
  whenText: string;
  revisionNumber: number;
  /** The field's value when the comment was made, as stored (compared with what is typed) and in words. */
  valueThen: DiffValue;
  valueThenText: string;
  /** The value in the revision shown, in words. */
  valueNowText: string;
  /** The value in the revision shown differs from the commented revision's. */
  resolved: boolean;
}

export function pinnedCommentViews(rows: PinnedCommentSource[], shownInput: unknown, timeZone?: string, units: UnitSystem = "imperial"): PinnedCommentView[] {
  const now = flatten(shownInput);
  return rows.map((c) => {
    const then = flatten(c.revisionInput)[c.fieldPath] ?? null;
    const current = now[c.fieldPath] ?? null;
    return {
      id: c.id,
      path: c.fieldPath,
      label: fieldLabel(c.fieldPath),
      body: c.body,
      engineerName: c.authorName,
      whenText: shortDateTime(c.createdAt, timeZone),
      revisionNumber: c.revisionNumber,
      valueThen: then,
      valueThenText: inputValueText(c.fieldPath, then, units),
      valueNowText: inputValueText(c.fieldPath, current, units),
      resolved: !sameValue(then, current),
    };
  });
}
