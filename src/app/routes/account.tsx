import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { Tag } from '../../components/ui/tag.tsx';
import { useToast } from '../../components/ui/toast.tsx';
import { useMe } from '../../features/auth/api/get-me.ts';
import { AddressCheckNotice } from '../../features/auth/components/address-check-notice.tsx';
import { ChangePasswordForm } from '../../features/auth/components/change-password-form.tsx';
import { ApiTokensSection } from '../../features/api-tokens/components/api-tokens-section.tsx';
import { UnitPreferencesForm } from '../../features/auth/components/unit-preferences-form.tsx';
import { PageBody } from '../layouts/app-shell.tsx';
import { Link } from 'react-router';

export function AccountRoute() {
  const me = useMe().data;
  const toast = useToast();
  if (!me) return null;

  return (
    <PageBody>
      <PageHeader title="Your account" detail={`${me.user.name} · ${me.user.email}`} />
      {!me.user.emailVerified && <AddressCheckNotice email={me.user.email} className="mb-6" />}
      <Section title="Workspaces">
        {me.memberships.length === 0 ? (
          <Notice>You are not a member of any workspace. Ask a workspace admin to invite you.</Notice>
        ) : (
          <ul className="divide-y divide-rule rounded border border-rule bg-paper-raised">
            {me.memberships.map((m) => (
              <li key={m.workspaceId} className="flex items-center justify-between gap-3 px-3 py-2">
                <Link to={`/w/${m.workspaceId}`} className="font-medium text-accent hover:underline">
                  {m.workspaceName}
                </Link>
                <Tag tone={m.role === 'admin' ? 'accent' : 'plain'}>{m.role}</Tag>
              </li>
            ))}
          </ul>
        )}
      </Section>
      <Section title="Units">
        <UnitPreferencesForm units={me.units} />
      </Section>
      <Section title="Password">
        <ChangePasswordForm onChanged={() => toast.show('Password changed. Other browsers have been signed out.')} />
      </Section>
      <Section title="API tokens">
        <ApiTokensSection memberships={me.memberships} />
      </Section>
    </PageBody>
  );
}
