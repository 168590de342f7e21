import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { useMe } from '../../api/auth/get-me';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { safeNextPath } from '../../lib/safe-next-path';
import { usePageTitle } from '../../lib/use-page-title';
import { Wordmark } from '../wordmark';

export function SignInRoute() {
  usePageTitle('Sign in');
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  const navigate = useNavigate();
  const me = useMe();

  if (me.data) return <Navigate to={next} replace />;

  return (
    <div className="grid min-h-dvh place-items-center bg-lacquer-800 px-4 py-10">
      <main className="w-full max-w-md">
        <div className="mb-6 flex justify-center">
          <Wordmark />
        </div>
        <div className="rounded-panel bg-maple-50 p-6 shadow-xl sm:p-8">
          <h1 className="text-2xl font-bold text-lacquer-900">Sign in</h1>
          <p className="mb-5 mt-1 text-maple-700">Booth plans, coat records and drying times for the shop.</p>
          <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
        </div>
        <p className="mt-4 text-center text-sm text-lacquer-100">Forgotten your password? Ask the owner to reset it.</p>
      </main>
    </div>
  );
}
