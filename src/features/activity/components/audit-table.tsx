import type { AuditEntry } from '../../../../shared/schemas/audit.ts';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table.tsx';
import { formatDateTime } from '../../../lib/format.ts';

/** `member.role_changed` → "member · role changed": readable without inventing a wording per action. */
function actionWords(action: string): string {
  return action.replaceAll('_', ' ').split('.').join(' · ');
}

export function AuditTable({ entries }: { entries: AuditEntry[] }) {
  return (
    <Table caption="Changes made in this workspace, newest first">
      <THead>
        <tr>
          <Th className="w-44">When</Th>
          <Th className="w-40">Who</Th>
          <Th className="w-48">Change</Th>
          <Th>Details</Th>
        </tr>
      </THead>
      <TBody>
        {entries.map((e) => (
          <Tr key={e.id}>
            <Td className="figures text-xs whitespace-nowrap text-ink-soft">
              <time dateTime={e.at}>{formatDateTime(e.at)}</time>
            </Td>
            <Td className="whitespace-nowrap">{e.actor.name}</Td>
            <Td className="text-xs whitespace-nowrap text-ink-soft">{actionWords(e.action)}</Td>
            <Td>{e.summary}</Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
