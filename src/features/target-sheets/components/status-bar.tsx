import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import type { TargetSheet } from '../../../../shared/schemas/target-sheet.ts';
import { hasRole, type Role } from '../../../../shared/schemas/workspace.ts';
import { sheetCautions } from '../../../../shared/target-sheet/cautions.ts';
import { allowedTransitions, canSupersede } from '../../../../shared/target-sheet/lifecycle.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Select, Textarea } from '../../../components/ui/field.tsx';
import { Caution, Notice } from '../../../components/ui/notice.tsx';
import { latestRevisionsQueryOptions } from '../../../lib/queries/revisions.ts';
import { useDeleteSheet } from '../api/delete-sheet.ts';
import { type SheetStep, useMoveSheet } from '../api/move-sheet.ts';
import { useSupersedeSheet } from '../api/supersede-sheet.ts';
import { StatusTag } from './status-tag.tsx';

type Panel = 'release' | 'return' | 'delete' | 'replace' | null;

const waiting: Partial<Record<TargetSheet['status'], string>> = {
  draft: 'Being drafted. Submit it when the targets are ready for a lead to review.',
  in_review: 'Waiting for a lead to release it or send it back.',
  released: 'Released: final, and the sheet in force for this setup. A change needs a replacement, which supersedes this one when it is released.',
  returned: 'Sent back. Edit the targets (saving reopens it as a draft) or reopen it as it is.',
};

/**
 * The sheet's state and the steps the signed-in role may take from it (the server refuses the
 * others anyway). Release and send-back open in place: release with its caution, send-back
 * with a reason.
 */
