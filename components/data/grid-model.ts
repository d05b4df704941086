// Pure table arithmetic for DataGrid: sorting, text filtering and paging, kept free of React so it is
// unit-tested in node and behaves the same whichever list uses it.

export type SortDirection = "asc" | "desc";
export type SortState = { columnId: string; direction: SortDirection } | null;
export type SortValue = string | number | boolean | null | undefined;

/** What the model needs to know about a column; DataGrid adds the header cell and the renderer. */
export type ColumnModel<Row> = {
  id: string;
  /** The value the column sorts by (and filters by unless `filterText` is given). */
  accessor: (row: Row) => SortValue;
  /** A custom order; defaults to comparing the accessor's values. */
  compare?: (a: Row, b: Row) => number;
  /** Whether the Filter box searches this column. */
  filterable?: boolean;
  /** The text the Filter box matches, when it differs from the accessor (labels rather than codes). */
  filterText?: (row: Row) => string;
  /** Sorting is on unless this is false. */
  sortable?: boolean;
};

export const DEFAULT_PAGE_SIZE = 25;

const collator = new Intl.Collator("en", { numeric: true, sensitivity: "base" });

function isBlank(v: SortValue): v is null | undefined {
  return v === null || v === undefined || v === "";
}

/** Orders two cell values: numbers numerically, text naturally ("r2" before "r10"), blanks last. */
export function compareValues(a: SortValue, b: SortValue): number {
  if (isBlank(a) || isBlank(b)) return isBlank(a) === isBlank(b) ? 0 : isBlank(a) ? 1 : -1;
  if (typeof a === "number" && typeof b === "number") return a === b ? 0 : a < b ? -1 : 1;
  if (typeof a === "boolean" && typeof b === "boolean") return a === b ? 0 : a ? -1 : 1;
  return collator.compare(String(a), String(b));
}

/** The sort after activating a column's header: a new column starts ascending, the same one flips. */
export function nextSort(current: SortState, columnId: string): SortState {
  if (current?.columnId !== columnId) return { columnId, direction: "asc" };
  return { columnId, direction: current.direction === "asc" ? "desc" : "asc" };
}

/** The aria-sort value for a column header; omitted on unsorted columns so only one header speaks. */
export function ariaSortOf(sort: SortState, columnId: string): "ascending" | "descending" | undefined {
  if (sort?.columnId !== columnId) return undefined;
  return sort.direction === "asc" ? "ascending" : "descending";
}

/** A sorted copy of the rows; ties keep their incoming order, and blanks stay last in both directions. */
export function sortRows<Row>(rows: readonly Row[], columns: readonly ColumnModel<Row>[], sort: SortState): Row[] {
  const column = sort ? columns.find((c) => c.id === sort.columnId && c.sortable !== false) : undefined;
  if (!sort || !column) return [...rows];
  const sign = sort.direction === "asc" ? 1 : -1;
  const byValue = (a: Row, b: Row) => {
    const va = column.accessor(a);
    const vb = column.accessor(b);
    if (isBlank(va) || isBlank(vb)) return compareValues(va, vb);
    return sign * compareValues(va, vb);
  };
  const compare = column.compare ? (a: Row, b: Row) => sign * column.compare!(a, b) : byValue;
  return rows
    .map((row, index) => ({ row, index }))
    .sort((x, y) => compare(x.row, y.row) || x.index - y.index)
    .map((x) => x.row);
}

/** Lower-cases and strips accents so "Hühnerstall" is found by typing "huhner". */
export function normalizeText(text: string): string {
  return text.normalize("NFD").replace(/\p{M}/gu, "").toLowerCase();
}

/** The filter's words; every one must appear in some filterable column of a row. */
export function filterTerms(query: string): string[] {
  return normalizeText(query).split(/\s+/).filter(Boolean);
}

/** The rows whose filterable columns contain every word of the query. */
export function filterRows<Row>(rows: readonly Row[], columns: readonly ColumnModel<Row>[], query: string): Row[] {
  const terms = filterTerms(query);
  const searched = columns.filter((c) => c.filterable);
  if (terms.length === 0 || searched.length === 0) return [...rows];
  return rows.filter((row) => {
    const haystack = normalizeText(searched.map((c) => (c.filterText ? c.filterText(row) : String(c.accessor(row) ?? ""))).join("\u0000"));
    return terms.every((t) => haystack.includes(t));
  });
}

export type PageWindow = { pageIndex: number; pageCount: number; start: number; end: number; total: number };

/** The page actually shown: the requested page clamped to what exists, with 0-based [start, end). */
export function pageWindow(total: number, pageIndex: number, pageSize = DEFAULT_PAGE_SIZE): PageWindow {
  const size = Math.max(1, Math.floor(pageSize));
  const pageCount = Math.max(1, Math.ceil(total / size));
  const index = Math.min(Math.max(0, Math.floor(pageIndex)), pageCount - 1);
  const start = Math.min(index * size, total);
  return { pageIndex: index, pageCount, start, end: Math.min(start + size, total), total };
}

/** The status line under a table: "Rows 1–25 of 132", noting the unfiltered count when a filter hides rows. */
export function describeRows(window: PageWindow, unfiltered = window.total): string {
  const suffix = unfiltered !== window.total ? ` (filtered from ${unfiltered})` : "";
  if (window.total === 0) return `No rows${suffix}`;
  return `Rows ${window.start + 1}–${window.end} of ${window.total}${suffix}`;
}

export type GridView<Row> = { rows: Row[]; window: PageWindow; matched: number };

/** Filter, then sort, then cut out one page: everything DataGrid shows for its current state. */
export function gridView<Row>(
  rows: readonly Row[],
  columns: readonly ColumnModel<Row>[],
  state: { query: string; sort: SortState; pageIndex: number; pageSize?: number },
): GridView<Row> {
  const matched = sortRows(filterRows(rows, columns, state.query), columns, state.sort);
  const window = pageWindow(matched.length, state.pageIndex, state.pageSize);
  return { rows: matched.slice(window.start, window.end), window, matched: matched.length };
}
