import { useId } from 'react';
import { inputClasses } from '../../../components/ui/field';
import type { SiteScope } from '../hooks/use-site-scope';

/** A compact "All sites / one site" choice for an admin; nothing at all in a one-site shop. */
export function SiteSwitcher({ scope }: { scope: SiteScope }) {
  const id = useId();
  if (!scope.view) return null;
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="font-medium text-maple-900">
        Site
      </label>
      <select
        id={id}
        className={`${inputClasses} max-w-56`}
        value={scope.siteId ?? ''}
        onChange={(event) => scope.setSiteId(event.target.value === '' ? undefined : Number(event.target.value))}
      >
        <option value="">All sites</option>
        {scope.view.sites.map((site) => (
          <option key={site.id} value={site.id}>
            {site.name}
          </option>
        ))}
      </select>
    </div>
  );
}
