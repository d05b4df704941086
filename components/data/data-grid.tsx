"use client";
import { useEffect, useId, useMemo, useRef, useState, type ReactNode } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { Notice } from "@/components/ui/surface";
import { ariaSortOf, DEFAULT_PAGE_SIZE, describeRows, gridView, nextSort, type ColumnModel, type SortState } from "./grid-model";
import type { ApiError } from "./use-api";

export type DataGridColumn<Row> = ColumnModel<Row> & {
  header: string;
  /** What the cell shows; defaults to the accessor's value as text. */
  cell?: (row: Row) => ReactNode;
  /** Extra classes for this column's cells (e.g. "font-mono text-xs"). */
  className?: string;
};

export type DataGridProps<Row> = {
  caption: string;
  columns: DataGridColumn<Row>[];
  /** `undefined` until the first answer arrives: the skeleton shows meanwhile. */
  rows: readonly Row[] | undefined;
  rowKey: (row: Row) => string | number;
  loading?: boolean;
  /** Shown instead of the table when nothing loaded, above it when a refetch failed over older rows. */
  error?: ReactNode;
  /** Shown when the answer holds no rows at all. */
  empty: ReactNode;
  initialSort?: SortState;
  pageSize?: number;
  /** Extra controls beside the Filter box. */
  toolbar?: ReactNode;
};

const WRAP = "overflow-x-auto rounded-lg border border-loam-200 bg-white dark:border-loam-800 dark:bg-loam-900";
const THEAD = "border-b border-loam-200 bg-loam-50 text-xs uppercase tracking-wide text-loam-600 dark:border-loam-800 dark:bg-loam-950 dark:text-loam-400";
const TBODY = "divide-y divide-loam-100 dark:divide-loam-800";
const TD = "px-4 py-2.5 align-top";
const SKELETON_ROWS = 5;

function HeaderCell<Row>({ column, sort, onSort }: { column: DataGridColumn<Row>; sort: SortState; onSort: (id: string) => void }) {
  const ariaSort = ariaSortOf(sort, column.id);
  if (column.sortable === false) {
    return (
      <th scope="col" className="px-4 py-2.5 font-semibold">
        {column.header}
      </th>
    );
  }
  const arrow = ariaSort === "ascending" ? "▲" : ariaSort === "descending" ? "▼" : "↕";
  return (
    <th scope="col" aria-sort={ariaSort} className="px-4 py-2.5 font-semibold">
      <button
        type="button"
        onClick={() => onSort(column.id)}
        className="-mx-1 inline-flex items-center gap-1 rounded px-1 font-semibold uppercase tracking-wide hover:text-loam-900 dark:hover:text-loam-100"
      >
        {column.header}
        <span aria-hidden="true" className={ariaSort ? "" : "text-loam-400 dark:text-loam-600"}>
          {arrow}
        </span>
      </button>
    </th>
  );
}

