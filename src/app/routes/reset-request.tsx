import { Link } from 'react-router';
import { ResetRequestForm } from '../../features/auth/components/reset-request-form.tsx';
import { AuthLayout } from '../layouts/auth-layout.tsx';

export function ResetRequestRoute() {
  return (
    <AuthLayout title="Set a new password" intro="Give the e-mail address you sign in with. We will send a link to choose a new password.">
      <ResetRequestForm />
      <p className="mt-6 text-sm">
        <Link to="/signin" className="font-medium text-accent underline decoration-accent/40 underline-offset-2">
          Back to sign-in
        </Link>
      </p>
    </AuthLayout>
  );
}
