import { Button } from '../../../components/ui/button';

/** Previous / next with the page number and page size, for server-paged lists. */
export function Pager({
  page,
  pageSize,
  total,
  onPage,
  onPageSize,
}: {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  onPageSize: (size: number) => void;
}) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center gap-3 text-sm">
      <Button size="sm" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Previous
      </Button>
      <span className="figure">
        page {page} of {pages}
      </span>
      <Button size="sm" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Next
      </Button>
      <label className="ml-auto flex items-center gap-2">
        Per page
        <select
          className="rounded-plate border border-line bg-surface px-2 py-1"
          value={pageSize}
          onChange={(event) => onPageSize(Number(event.target.value))}
        >
          {[12, 25, 50, 100].map((size) => (
            <option key={size} value={size}>
              {size}
            </option>
          ))}
        </select>
      </label>
    </nav>
  );
}
