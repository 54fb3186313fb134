/**
 * The review page's inputs, grouped as the editor groups them (Site, Array, Posts and footings) and
 * ordered by the one field-label table, each with what a reviewer should notice: changed since the
 * last review, off the criteria card (with the card's value) and the comments pinned to it. A group
 * that holds something to notice says how much, and opens on the page. Pure: no engine run.
 */
import { fieldLabel, FIELD_META } from "@/components/design/fields";
import { inputValueText } from "@/components/design/input-values";
import type { UnitSystem } from "@/components/format/quantity";
import { flatten, type DiffValue } from "@/components/design/revision-diff";

export interface ReviewInputRow {
  /** The schema path: only for the row's anchor id, never shown. */
  path: string;
  label: string;
  value: string;
  changed: boolean;
  /** The criteria card's value in words, when this input differs from it. */
  cardValue: string | null;
  comments: string[];
}

export interface ReviewInputGroup {
  title: string;
  rows: ReviewInputRow[];
  changed: number;
  offCard: number;
  commented: number;
}

const GROUPS = [
  { prefix: "site.", title: "Site" },
  { prefix: "array.", title: "Array" },
  { prefix: "posts.", title: "Posts and footings" },
] as const;

const ORDER = Object.keys(FIELD_META);
const rank = (path: string) => (ORDER.indexOf(path) === -1 ? ORDER.length : ORDER.indexOf(path));

export function reviewInputGroups(
  input: unknown,
  notes: { changed: Iterable<string>; offCard: Record<string, DiffValue>; pinned: Map<string, string[]> },
  units: UnitSystem = "imperial",
): ReviewInputGroup[] {
  const changed = new Set(notes.changed);
  const values = Object.entries(flatten(input)).filter(([path]) => path !== "projectName");
  return GROUPS.map((g) => {
    const rows = values
      .filter(([path]) => path.startsWith(g.prefix))
      .sort(([a], [b]) => rank(a) - rank(b))
      .map(([path, value]): ReviewInputRow => ({
        path,
        label: fieldLabel(path),
        value: inputValueText(path, value, units),
        changed: changed.has(path),
        cardValue: path in notes.offCard ? inputValueText(path, notes.offCard[path], units) : null,
        comments: notes.pinned.get(path) ?? [],
      }));
    return {
      title: g.title,
      rows,
      changed: rows.filter((r) => r.changed).length,
      offCard: rows.filter((r) => r.cardValue !== null).length,
      commented: rows.filter((r) => r.comments.length).length,
    };
  }).filter((g) => g.rows.length);
}

/** "2 differ from the criteria card, 1 changed": what a closed group holds worth opening. */
export function groupNotice(g: ReviewInputGroup): string {
  const parts = [
    g.offCard ? `${g.offCard} ${g.offCard === 1 ? "differs" : "differ"} from the criteria card` : "",
    g.changed ? `${g.changed} changed` : "",
    g.commented ? `${g.commented} with comments` : "",
  ].filter(Boolean);
  return parts.join(", ");
}
