import { Notice } from '../../components/ui/notice.tsx';
import { PageHeader } from '../../components/ui/page-header.tsx';
import { Loading } from '../../components/ui/spinner.tsx';
import { useOutbox } from '../../features/outbox/api/get-outbox.ts';
import { OutboxView } from '../../features/outbox/components/outbox-view.tsx';
import { PageBody } from '../layouts/app-shell.tsx';

export function OutboxRoute() {
  const outbox = useOutbox();
  let body;
  if (outbox.isPending) body = <Loading what="mail" />;
  else if (outbox.isError) {
    body =
      outbox.error.code === 'not_found' ? (
        <Notice>This server sends real e-mail, so there is no local outbox to show.</Notice>
      ) : outbox.error.code === 'forbidden' ? (
        <Notice>Only workspace admins can read the outbox.</Notice>
      ) : (
        <Notice tone="danger">{outbox.error.message}</Notice>
      );
  } else body = <OutboxView messages={outbox.data.messages} />;

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
