import { Link, Navigate, useNavigate } from 'react-router';
import { useMe } from '../../features/auth/api/get-me.ts';
import { SignUpForm } from '../../features/auth/components/sign-up-form.tsx';
import { AuthLayout } from '../layouts/auth-layout.tsx';
import { landingPath } from './landing.ts';

export function SignUpRoute() {
  const me = useMe();
  const navigate = useNavigate();
  if (me.data) return <Navigate to={landingPath(me.data)} replace />;
  return (
    <AuthLayout
      title="Create an account"
      intro={
        <>
          You get a workspace of your own and can invite your team to it. Already have an account?{' '}
          <Link to="/signin" className="font-medium text-accent underline decoration-accent/40 underline-offset-2">
            Sign in
          </Link>
          .
        </>
      }
    >
      <SignUpForm onSignedUp={(created) => navigate(landingPath(created), { replace: true })} />
    </AuthLayout>
  );
}
