import { Button } from './button';

interface PaginationProps {
  page: number;
  pageSize: number;
  total: number;
  noun: string;
  onPage: (page: number) => void;
}

export function Pagination({ page, pageSize, total, noun, onPage }: PaginationProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label={`Pages of ${noun}`} className="mt-3 flex flex-wrap items-center justify-between gap-3">
      <p className="text-maple-700">
        {first}–{last} of {total} {noun}
      </p>
      {pages > 1 && (
        <div className="flex gap-2">
          <Button variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
            Previous page
          </Button>
          <Button variant="secondary" disabled={page >= pages} onClick={() => onPage(page + 1)}>
            Next page
          </Button>
        </div>
      )}
    </nav>
  );
}
