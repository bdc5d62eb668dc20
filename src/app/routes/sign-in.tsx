import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { sessionQueryOptions } from '@/lib/auth';
import { safeNext } from '@/lib/route-guards';

/** /sign-in: already signed in goes straight on. */
export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const session = await queryClient.fetchQuery(sessionQueryOptions());
    if (session.user) throw redirect(safeNext(new URL(request.url).searchParams.get('next')));
    return null;
  };

export function SignInRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = params.get('next');
  return (
    <AuthLayout title="Sign in">
      {next && <p className="mb-4 text-sm text-dusk-300">Sign in to carry on where you were.</p>}
      <SignInForm onSignedIn={() => navigate(safeNext(next), { replace: true })} />
    </AuthLayout>
  );
}
