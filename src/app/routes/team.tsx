import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { useMe } from '../../features/auth/api/get-me.ts';
import { useMembers } from '../../features/team/api/get-members.ts';
import { InvitationsTable } from '../../features/team/components/invitations-table.tsx';
import { InviteForm } from '../../features/team/components/invite-form.tsx';
import { MembersTable } from '../../features/team/components/members-table.tsx';
import { useWorkspace } from '../../lib/workspace-context.tsx';
import { ReleaseRule } from '../../features/workspaces/components/release-rule.tsx';

export function TeamRoute() {
  const workspace = useWorkspace();
  const me = useMe().data;
  const members = useMembers(workspace.id);
  const isAdmin = workspace.can('admin');

  return (
    <>
      <PageHeader
        title="Team"
        detail={
          isAdmin
            ? 'Invite people by e-mail, set what each person may do, and remove access.'
            : 'Who works in this workspace. Admins manage members and roles.'
        }
      />
      {isAdmin && (
        <Section title="Invite someone">
          <InviteForm workspaceId={workspace.id} />
        </Section>
      )}
      <Section title="Members">
        <QueryGuard query={members} what="members">
          {(data) => <MembersTable workspaceId={workspace.id} members={data.members} currentUserId={me?.user.id ?? ''} canManage={isAdmin} />}
        </QueryGuard>
      </Section>
      {isAdmin && (
        <Section title="Rules">
          <ReleaseRule workspaceId={workspace.id} settings={workspace.settings} />
        </Section>
      )}
      {isAdmin && members.data && members.data.invitations.length > 0 && (
        <Section title="Waiting for an answer">
          <InvitationsTable workspaceId={workspace.id} invitations={members.data.invitations} />
        </Section>
      )}
    </>
  );
}
