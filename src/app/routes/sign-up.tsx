import { useState } from 'react';
import { Link, Navigate } from 'react-router';
import type { SignUpAnswer } from '../../../shared/schemas/account.ts';
import { Notice } from '../../components/ui/notice.tsx';
import { useConfig } from '../../features/auth/api/get-config.ts';
import { useMe } from '../../features/auth/api/get-me.ts';
import { SignUpForm } from '../../features/auth/components/sign-up-form.tsx';
import { AuthLayout } from '../layouts/auth-layout.tsx';
import { landingPath } from './landing.ts';

const linkClass = 'font-medium text-accent underline decoration-accent/40 underline-offset-2';

export function SignUpRoute() {
  const me = useMe();
  const config = useConfig();
  const [sent, setSent] = useState<SignUpAnswer | null>(null);
  if (me.data) return <Navigate to={landingPath(me.data)} replace />;
  if (config.data && !config.data.signUpOpen) {
    return (
      <AuthLayout title="Sign-up is closed" intro="Accounts on this server come by invitation from a workspace administrator.">
        <Link to="/signin" className={linkClass}>
          Sign in
        </Link>
      </AuthLayout>
    );
  }
  if (sent) {
    return (
      <AuthLayout title="Check your mail" intro={sent.message}>
        <Notice title="The link works for 24 hours">
          It confirms that the address is yours and signs you in. Until then your account cannot join other teams’ workspaces.
          {config.data?.demoMode && (
            <>
              {' '}
              On this demo server mail stays on the server: <Link to="/signin" className={linkClass}>sign in</Link> with your new password and open the Outbox to read it.
            </>
          )}
        </Notice>
      </AuthLayout>
    );
  }
  return (
    <AuthLayout
      title="Create an account"
      intro={
        <>
          You get a workspace of your own and can invite your team to it. Already have an account?{' '}
          <Link to="/signin" className={linkClass}>
            Sign in
          </Link>
          .
        </>
      }
    >
      <SignUpForm onSignedUp={setSent} />
    </AuthLayout>
  );
}
