import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { roles, type Member, type Role } from '../../../../shared/schemas/workspace.ts';
import { DataTable } from '../../../components/ui/data-table.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { formatDate } from '../../../lib/format.ts';
import { useChangeRole, useRemoveMember } from '../api/members.ts';
import { RemoveMemberButton } from './member-row-actions.tsx';
import { roleWords, withArticle } from './role-words.ts';

const column = createColumnHelper<Member>();

function RoleSelect({ member, onChange, disabled }: { member: Member; onChange: (role: Role) => void; disabled: boolean }) {
  return (
    <select
      aria-label={`Role of ${member.name}`}
      value={member.role}
      disabled={disabled}
      onChange={(e) => onChange(e.target.value as Role)}
      className="h-7 rounded border border-rule-strong bg-paper-raised px-1.5 text-sm hover:border-ink-faint"
    >
      {roles.map((role) => (
        <option key={role} value={role} title={roleWords[role]}>
          {role}
        </option>
      ))}
    </select>
  );
}

export interface MembersTableProps {
  workspaceId: string;
  members: Member[];
  currentUserId: string;
  /** Admins get role pickers and remove buttons; everyone else a plain list. */
  canManage: boolean;
}

export function MembersTable({ workspaceId, members, currentUserId, canManage }: MembersTableProps) {
  const toast = useToast();
  const changeRole = useChangeRole(workspaceId);
  const remove = useRemoveMember(workspaceId);
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (info) => (
          <span className="font-medium">
            {info.getValue()}
            {info.row.original.userId === currentUserId && <span className="ml-1.5 text-xs font-normal text-ink-faint">(you)</span>}
          </span>
        ),
      }),
      column.accessor('email', { header: 'E-mail', cell: (info) => <span className="text-ink-soft">{info.getValue()}</span> }),
      column.accessor('role', {
        header: 'Role',
        sortingFn: (a, b) => roles.indexOf(a.original.role) - roles.indexOf(b.original.role),
        cell: (info) =>
          canManage ? (
            <RoleSelect
              member={info.row.original}
              disabled={changeRole.isPending}
              onChange={(role) =>
                changeRole.mutate(
                  { userId: info.row.original.userId, role },
                  {
                    onSuccess: (m) => toast.show(`${m.name} is now ${withArticle(m.role)}.`),
                    onError: (error) => toast.show(error.message, 'danger'),
                  },
                )
              }
            />
          ) : (
            <Tag tone={info.getValue() === 'admin' ? 'accent' : 'plain'}>{info.getValue()}</Tag>
          ),
      }),
      column.accessor('joinedAt', { header: 'Joined', cell: (info) => formatDate(info.getValue()), meta: { numeric: true } }),
      ...(canManage
        ? [
            column.display({
              id: 'actions',
              header: () => <span className="sr-only">Actions</span>,
              meta: { className: 'w-px text-right' },
              cell: (info) => (
                <RemoveMemberButton
                  member={info.row.original}
                  isSelf={info.row.original.userId === currentUserId}
                  busy={remove.isPending && remove.variables === info.row.original.userId}
                  onRemove={() =>
                    remove.mutate(info.row.original.userId, {
                      onSuccess: () => toast.show(`${info.row.original.name} no longer has access.`),
                      onError: (error) => toast.show(error.message, 'danger'),
                    })
                  }
                />
              ),
            }),
          ]
        : []),
    ],
    [canManage, currentUserId, changeRole, remove, toast],
  );

  const table = useReactTable({
    data: members,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (m) => m.userId,
  });

  return <DataTable table={table} caption="Members of this workspace" rowLabel={(m) => m.name} />;
}
