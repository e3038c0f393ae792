import { Notice } from '../../components/ui/notice.tsx';
import { PageHeader } from '../../components/ui/page-header.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { useOutbox } from '../../features/outbox/api/get-outbox.ts';
import { OutboxView } from '../../features/outbox/components/outbox-view.tsx';
import { PageBody } from '../layouts/app-shell.tsx';

export function OutboxRoute() {
  const outbox = useOutbox();
  const body = (
    <QueryGuard
      query={outbox}
      what="mail"
      notFound={<Notice>This server sends real e-mail, so there is no local outbox to show.</Notice>}
      byCode={{ forbidden: <Notice>Only workspace admins can read the outbox.</Notice> }}
    >
      {(data) => <OutboxView messages={data.messages} />}
    </QueryGuard>
  );

  return (
    <PageBody>
      <PageHeader
        eyebrow="Demo and development"
        title="Outbox"
        detail="Mail this server has sent, caught before it leaves the machine. Follow an invitation or reset link from here."
      />
      {body}
    </PageBody>
  );
}
