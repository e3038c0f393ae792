import { useState } from 'react';
import type { Member } from '../../../../shared/schemas/workspace.ts';
import { Button } from '../../../components/ui/button.tsx';

/** Remove, with the confirmation in place of the button rather than in a dialog. */
export function RemoveMemberButton({ member, isSelf, busy, onRemove }: { member: Member; isSelf: boolean; busy: boolean; onRemove: () => void }) {
  const [confirming, setConfirming] = useState(false);
  if (!confirming) {
    return (
      <Button size="sm" variant="quiet" onClick={() => setConfirming(true)} aria-label={`Remove ${member.name}`}>
        Remove
      </Button>
    );
  }
  return (
    <span className="inline-flex items-center gap-1.5">
      <span className="text-xs text-ink-soft">{isSelf ? 'Leave this workspace?' : `Remove ${member.name.split(' ')[0]}?`}</span>
      <Button size="sm" variant="danger" busy={busy} onClick={onRemove}>
        {isSelf ? 'Leave' : 'Remove'}
      </Button>
      <Button size="sm" variant="quiet" onClick={() => setConfirming(false)}>
        Keep
      </Button>
    </span>
  );
}
