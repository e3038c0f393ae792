import { Link, useNavigate, useParams } from 'react-router';
import type { Me } from '../../../shared/schemas/account.ts';
import { Button } from '../../components/ui/button.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { Loading } from '../../components/ui/spinner.tsx';
import { useMe } from '../../features/auth/api/get-me.ts';
import { useInvitation } from '../../features/auth/api/invitation.ts';
import { useSignOut } from '../../features/auth/api/sign-out.ts';
import { AcceptAsNewAccount, AcceptAsSignedIn } from '../../features/auth/components/accept-invitation-form.tsx';
import { withArticle } from '../../features/team/components/role-words.ts';
import { AuthLayout } from '../layouts/auth-layout.tsx';
import { landingPath } from './landing.ts';

const linkClass = 'font-medium text-accent underline decoration-accent/40 underline-offset-2 hover:decoration-accent';

export function AcceptInviteRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const invitation = useInvitation(token);
  const me = useMe();
  const signOut = useSignOut();

  if (invitation.isPending || me.isPending) {
    return (
      <AuthLayout title="Invitation">
        <Loading what="the invitation" />
      </AuthLayout>
    );
  }
  if (invitation.isError) {
    const dead = invitation.error.code === 'gone' || invitation.error.code === 'not_found';
    return (
      <AuthLayout title="Invitation">
        <Notice tone="signal" title={dead ? 'This invitation no longer works' : 'The invitation did not load'}>
          {dead ? 'It has been used, withdrawn, or it expired (links work for 7 days). Ask the workspace admin to send a new one.' : invitation.error.message}
        </Notice>
      </AuthLayout>
    );
  }

  const inv = invitation.data;
  const signedInAs = me.data?.user.email;
  const onAccepted = (joined: Me) => {
    const target = joined.memberships.find((m) => m.workspaceName === inv.workspaceName);
    navigate(target ? `/w/${target.workspaceId}` : landingPath(joined), { replace: true });
  };

  // The page never learns whether the address has an account: signed out, it offers both ways in.
  const signInLink = (
    <Link to={`/signin?next=${encodeURIComponent(`/invite/${token}`)}`} className={linkClass}>
      Sign in to accept
    </Link>
  );
  let body;
  if (signedInAs === inv.email) {
    body = <AcceptAsSignedIn token={token} onAccepted={onAccepted} />;
  } else if (signedInAs) {
    body = (
      <>
        <Notice tone="signal" title={`This invitation is for ${inv.email}`} className="mb-4">
          <p>You are signed in as {signedInAs}. Sign out, then sign in as {inv.email} to accept — or create a new account for {inv.email} below, which signs you in as it.</p>
          <Button size="sm" className="mt-2" busy={signOut.isPending} onClick={() => signOut.mutate()}>
            Sign out
          </Button>
        </Notice>
        <AcceptAsNewAccount token={token} email={inv.email} onAccepted={onAccepted} />
      </>
    );
  } else {
    body = (
      <>
        <p className="mb-4 text-sm">
          Already have a Ridewright account for this address? {signInLink}. Otherwise create your account:
        </p>
        <AcceptAsNewAccount token={token} email={inv.email} onAccepted={onAccepted} />
      </>
    );
  }

  return (
    <AuthLayout
      title={`Join ${inv.workspaceName}`}
      intro={
        <>
          {inv.invitedBy} invited <strong className="text-ink">{inv.email}</strong> to this workspace as <strong className="text-ink">{withArticle(inv.role)}</strong>.
        </>
      }
    >
      {body}
    </AuthLayout>
  );
}
