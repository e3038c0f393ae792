import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { Notice } from '../../components/ui/notice.tsx';
import { useToast } from '../../components/ui/toast.tsx';
import { ResetConfirmForm } from '../../features/auth/components/reset-confirm-form.tsx';
import { AuthLayout } from '../layouts/auth-layout.tsx';

export function ResetConfirmRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const toast = useToast();
  const [dead, setDead] = useState(false);

  return (
    <AuthLayout title="Choose a new password" intro="After this, sign in with the new password. Browsers still signed in with the old one are signed out.">
      {dead ? (
        <Notice tone="signal" title="This link no longer works">
          Reset links work once and for 30 minutes.{' '}
          <Link to="/reset" className="font-medium underline underline-offset-2">
            Ask for a new one
          </Link>
          .
        </Notice>
      ) : (
        <ResetConfirmForm
          token={token}
          onLinkDead={() => setDead(true)}
          onDone={() => {
            toast.show('Password changed. Sign in with the new one.');
            navigate('/signin', { replace: true });
          }}
        />
      )}
    </AuthLayout>
  );
}
