import { describe, expect, it } from "vitest";
import {
  ariaSortOf,
  compareValues,
  describeRows,
  filterRows,
  gridView,
  nextSort,
  pageWindow,
  sortRows,
  type ColumnModel,
} from "@/components/data/grid-model";
import { apiErrorFor } from "@/components/data/use-api";

type Row = { id: number; name: string; site: string | null; rev: number | null; code: string };

const rows: Row[] = [
  { id: 1, name: "Coop r10", site: "Hühnerhof", rev: 3, code: "base" },
  { id: 2, name: "coop r2", site: null, rev: null, code: "site" },
  { id: 3, name: "Barn", site: "North field", rev: 12, code: "base" },
  { id: 4, name: "Annex", site: "North field", rev: 3, code: "controller" },
];

const columns: ColumnModel<Row>[] = [
  { id: "name", accessor: (r) => r.name, filterable: true },
  { id: "site", accessor: (r) => r.site, filterable: true },
  { id: "rev", accessor: (r) => r.rev },
  { id: "layer", accessor: (r) => r.code, filterable: true, filterText: (r) => (r.code === "site" ? "Site overlay" : r.code) },
  { id: "fixed", accessor: (r) => r.name, sortable: false },
];

const ids = (list: Row[]) => list.map((r) => r.id);

describe("compareValues", () => {
  it("orders numbers numerically and text naturally, ignoring case", () => {
    expect(compareValues(9, 10)).toBeLessThan(0);
    expect(compareValues("r2", "r10")).toBeLessThan(0);
    expect(compareValues("coop", "Coop")).toBe(0);
  });

  it("puts blanks after every value", () => {
    expect(compareValues(null, 1)).toBeGreaterThan(0);
    expect(compareValues("a", undefined)).toBeLessThan(0);
    expect(compareValues("", "a")).toBeGreaterThan(0);
    expect(compareValues(null, undefined)).toBe(0);
  });

  it("puts true before false", () => {
    expect(compareValues(true, false)).toBeLessThan(0);
  });
});

describe("nextSort and ariaSortOf", () => {
  it("starts a new column ascending and flips the same column", () => {
    const first = nextSort(null, "name");
    expect(first).toEqual({ columnId: "name", direction: "asc" });
    const second = nextSort(first, "name");
    expect(second).toEqual({ columnId: "name", direction: "desc" });
    expect(nextSort(second, "name")).toEqual({ columnId: "name", direction: "asc" });
    expect(nextSort(second, "rev")).toEqual({ columnId: "rev", direction: "asc" });
  });

  it("announces only the sorted column", () => {
    const sort = { columnId: "rev", direction: "desc" } as const;
    expect(ariaSortOf(sort, "rev")).toBe("descending");
    expect(ariaSortOf({ columnId: "rev", direction: "asc" }, "rev")).toBe("ascending");
    expect(ariaSortOf(sort, "name")).toBeUndefined();
    expect(ariaSortOf(null, "name")).toBeUndefined();
  });
});

describe("sortRows", () => {
  it("keeps the incoming order without a sort and does not change its input", () => {
    const copy = [...rows];
    expect(ids(sortRows(rows, columns, null))).toEqual([1, 2, 3, 4]);
    sortRows(rows, columns, { columnId: "name", direction: "desc" });
    expect(rows).toEqual(copy);
  });

  it("sorts text naturally in both directions", () => {
    expect(ids(sortRows(rows, columns, { columnId: "name", direction: "asc" }))).toEqual([4, 3, 2, 1]);
    expect(ids(sortRows(rows, columns, { columnId: "name", direction: "desc" }))).toEqual([1, 2, 3, 4]);
  });

  it("keeps blanks last when descending too", () => {
    expect(ids(sortRows(rows, columns, { columnId: "rev", direction: "asc" }))).toEqual([1, 4, 3, 2]);
    expect(ids(sortRows(rows, columns, { columnId: "rev", direction: "desc" }))).toEqual([3, 1, 4, 2]);
  });

  it("keeps ties in their incoming order in both directions", () => {
    const desc = sortRows(rows, columns, { columnId: "site", direction: "desc" });
    expect(ids(desc)).toEqual([3, 4, 1, 2]);
  });

  it("uses a column's own comparator, reversed for descending", () => {
    const byLength: ColumnModel<Row> = { id: "len", accessor: (r) => r.name, compare: (a, b) => a.name.length - b.name.length };
    expect(ids(sortRows(rows, [byLength], { columnId: "len", direction: "asc" }))).toEqual([3, 4, 2, 1]);
    expect(ids(sortRows(rows, [byLength], { columnId: "len", direction: "desc" }))).toEqual([1, 2, 4, 3]);
  });

  it("ignores a sort on an unknown or unsortable column", () => {
    expect(ids(sortRows(rows, columns, { columnId: "nope", direction: "asc" }))).toEqual([1, 2, 3, 4]);
    expect(ids(sortRows(rows, columns, { columnId: "fixed", direction: "asc" }))).toEqual([1, 2, 3, 4]);
  });
});

