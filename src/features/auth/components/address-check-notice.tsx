import { Button } from '../../../components/ui/button.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { useResendAddressCheck } from '../api/confirm-address.ts';

/** Shown until the account's address is confirmed; sends the confirmation link again. */
export function AddressCheckNotice({ email, className = '' }: { email: string; className?: string }) {
  const resend = useResendAddressCheck();
  return (
    <Notice tone="signal" title="Your address is not confirmed yet" className={className}>
      Open the link we mailed to {email}. Until then you cannot join other teams’ workspaces.{' '}
      {resend.isSuccess ? (
        <span>A new link is on its way.</span>
      ) : (
        <Button variant="secondary" busy={resend.isPending} onClick={() => resend.mutate()}>
          Send the link again
        </Button>
      )}
      {resend.isError && <p className="mt-1">{resend.error.message}</p>}
    </Notice>
  );
}
