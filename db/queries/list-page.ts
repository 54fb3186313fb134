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
 * Runs `base` twice: once to count, once for the page. `sortable` maps the public sort names to SQL
 * expressions (an unknown sort falls back to `defaultSort`, so a URL cannot inject a column).
 */
export async function listPage<T>(
  base: Knex.QueryBuilder,
  query: ListQuery,
  opts: { sortable: Record<string, string>; defaultSort: string; defaultDir?: "asc" | "desc"; search: string[]; select: (qb: Knex.QueryBuilder) => Knex.QueryBuilder },
): Promise<ListPage<T>> {
  const q = (query.q ?? "").trim().slice(0, 200);
  const filtered = base.clone();
  if (q) {
    filtered.where((w) => {
      for (const column of opts.search) w.orWhereRaw(`${column}::text ILIKE ? ESCAPE '\\'`, [likePattern(q)]);
    });
  }
  const sort = query.sort && query.sort in opts.sortable ? query.sort : opts.defaultSort;
  const dir = query.dir === "asc" || query.dir === "desc" ? query.dir : (opts.defaultDir ?? "asc");
  const pageSize = Math.min(MAX_PAGE_SIZE, Math.max(1, Math.floor(query.pageSize ?? 20)));
  const page = Math.max(1, Math.floor(query.page ?? 1));

  const [{ count }] = await filtered.clone().clearSelect().clearOrder().count<{ count: string }[]>({ count: "*" });
  const rows = (await opts
    .select(filtered.clone())
    .orderByRaw(`${opts.sortable[sort]} ${dir} nulls last`)
    .limit(pageSize)
    .offset((page - 1) * pageSize)) as T[];
  return { rows, total: Number(count), page, pageSize, sort, dir, q };
}