describe("filterRows", () => {
  it("returns every row for an empty or blank query", () => {
    expect(ids(filterRows(rows, columns, ""))).toEqual([1, 2, 3, 4]);
    expect(ids(filterRows(rows, columns, "   "))).toEqual([1, 2, 3, 4]);
  });

  it("matches case- and accent-insensitively", () => {
    expect(ids(filterRows(rows, columns, "HUHNER"))).toEqual([1]);
    expect(ids(filterRows(rows, columns, "hühner"))).toEqual([1]);
  });

  it("requires every word, each in any filterable column", () => {
    expect(ids(filterRows(rows, columns, "north annex"))).toEqual([4]);
    expect(ids(filterRows(rows, columns, "north coop"))).toEqual([]);
  });

  it("searches a column's filter text rather than its sort value", () => {
    expect(ids(filterRows(rows, columns, "overlay"))).toEqual([2]);
  });

  it("does not search columns left out of the filter", () => {
    expect(ids(filterRows(rows, columns, "12"))).toEqual([]);
  });

  it("does not match across the boundary between two columns", () => {
    expect(ids(filterRows(rows, columns, "barnnorth"))).toEqual([]);
  });
});

describe("pageWindow and describeRows", () => {
  it("shows rows 1–25 of 132 on the first page", () => {
    const w = pageWindow(132, 0, 25);
    expect(w).toEqual({ pageIndex: 0, pageCount: 6, start: 0, end: 25, total: 132 });
    expect(describeRows(w)).toBe("Rows 1–25 of 132");
  });

  it("shows a short last page", () => {
    const w = pageWindow(132, 5, 25);
    expect(w.start).toBe(125);
    expect(w.end).toBe(132);
    expect(describeRows(w)).toBe("Rows 126–132 of 132");
  });

  it("clamps a page beyond the end to the last page and a negative one to the first", () => {
    expect(pageWindow(30, 9, 25).pageIndex).toBe(1);
    expect(pageWindow(30, -3, 25).pageIndex).toBe(0);
  });

  it("has one empty page when there are no rows", () => {
    const w = pageWindow(0, 2, 25);
    expect(w).toEqual({ pageIndex: 0, pageCount: 1, start: 0, end: 0, total: 0 });
    expect(describeRows(w)).toBe("No rows");
  });

  it("notes how many rows the filter hides", () => {
    expect(describeRows(pageWindow(40, 1, 25), 132)).toBe("Rows 26–40 of 40 (filtered from 132)");
    expect(describeRows(pageWindow(0, 0, 25), 132)).toBe("No rows (filtered from 132)");
  });

  it("pages in 25s by default", () => {
    expect(pageWindow(26, 0).end).toBe(25);
  });
});

describe("gridView", () => {
  const many: Row[] = Array.from({ length: 60 }, (_, i) => ({ id: i + 1, name: `Door ${i + 1}`, site: i % 2 ? "East" : "West", rev: i, code: "base" }));

  it("filters before sorting and paging", () => {
    const view = gridView(many, columns, { query: "east", sort: { columnId: "rev", direction: "desc" }, pageIndex: 1, pageSize: 25 });
    expect(view.matched).toBe(30);
    expect(view.window.start).toBe(25);
    expect(ids(view.rows)).toEqual([10, 8, 6, 4, 2]);
  });

  it("clamps a stale page after the rows shrink", () => {
    const view = gridView(many.slice(0, 10), columns, { query: "", sort: null, pageIndex: 2, pageSize: 25 });
    expect(view.window.pageIndex).toBe(0);
    expect(view.rows).toHaveLength(10);
  });
});

describe("apiErrorFor", () => {
  it("uses the server's message for a known error", () => {
    const err = apiErrorFor(400, { error: "invalid_request", message: "actor: must be an e-mail address" });
    expect(err.status).toBe(400);
    expect(err.code).toBe("invalid_request");
    expect(err.message).toBe("actor: must be an e-mail address");
  });

  it("asks the person to sign in again after the session ends", () => {
    expect(apiErrorFor(401, { error: "unauthenticated", message: "Sign in first." }).message).toMatch(/sign in again/i);
  });

  it("falls back to a busy message or the status when the body says nothing", () => {
    expect(apiErrorFor(503, null).message).toMatch(/busy/);
    expect(apiErrorFor(502, "<html>").message).toBe("The server answered with status 502.");
    expect(apiErrorFor(502, "<html>").code).toBe("http_502");
  });
});
