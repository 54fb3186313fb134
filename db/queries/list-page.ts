import type { Knex } from "knex";

/**
 * Server-side paging, sorting and filtering shared by every table (projects, designs, revisions,
 * uploads), so a large organisation never sends its whole list to the browser.
 */
export interface ListQuery {
  /** Free-text filter (matched case-insensitively against the table's search columns). */
  q?: string;
  sort?: string;
  dir?: "asc" | "desc";
  /** 1-based. */
  page?: number;
  pageSize?: number;
}

export interface ListPage<T> {
  rows: T[];
  total: number;
  /** The count stopped at `total`: there are more rows than that ("1–20 of 1,000+"). */
  capped?: boolean;
  page: number;
  pageSize: number;
  sort: string;
  dir: "asc" | "desc";
  q: string;
}

export const MAX_PAGE_SIZE = 100;

/** Escapes LIKE wildcards so a user's "%" or "_" is matched literally. */
export function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/**
 * Runs `base` twice: once to count, once for the page (in parallel). `sortable` maps the public sort names to SQL
 * expressions (an unknown sort falls back to `defaultSort`, so a URL cannot inject a column).
 */
export async function listPage<T>(
  base: Knex.QueryBuilder,
  query: ListQuery,
  opts: {
    sortable: Record<string, string>; defaultSort: string; defaultDir?: "asc" | "desc"; search: string[]; select: (qb: Knex.QueryBuilder) => Knex.QueryBuilder;
    /** Sort names whose column is never null: sorted without NULLS LAST, so a plain index serves both directions. */
    notNull?: string[];
    /** Replaces the column-by-column ILIKE of `search`, e.g. to use a trigram index (`pattern` is already escaped). */
    match?: (qb: Knex.QueryBuilder, pattern: string) => void;
    /**
     * A unique column sorted after the chosen one in the same direction, so rows that tie on it
     * keep one order from page to page (none repeated or skipped at a page boundary). Not added
     * when the chosen sort is this column itself.
     */
    tieBreak?: { sort: string; column: string };
  },
): Promise<ListPage<T>> {
  const q = (query.q ?? "").trim().slice(0, 200);
  const filtered = base.clone();
  if (q && opts.match) {
    filtered.where((w) => opts.match!(w, likePattern(q)));
  } else if (q) {
    filtered.where((w) => {
      for (const column of opts.search) w.orWhereRaw(`${column}::text ILIKE ? ESCAPE '\\'`, [likePattern(q)]);
    });
  }
  // Own keys only: "__proto__", "constructor" and "toString" are "in" every object.
  const sort = query.sort && Object.hasOwn(opts.sortable, query.sort) ? query.sort : opts.defaultSort;
  const dir = query.dir === "asc" || query.dir === "desc" ? query.dir : (opts.defaultDir ?? "asc");
  const pageSize = Math.min(MAX_PAGE_SIZE, Math.max(1, Math.floor(query.pageSize ?? 20)));
  const page = Math.max(1, Math.floor(query.page ?? 1));

  // Count and page at once (two pooled connections), each served by the list's index.
  const [[{ count }], rows] = await Promise.all([
    filtered.clone().clearSelect().clearOrder().count<{ count: string }[]>({ count: "*" }),
    opts
      .select(filtered.clone())
      .orderByRaw(`${opts.sortable[sort]} ${dir}${opts.notNull?.includes(sort) ? "" : " nulls last"}${opts.tieBreak && opts.tieBreak.sort !== sort ? `, ${opts.tieBreak.column} ${dir}` : ""}`)
      .limit(pageSize)
      .offset((page - 1) * pageSize) as Promise<T[]>,
  ]);
  return { rows, total: Number(count), page, pageSize, sort, dir, q };
}
