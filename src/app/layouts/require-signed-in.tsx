import { Navigate, Outlet, useLocation } from 'react-router';
import { Loading } from '../../components/ui/spinner.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { useMe } from '../../features/auth/api/get-me.ts';
import { UnitsProvider } from '../../lib/units/use-units.tsx';

/** Everything below needs a session; without one, go to sign-in and come back afterwards. */
export function RequireSignedIn() {
  const me = useMe();
  const location = useLocation();

  if (me.isPending) {
    return (
      <div className="p-8">
        <Loading what="your session" />
      </div>
    );
  }
  if (me.isError) {
    return (
      <div className="p-8">
        <Notice tone="danger" title="Ridewright cannot check who you are">
          {me.error.message}
        </Notice>
      </div>
    );
  }
  if (!me.data) {
    const next = location.pathname + location.search;
    return <Navigate to={next === '/' ? '/signin' : `/signin?next=${encodeURIComponent(next)}`} replace />;
  }
  return (
    <UnitsProvider prefs={me.data.units}>
      <Outlet />
    </UnitsProvider>
  );
}
