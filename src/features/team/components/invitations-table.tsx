import type { Invitation } from '../../../../shared/schemas/workspace.ts';
import { Button } from '../../../components/ui/button.tsx';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { formatDate } from '../../../lib/format.ts';
import { useRevokeInvitation } from '../api/invitations.ts';

/** Invitations sent but not yet accepted (admins only). */
export function InvitationsTable({ workspaceId, invitations }: { workspaceId: string; invitations: Invitation[] }) {
  const toast = useToast();
  const revoke = useRevokeInvitation(workspaceId);
  return (
    <Table caption="Pending invitations">
      <THead>
        <tr>
          <Th>E-mail</Th>
          <Th>Role</Th>
          <Th numeric>Sent</Th>
          <Th numeric>Link works until</Th>
          <Th className="w-px">
            <span className="sr-only">Actions</span>
          </Th>
        </tr>
      </THead>
      <TBody>
        {invitations.map((inv) => (
          <Tr key={inv.id} aria-label={inv.email}>
            <Td>{inv.email}</Td>
            <Td>
              <Tag>{inv.role}</Tag>
            </Td>
            <Td numeric>{formatDate(inv.createdAt)}</Td>
            <Td numeric>{formatDate(inv.expiresAt)}</Td>
            <Td className="text-right">
              <Button
                size="sm"
                variant="quiet"
                busy={revoke.isPending && revoke.variables === inv.id}
                onClick={() =>
                  revoke.mutate(inv.id, {
                    onSuccess: () => toast.show(`The invitation to ${inv.email} no longer works.`),
                    onError: (error) => toast.show(error.message, 'danger'),
                  })
                }
              >
                Withdraw
              </Button>
            </Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
