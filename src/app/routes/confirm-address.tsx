import { Link, useNavigate, useParams } from 'react-router';
import { Button } from '../../components/ui/button.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { useConfirmAddress } from '../../features/auth/api/confirm-address.ts';
import { AuthLayout } from '../layouts/auth-layout.tsx';
import { landingPath } from './landing.ts';

/** The page a confirmation mail links to. Confirming is a click, so a mail scanner opening the link changes nothing. */
export function ConfirmAddressRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const confirm = useConfirmAddress();
  return (
    <AuthLayout title="Confirm your address" intro="One click proves the address is yours and signs you in.">
      {confirm.isError ? (
        <Notice tone="signal" title="This link no longer works">
          {confirm.error.message}{' '}
          <Link to="/signin" className="font-medium underline underline-offset-2">
            Sign in
          </Link>{' '}
          and ask for a new one on your account page.
        </Notice>
      ) : (
        <Button variant="primary" busy={confirm.isPending} onClick={() => confirm.mutate(token, { onSuccess: (me) => navigate(landingPath(me), { replace: true }) })}>
          Confirm and sign in
        </Button>
      )}
    </AuthLayout>
  );
}
