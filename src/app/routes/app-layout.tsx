import { useIsMutating } from '@tanstack/react-query';
import { Navigate, Outlet, useLocation, useNavigation } from 'react-router-dom';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/spinner';
import { authKeys } from '../../features/auth/api/auth-keys';
import { useMe } from '../../features/auth/api/get-me';
import { SessionProvider } from '../../features/auth/components/session';
import { signInPath } from '../../lib/return-path';
import { ServiceNotice } from '../layout/service-notice';
import { TopBar } from '../layout/top-bar';

// The route loader has already checked the session; this guard catches it ending later
// (expired, or signed out in another tab) and sends the person to sign in, then back here.
export function AppLayout() {
  const me = useMe();
  const location = useLocation();
  const navigation = useNavigation();
  // A deliberate sign-out clears the session and then navigates to /sign-in itself; while
  // either is under way this layout must not add its own redirect with a return path.
  const signingOut = useIsMutating({ mutationKey: authKeys.signOut() }) > 0 || navigation.state !== 'idle';

  if (!me.data) {
    if (signingOut || me.isPending) {
      return <LoadingState label={signingOut ? 'Signing you out…' : 'Loading…'} className="justify-center" />;
    }
    if (me.isError) {
      return (
        <main id="main" className="mx-auto max-w-xl px-4 py-16">
          <ErrorState error={me.error} title="Motifold could not check who you are" onRetry={() => void me.refetch()} />
        </main>
      );
    }
    return <Navigate to={signInPath(location.pathname + location.search)} replace />;
  }

  return (
    <SessionProvider me={me.data}>
      <div className="flex min-h-screen flex-col">
        <TopBar />
        <ServiceNotice />
        <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6 sm:py-10">
          <Outlet />
        </main>
      </div>
    </SessionProvider>
  );
}
