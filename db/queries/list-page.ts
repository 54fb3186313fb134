import type { Knex } from "knex";
import { db } from "../client";

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

/** A search's count stops past this many matches (or a page past the current one): "1–20 of 1,000+". */
export const SEARCH_COUNT_CAP = 1000;

/**
 * How far a capped count reads: `cap` rows, or one page past the current page, whichever is more
 * (so the page asked for and the next one are always counted, and Next works). Count up to this
 * plus one row to know whether there are more.
 */
export function countReach(cap: number, page: number, pageSize: number): number {
  return Math.max(cap, page * pageSize + pageSize);
}

/**
 * A count read up to `reach + 1` rows, as a page's total: past `reach` it is `reach` and `capped`
 * (the tables say "1–20 of 1,000+" and "Page 1 of 50+"); `capped` is absent otherwise. Without a
 * reach (an exact count) the count as it is.
 */
export function cappedTotal(counted: number, reach: number | undefined): { total: number; capped?: true } {
  return reach !== undefined && counted > reach ? { total: reach, capped: true } : { total: counted };
}

/** Escapes LIKE wildcards so a user's "%" or "_" is matched literally. */
export function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/**
 * Runs `base` twice: once to count, once for the page (in parallel). `sortable` maps the public sort names to SQL
 * expressions (an unknown sort falls back to `defaultSort`, so a URL cannot inject a column).
 *
 * The count, when the list can grow without bound: `keptCount` answers it without a search from
 * a count kept elsewhere (one row), and `searchCountCap` stops a search's count at that many matches
 * or a page past the current one (`countReach`, `cappedTotal`: the same cap as the projects list's).
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
    /**
     * The exact count of `base` without a search, kept elsewhere (a column a trigger keeps): a
     * query of at most one row whose column `n` is the count, read instead of counting the rows
     * (no row counts 0). Not used with a search.
     */
    keptCount?: Knex.QueryBuilder;
    /** With a search: count the matches only up to this many, or a page past the current one, and say `capped` past it. */
    searchCountCap?: number;
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

  // The count: kept (one row), capped (up to reach + 1 matches), or every row of `base`.
  const reach = q && opts.searchCountCap !== undefined ? countReach(opts.searchCountCap, page, pageSize) : undefined;
  const counted = (): Promise<{ n: string | number }[]> => {
    if (!q && opts.keptCount) return opts.keptCount.clone();
    const matching = filtered.clone().clearSelect().clearOrder();
    if (reach === undefined) return matching.count({ n: "*" });
    return db.from(matching.select(db.raw("1")).limit(reach + 1).as("m")).count({ n: "*" });
  };

  // Count and page at once (two pooled connections), each served by the list's index.
  const [[count], rows] = await Promise.all([
    counted(),
    opts
      .select(filtered.clone())
      .orderByRaw(`${opts.sortable[sort]} ${dir}${opts.notNull?.includes(sort) ? "" : " nulls last"}${opts.tieBreak && opts.tieBreak.sort !== sort ? `, ${opts.tieBreak.column} ${dir}` : ""}`)
      .limit(pageSize)
      .offset((page - 1) * pageSize) as Promise<T[]>,
  ]);
  return { rows, ...cappedTotal(Number(count?.n ?? 0), reach), page, pageSize, sort, dir, q };
}