export function StatusBar({
  sheet,
  replaces,
  workspaceId,
  role,
  secondPerson,
}: {
  sheet: TargetSheet;
  /** The released sheet that releasing this one supersedes, if any. */
  replaces: TargetSheet | null;
  workspaceId: string;
  role: Role;
  /** Set when the workspace asks for a second person at release: who is looking. */
  secondPerson: { userId: string } | null;
}) {
  const navigate = useNavigate();
  const move = useMoveSheet(workspaceId, sheet.id);
  const supersede = useSupersedeSheet(workspaceId, sheet.id);
  const remove = useDeleteSheet(workspaceId, sheet.id);
  const [panel, setPanel] = useState<Panel>(null);
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string>();
  const [comment, setComment] = useState('');
  const revisions = useQuery(latestRevisionsQueryOptions(workspaceId, panel === 'replace' ? sheet.setupId : undefined));
  const [fromRevision, setFromRevision] = useState<number | null>(null);
  const [outcome, setOutcome] = useState<{ notice: string | null; notified: number; step: SheetStep } | null>(null);

  const steps = allowedTransitions(sheet.status, role).map((t) => t.action);
  const run = (step: SheetStep, why?: string) =>
    move.mutate(
      { step, reason: why },
      {
        onSuccess: (r) => {
          setPanel(null);
          setReason('');
          setComment('');
          setOutcome({ notice: r.notice, notified: r.notified, step });
        },
      },
    );
  const error = move.error ?? supersede.error ?? remove.error;

  return (
    <section aria-label="Status and actions" className="mb-6 rounded border border-rule bg-paper-raised px-4 py-3">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
        <StatusTag status={sheet.status} />
        <p className="min-w-0 flex-1 text-sm text-ink-soft">{waiting[sheet.status]}</p>
        <div className="flex flex-wrap gap-2">
          {steps.includes('submit') && (
            <Button variant="primary" size="sm" busy={move.isPending} onClick={() => run('submit')}>
              Submit for review
            </Button>
          )}
          {steps.includes('release') && (
            <Button variant="primary" size="sm" onClick={() => setPanel(panel === 'release' ? null : 'release')} aria-expanded={panel === 'release'}>
              Release…
            </Button>
          )}
          {steps.includes('return') && (
            <Button size="sm" onClick={() => setPanel(panel === 'return' ? null : 'return')} aria-expanded={panel === 'return'}>
              Send back…
            </Button>
          )}
          {steps.includes('reopen') && (
            <Button size="sm" busy={move.isPending} onClick={() => run('reopen')}>
              Reopen as draft
            </Button>
          )}
          {canSupersede(sheet) && hasRole(role, 'engineer') && (
            <Button size="sm" onClick={() => setPanel(panel === 'replace' ? null : 'replace')} aria-expanded={panel === 'replace'}>
              Draft a replacement…
            </Button>
          )}
          {(sheet.status === 'draft' || sheet.status === 'returned') && hasRole(role, 'engineer') && (
            <Button variant="quiet" size="sm" onClick={() => setPanel(panel === 'delete' ? null : 'delete')} aria-expanded={panel === 'delete'}>
              Delete draft…
            </Button>
          )}
        </div>
      </div>

      {sheet.status === 'returned' && sheet.returnReason && (
        <Notice tone="signal" title="Why it was sent back" className="mt-3">
          {sheet.returnReason}
        </Notice>
      )}

      {panel === 'replace' && (
        <form
          className="mt-3 space-y-2 border-t border-rule pt-3"
          aria-label="Draft a replacement"
          onSubmit={(e) => {
            e.preventDefault();
            const latest = revisions.data?.revisions[0]?.number;
            const revision = fromRevision ?? latest;
            supersede.mutate(revision === undefined ? {} : { revision }, { onSuccess: (d) => navigate(`/w/${workspaceId}/sheets/${d.sheet.id}`) });
          }}
        >
          <p className="text-sm text-ink-soft">
            The replacement is a new draft with this sheet's speeds and bands, its targets read from the revision you pick. {sheet.number} stays released and in force until the
            replacement is released.
          </p>
          <Field label={`Targets from revision of ${sheet.setupName}`}>
            <Select
              className="max-w-xl text-sm"
              value={fromRevision ?? revisions.data?.revisions[0]?.number ?? ''}
              disabled={!revisions.data}
              onChange={(e) => setFromRevision(Number(e.target.value))}
            >
              {revisions.data?.revisions.map((r, i) => (
                <option key={r.id} value={r.number}>
                  r{r.number}
                  {i === 0 ? ' (latest)' : ''}
                  {r.number === sheet.setupRevision ? ' (this sheet’s; targets copied as they stand)' : ''} — {r.message}
                </option>
              ))}
            </Select>
          </Field>
          <div className="flex gap-2">
            <Button type="submit" variant="primary" size="sm" busy={supersede.isPending} disabled={!revisions.data}>
              Draft the replacement
            </Button>
            <Button variant="quiet" size="sm" onClick={() => setPanel(null)}>
              Not now
            </Button>
          </div>
        </form>
      )}

      {panel === 'release' && (
        <div className="mt-3 border-t border-rule pt-3" role="group" aria-label="Release this sheet">
          <Caution className="mb-2 text-sm">{sheetCautions.release}</Caution>
          {replaces && (
            <p className="mb-2 text-sm font-semibold text-ink">
              Releasing supersedes {replaces.number}, the sheet in force for this setup: suppliers build to {sheet.number} from then on. The difference is shown under
              “Against the sheet in force” below.
            </p>
          )}
          {secondPerson && (
            <p className="mb-2 text-sm text-ink-soft">
              This workspace asks for a second person: a lead who did not write or submit the sheet releases it
              {sheet.author.id === secondPerson.userId ? ' — you wrote this one, so another lead releases it.' : '.'}
            </p>
          )}
          <p className="mb-2 text-sm text-ink-soft">The author is e-mailed. A released sheet cannot be edited; changes need a new sheet that supersedes it.</p>
          <Field label="Release comment (kept with the sheet, its history and the activity log)">
            <Textarea rows={2} maxLength={2000} value={comment} onChange={(e) => setComment(e.target.value)} />
          </Field>
          <div className="mt-2 flex gap-2">
            <Button variant="primary" size="sm" busy={move.isPending} disabled={secondPerson?.userId === sheet.author.id} onClick={() => run('release', comment.trim() || undefined)}>
              Release {sheet.number}
            </Button>
            <Button variant="quiet" size="sm" onClick={() => setPanel(null)}>
              Not now
            </Button>
          </div>
        </div>
      )}

      {panel === 'return' && (
        <form
          className="mt-3 space-y-2 border-t border-rule pt-3"
          aria-label="Send this sheet back"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            if (!reason.trim()) return setReasonError('Say why the sheet is sent back');
            setReasonError(undefined);
            run('return', reason.trim());
          }}
        >
          <Field label="Reason (the author reads it in the e-mail)" error={reasonError}>
            <Textarea rows={3} value={reason} onChange={(e) => setReason(e.target.value)} />
          </Field>
          <div className="flex gap-2">
            <Button type="submit" size="sm" busy={move.isPending}>
              Send back to {sheet.author.name}
            </Button>
            <Button variant="quiet" size="sm" onClick={() => setPanel(null)}>
              Not now
            </Button>
          </div>
        </form>
      )}

      {panel === 'delete' && (
        <div className="mt-3 flex flex-wrap items-center gap-2 border-t border-rule pt-3">
          <span className="text-sm text-ink-soft">Delete {sheet.number}? Its dyno checks go with it.</span>
          <Button variant="danger" size="sm" busy={remove.isPending} onClick={() => remove.mutate(undefined, { onSuccess: () => navigate(`/w/${workspaceId}/sheets`) })}>
            Delete draft
          </Button>
          <Button variant="quiet" size="sm" onClick={() => setPanel(null)}>
            Keep it
          </Button>
        </div>
      )}

      {outcome && (
        <Notice tone={outcome.step === 'release' ? 'ok' : 'info'} className="mt-3" title={outcomeTitle(outcome.step, outcome.notified)}>
          {outcome.notice}
        </Notice>
      )}
      {error && <FormError message={error.message} />}
    </section>
  );
}

function outcomeTitle(step: SheetStep, notified: number): string {
  const mailed = notified === 0 ? 'nobody was e-mailed' : `${notified} ${notified === 1 ? 'person was' : 'people were'} e-mailed`;
  if (step === 'submit') return `Submitted for review; ${mailed}.`;
  if (step === 'release') return `Released; ${mailed}.`;
  if (step === 'return') return `Sent back; ${mailed}.`;
  return 'Reopened as a draft.';
}
