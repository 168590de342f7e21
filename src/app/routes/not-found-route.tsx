import { Link, useLocation } from 'react-router-dom';
import { buttonClasses } from '../../components/ui/button';
import { usePageTitle } from '../../lib/use-page-title';

export function NotFoundRoute() {
  const { pathname } = useLocation();
  usePageTitle('Page not found');
  return (
    <div className="max-w-xl">
      <p className="font-semibold text-lacquer-700">404</p>
      <h1 className="text-3xl font-bold text-lacquer-900">No page here</h1>
      <p className="mt-2">
        Boothwright has no page at <code className="rounded bg-maple-200 px-1">{pathname}</code>. It may be a part that is not built yet, or the
        address may be mistyped.
      </p>
      <Link to="/" className={buttonClasses('primary', 'mt-5')}>
        Go to Today
      </Link>
    </div>
  );
}
