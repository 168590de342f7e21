import type { ReactNode } from 'react';

interface BoardSectionProps {
  id: string;
  title: string;
  /** How many things are listed; shown beside the title so a glance at the headings is enough. */
  count?: number;
  /** Said instead of a list when there is nothing: a quiet day is normal. */
  quiet: string;
  children: ReactNode;
  action?: ReactNode;
}

/** One part of the day's board: a heading with a count, and its list or a calm sentence. */
export function BoardSection({ id, title, count, quiet, children, action }: BoardSectionProps) {
  return (
    <section aria-labelledby={id} className="rounded-panel border border-maple-300 bg-white p-4 shadow-sm">
      <div className="mb-2 flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={id} className="text-lg font-semibold text-lacquer-900">
          {title}
          {count !== undefined && count > 0 && <span className="ml-2 rounded-full bg-lacquer-100 px-2 py-0.5 text-sm font-bold text-lacquer-900">{count}</span>}
        </h2>
        {action}
      </div>
      {count === 0 ? <p className="text-maple-700">{quiet}</p> : children}
    </section>
  );
}
