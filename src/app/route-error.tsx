import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { buttonClasses } from '../components/ui/button';
import { isApiError } from '../lib/api-client';
import { errorMessage } from '../lib/error-messages';

function describe(error: unknown): { title: string; detail: string } {
  if (isRouteErrorResponse(error)) {
    if (error.status === 404) return { title: 'Page not found', detail: 'There is no page at this address.' };
    return { title: `Something went wrong (${error.status})`, detail: error.statusText || 'The page could not be shown.' };
  }
  if (isApiError(error)) return { title: 'Could not load this page', detail: errorMessage(error) };
  if (error instanceof TypeError && /dynamically imported module|Importing a module script/i.test(error.message)) {
    return { title: 'Boothwright has been updated', detail: 'Reload the page to get the new version.' };
  }
  return { title: 'Something went wrong', detail: 'This page hit a problem it could not recover from. Reloading usually helps.' };
}

/** The error element of every route: says what happened in plain words and offers a way on. */
export function RouteError() {
  const error = useRouteError();
  const { title, detail } = describe(error);
  if (import.meta.env.DEV) console.error(error);
  return (
    <div role="alert" className="mx-auto my-10 max-w-xl rounded-panel border-2 border-verdict-stop bg-white p-6">
      <h1 className="text-2xl font-bold text-maple-900">{title}</h1>
      <p className="mt-2">{detail}</p>
      <div className="mt-5 flex flex-wrap gap-3">
        <button type="button" className={buttonClasses('primary')} onClick={() => window.location.reload()}>
          Reload the page
        </button>
        <Link to="/" className={buttonClasses('secondary')} reloadDocument>
          Go to Today
        </Link>
      </div>
    </div>
  );
}
