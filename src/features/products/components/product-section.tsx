import type { ReactNode } from 'react';

/** One titled block of the data-sheet form, laid out as a grid of fields. */
export function ProductSection({ title, description, children }: { title: string; description?: string; children: ReactNode }) {
  return (
    <fieldset className="min-w-0 rounded-panel border border-maple-300 bg-white p-4">
      <legend className="px-1 text-lg font-semibold text-lacquer-900">{title}</legend>
      {description && <p className="mb-3 text-sm text-maple-700">{description}</p>}
      <div className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3">{children}</div>
    </fieldset>
  );
}
