import { pageCount } from "@/lib/client/data/list-query";

export interface PagerProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  what: string;
}

export function Pager({ page, pageSize, total, onPage, what }: PagerProps) {
  const pages = pageCount(total, pageSize);
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label={`Pages of ${what}`} className="flex items-center gap-3 text-sm">
      <span className="text-ink-soft">
        {first}–{last} of {total} {what}
      </span>
      <button
        type="button"
        disabled={page <= 1}
        onClick={() => onPage(page - 1)}
        className="rounded-md border border-glaze-line bg-white px-2 py-1 disabled:opacity-50"
      >
        Previous
      </button>
      <span className="text-ink-faint">
        page {page} of {pages}
      </span>
      <button
        type="button"
        disabled={page >= pages}
        onClick={() => onPage(page + 1)}
        className="rounded-md border border-glaze-line bg-white px-2 py-1 disabled:opacity-50"
      >
        Next
      </button>
    </nav>
  );
}