function Skeleton<Row>({ caption, columns }: { caption: string; columns: DataGridColumn<Row>[] }) {
  return (
    <div className={WRAP} aria-busy="true">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className={THEAD}>
          <tr>
            {columns.map((c) => (
              <th key={c.id} scope="col" className="px-4 py-2.5 font-semibold">
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className={TBODY}>
          {Array.from({ length: SKELETON_ROWS }, (_, i) => (
            <tr key={i} aria-hidden="true">
              {columns.map((c) => (
                <td key={c.id} className={TD}>
                  <span className="block h-4 w-3/4 rounded bg-loam-100 motion-safe:animate-pulse dark:bg-loam-800" />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <p role="status" className="sr-only">
        Loading {caption.toLowerCase()}…
      </p>
    </div>
  );
}

/** A client table: headers sort (asc/desc, announced through aria-sort), a Filter box searches chosen columns, pages of 25. */
export function DataGrid<Row>({ caption, columns, rows, rowKey, loading = false, error, empty, initialSort = null, pageSize = DEFAULT_PAGE_SIZE, toolbar }: DataGridProps<Row>) {
  const [query, setQuery] = useState("");
  const [sort, setSort] = useState<SortState>(initialSort);
  const [pageIndex, setPageIndex] = useState(0);
  const filterId = useId();
  const prevRef = useRef<HTMLButtonElement>(null);
  const nextRef = useRef<HTMLButtonElement>(null);
  const filterRef = useRef<HTMLInputElement>(null);
  const pendingFocus = useRef<"prev" | "next" | null>(null);
  const view = useMemo(() => gridView(rows ?? [], columns, { query, sort, pageIndex, pageSize }), [rows, columns, query, sort, pageIndex, pageSize]);

  // A pager button that becomes disabled drops focus to the page body; hand it to its partner once rendered.
  useEffect(() => {
    const target = pendingFocus.current === "prev" ? prevRef.current : pendingFocus.current === "next" ? nextRef.current : null;
    pendingFocus.current = null;
    target?.focus();
  }, [pageIndex]);

  if (rows === undefined) return error ? <>{error}</> : <Skeleton caption={caption} columns={columns} />;
  if (rows.length === 0) {
    return (
      <div className="space-y-3">
        {error}
        {empty}
      </div>
    );
  }

  const searched = columns.filter((c) => c.filterable).map((c) => c.header.toLowerCase());
  const page = view.window;
  const goTo = (index: number) => {
    pendingFocus.current = index <= 0 ? "next" : index >= page.pageCount - 1 ? "prev" : null;
    setPageIndex(index);
  };

  return (
    <div className="space-y-3">
      {error}
      <div className="flex flex-wrap items-end gap-3">
        {searched.length > 0 && (
          <div>
            <label htmlFor={filterId} className="mb-1 block text-sm font-medium">
              Filter
            </label>
            <input
              ref={filterRef}
              id={filterId}
              type="search"
              value={query}
              onChange={(e) => {
                setQuery(e.target.value);
                setPageIndex(0);
              }}
              aria-describedby={`${filterId}-hint`}
              className="w-64 rounded-md border border-loam-200 bg-white px-3 py-1.5 text-sm dark:border-loam-800 dark:bg-loam-900"
            />
            <p id={`${filterId}-hint`} className="sr-only">
              Searches {searched.join(", ")}.
            </p>
          </div>
        )}
        {toolbar}
        {loading && (
          <p role="status" className="pb-1.5 text-sm text-loam-600 dark:text-loam-400">
            Updating…
          </p>
        )}
      </div>
      <div className={WRAP} aria-busy={loading || undefined}>
        <table className="w-full text-left text-sm">
          <caption className="sr-only">{caption}</caption>
          <thead className={THEAD}>
            <tr>
              {columns.map((c) => (
                <HeaderCell
                  key={c.id}
                  column={c}
                  sort={sort}
                  onSort={(id) => {
                    setSort(nextSort(sort, id));
                    setPageIndex(0);
                  }}
                />
              ))}
            </tr>
          </thead>
          <tbody className={TBODY}>
            {view.rows.map((row) => (
              <tr key={rowKey(row)}>
                {columns.map((c) => (
                  <td key={c.id} className={`${TD} ${c.className ?? ""}`}>
                    {c.cell ? c.cell(row) : String(c.accessor(row) ?? "—")}
                  </td>
                ))}
              </tr>
            ))}
            {view.matched === 0 && (
              <tr>
                <td colSpan={columns.length} className={`${TD} text-center text-loam-600 dark:text-loam-400`}>
                  No rows match “{query.trim()}”.{" "}
                  <Button
                    variant="ghost"
                    size="sm"
                    onClick={() => {
                      setQuery("");
                      filterRef.current?.focus();
                    }}
                  >
                    Clear filter
                  </Button>
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      <nav aria-label={`${caption} pages`} className="flex flex-wrap items-center justify-between gap-3 text-sm">
        <p aria-live="polite" className="tabular-nums text-loam-600 dark:text-loam-400">
          {describeRows(page, rows.length)}
        </p>
        {page.pageCount > 1 && (
          <div className="flex items-center gap-2">
            <button ref={prevRef} type="button" className={buttonClass("secondary", "sm")} disabled={page.pageIndex === 0} onClick={() => goTo(page.pageIndex - 1)}>
              Previous
            </button>
            <span className="tabular-nums text-loam-600 dark:text-loam-400">
              Page {page.pageIndex + 1} of {page.pageCount}
            </span>
            <button ref={nextRef} type="button" className={buttonClass("secondary", "sm")} disabled={page.pageIndex >= page.pageCount - 1} onClick={() => goTo(page.pageIndex + 1)}>
              Next
            </button>
          </div>
        )}
      </nav>
    </div>
  );
}

/** The error slot's usual content: what failed, the server's reason and a way to try again. */
export function LoadError({ title, error, onRetry, retrying = false }: { title: string; error: ApiError; onRetry: () => void; retrying?: boolean }) {
  return (
    <Notice tone="bad" title={title}>
      <p>{error.message}</p>
      <div className="mt-2 flex items-center gap-3">
        {error.status === 401 ? (
          <a href="/sign-in">Sign in</a>
        ) : (
          <Button variant="secondary" size="sm" onClick={onRetry} disabled={retrying}>
            {retrying ? "Trying again…" : "Try again"}
          </Button>
        )}
      </div>
    </Notice>
  );
}
