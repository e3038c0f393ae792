import { Navigate } from 'react-router';
import { useMe } from '../../features/auth/api/get-me.ts';
import { landingPath } from './landing.ts';

/** `/`: straight to the workspace (RequireSignedIn has already sent strangers to sign-in). */
export function HomeRedirect() {
  const me = useMe().data;
  return me ? <Navigate to={landingPath(me)} replace /> : null;
}
