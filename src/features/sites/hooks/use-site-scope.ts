import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useSites } from '../../../api/sites/get-sites';
import { siteFilterFrom, siteViewFor, type SiteView, type SiteViewer } from '../utils/site-view';

export interface SiteScope {
  /** Null for a one-site shop and for everyone but an admin: nothing about sites is shown. */
  view: SiteView | null;
  /** The one site an admin is looking at, or undefined for every site. */
  siteId: number | undefined;
  setSiteId: (siteId: number | undefined) => void;
}

/** The admin's choice of site lives in the address (`?site=`), so a reload or a shared link keeps it. */
export function useSiteScope(viewer: SiteViewer): SiteScope {
  const sites = useSites();
  const [params, setParams] = useSearchParams();
  const raw = params.get('site');
  const { role, siteId: homeSiteId } = viewer;
  const [view, siteId] = useMemo(() => {
    const items = sites.data?.items;
    const chosen = siteFilterFrom(raw, siteViewFor({ role, siteId: homeSiteId }, items));
    return [siteViewFor({ role, siteId: homeSiteId }, items, chosen), chosen] as const;
  }, [sites.data, raw, role, homeSiteId]);
  const setSiteId = useCallback(
    (next: number | undefined) =>
      setParams(
        (current) => {
          const params = new URLSearchParams(current);
          if (next === undefined) params.delete('site');
          else params.set('site', String(next));
          return params;
        },
        { replace: true },
      ),
    [setParams],
  );
  return { view, siteId, setSiteId };
}
