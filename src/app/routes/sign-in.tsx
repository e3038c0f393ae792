import { useState } from 'react';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router';
import type { Me } from '../../../shared/schemas/account.ts';
import { useConfig } from '../../features/auth/api/get-config.ts';
import { useMe } from '../../features/auth/api/get-me.ts';
import { DemoUsers } from '../../features/auth/components/demo-users.tsx';
import { SignInForm } from '../../features/auth/components/sign-in-form.tsx';
import { AuthLayout } from '../layouts/auth-layout.tsx';
import { landingPath, safeNext } from './landing.ts';

const linkClass = 'font-medium text-accent underline decoration-accent/40 underline-offset-2 hover:decoration-accent';

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const config = useConfig();
  const [fill, setFill] = useState<{ email: string; password: string }>();
  const next = safeNext(params.get('next'));

  if (me.data) return <Navigate to={next ?? landingPath(me.data)} replace />;

  const onSignedIn = (signedIn: Me) => navigate(next ?? landingPath(signedIn), { replace: true });

  return (
    <AuthLayout
      title="Sign in"
      intro={
        config.data?.signUpOpen ? (
          <>
            New here? <Link to="/signup" className={linkClass}>Create an account</Link> and a workspace for your team.
          </>
        ) : (
          'New here? Ask a workspace administrator to invite you.'
        )
      }
      aside={config.data?.demoMode ? <DemoUsers users={config.data.demoUsers} onPick={(u) => setFill({ email: u.email, password: u.password })} /> : null}
    >
      <SignInForm onSignedIn={onSignedIn} fill={fill} />
      <p className="mt-4 text-sm">
        <Link to="/reset" className={linkClass}>
          Forgot your password?
        </Link>
      </p>
    </AuthLayout>
  );
}
