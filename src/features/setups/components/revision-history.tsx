import { useInfiniteQuery, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import type { RevisionSummary, SetupDetail } from '../../../../shared/schemas/setup-record.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { revisionQueryOptions, revisionsQueryOptions } from '../../../lib/queries/revisions.ts';
import { exportRevisionUrl } from '../api/export-revision.ts';
import { useRestoreRevision } from '../api/restore-revision.ts';
import { RevisionDiff } from './revision-diff.tsx';

export interface RevisionHistoryProps {
  workspaceId: string;
  setupId: string;
  latest: number;
  canWrite: boolean;
  /** The bench has unsaved edits: restoring will replace them, so the question says so. */
  draftDirty: boolean;
  onRestored: (detail: SetupDetail) => void;
}

/** The fragment id of a revision's row, so a refusal can link straight to it. */
export const revisionAnchor = (number: number) => `revision-${number}`;

function sourceWords(source: string | null): string | null {
  if (!source) return null;
  if (source === 'import') return 'imported';
  if (source.startsWith('restore:')) return `restored r${source.slice(8)}`;
  if (source.startsWith('copy:')) return 'copied in';
  if (source.startsWith('dyno-fit:')) return 'dyno fit';
  if (source.startsWith('study:')) return 'from a study';
  return source;
}

function Comparison({ workspaceId, setupId, a, b }: { workspaceId: string; setupId: string; a: number; b: number }) {
  const ra = useQuery(revisionQueryOptions(workspaceId, setupId, a));
  const rb = useQuery(revisionQueryOptions(workspaceId, setupId, b));
  if (ra.isError || rb.isError) return <Notice tone="danger">{(ra.error ?? rb.error)?.message}</Notice>;
  if (!ra.data || !rb.data) return <Loading what="the two revisions" />;
  return <RevisionDiff a={ra.data} b={rb.data} />;
}

/**
 * Every revision of the setup, newest first. Pick any two (A and B) to see what changed
 * between them field by field; download any of them as a file; restore one as a new revision.
 */
export function RevisionHistory({ workspaceId, setupId, latest, canWrite, draftDirty, onRestored }: RevisionHistoryProps) {
  const revisions = useInfiniteQuery(revisionsQueryOptions(workspaceId, setupId));
  const restore = useRestoreRevision(workspaceId, setupId);
  const toast = useToast();
  const [pair, setPair] = useState<{ a: number; b: number }>({ a: Math.max(1, latest - 1), b: latest });
  const [asking, setAsking] = useState<number | null>(null);

  // a new revision moves the comparison along, so B is always the newest unless picked otherwise
  useEffect(() => setPair({ a: Math.max(1, latest - 1), b: latest }), [latest]);

  if (revisions.isPending) return <Loading what="revisions" />;
  if (revisions.isError) return <Notice tone="danger">{revisions.error.message}</Notice>;
  const list: RevisionSummary[] = revisions.data.pages.flatMap((page) => page.revisions);
  // with one revision there is no pair to pick: no A/B columns, and the comparison says so
  const comparable = latest > 1;

  const doRestore = (number: number) =>
    restore.mutate(
      { number },
      {
        onSuccess: (detail) => {
          setAsking(null);
          toast.show(`Revision ${number} restored as revision ${detail.latestRevision}.`);
          onRestored(detail);
        },
        onError: (error) => toast.show(error.message, 'danger'),
      },
    );

  return (
    <div className="grid gap-4 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
        <table className="w-full text-sm" aria-label="Revisions">
          <thead className="border-b border-rule-strong bg-paper-sunk/70 text-left text-xs text-ink-soft">
            <tr>
              {comparable && (
                <>
                  <th scope="col" className="h-7 w-8 px-2 text-center font-semibold" title="First revision of the comparison">
                    A
                  </th>
                  <th scope="col" className="w-8 px-2 text-center font-semibold" title="Second revision of the comparison">
                    B
                  </th>
                </>
              )}
              <th scope="col" className="h-7 px-2 font-semibold">
                Rev.
              </th>
              <th scope="col" className="px-2 font-semibold">
                What changed
              </th>
              <th scope="col" className="px-2 font-semibold">
                By, when
              </th>
              <th scope="col" className="px-2">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {list.map((r) => (
              <tr key={r.id} id={revisionAnchor(r.number)} className="scroll-mt-16 border-b border-rule/60 align-top last:border-0 target:bg-accent-wash" aria-label={`Revision ${r.number}`}>
                {comparable && (
                  <>
                    <td className="px-2 py-1.5 text-center">
                      <input type="radio" name="compare-a" aria-label={`Compare from revision ${r.number}`} checked={pair.a === r.number} onChange={() => setPair((p) => ({ ...p, a: r.number }))} className="accent-accent" />
                    </td>
                    <td className="px-2 py-1.5 text-center">
                      <input type="radio" name="compare-b" aria-label={`Compare to revision ${r.number}`} checked={pair.b === r.number} onChange={() => setPair((p) => ({ ...p, b: r.number }))} className="accent-accent" />
                    </td>
                  </>
                )}
                <td className="figures px-2 py-1.5 font-semibold whitespace-nowrap">
                  r{r.number}
                  {r.number === latest && <span className="ml-1 font-sans text-2xs font-normal text-accent">latest</span>}
                </td>
                <td className="px-2 py-1.5">
                  <span className="text-ink">{r.message}</span>
                  {sourceWords(r.source) && (
                    <span className="ml-1.5">
                      <Tag>{sourceWords(r.source)}</Tag>
                    </span>
                  )}
                </td>
                <td className="px-2 py-1.5 text-xs whitespace-nowrap text-ink-soft">
                  {r.author.name}
                  <span className="figures block text-ink-faint">{formatDateTime(r.createdAt)}</span>
                </td>
                <td className="px-2 py-1.5 text-right whitespace-nowrap">
                  <a className="text-xs text-accent hover:underline" href={exportRevisionUrl(workspaceId, setupId, r.number)} download aria-label={`Download revision ${r.number} as a setup file`}>
                    JSON
                  </a>
                  {canWrite && r.number !== latest && asking !== r.number && (
                    <button type="button" className="ml-3 text-xs text-accent hover:underline" onClick={() => setAsking(r.number)}>
                      Restore…
                    </button>
                  )}
                  {asking === r.number && (
                    <span className="mt-1 flex flex-col items-end gap-1">
                      <span className="text-2xs whitespace-normal text-ink-soft">
                        Saves r{r.number}'s values as revision {latest + 1}.{draftDirty ? ' Your unsaved edits will be dropped.' : ''}
                      </span>
                      <span className="flex gap-1">
                        <Button size="sm" variant="primary" busy={restore.isPending} onClick={() => doRestore(r.number)}>
                          Restore as r{latest + 1}
                        </Button>
                        <Button size="sm" variant="quiet" onClick={() => setAsking(null)}>
                          Cancel
                        </Button>
                      </span>
                    </span>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        {revisions.hasNextPage && (
          <div className="flex items-center gap-3 border-t border-rule px-2 py-2 text-xs text-ink-soft">
            <Button size="sm" busy={revisions.isFetchingNextPage} onClick={() => void revisions.fetchNextPage()}>
              Show older revisions
            </Button>
            <span>{list.length} newest shown</span>
          </div>
        )}
      </div>
      <div className="min-w-0">
        <h3 className="mb-1.5 text-sm font-semibold text-ink">{comparable && pair.a !== pair.b ? `Changes from r${pair.a} to r${pair.b}` : 'Changes between revisions'}</h3>
        {!comparable ? (
          <p className="text-sm text-ink-faint">This setup has one revision, so there is nothing to compare yet. Save a change and its differences from r1 show here.</p>
        ) : pair.a === pair.b ? (
          <p className="text-sm text-ink-faint">Pick two different revisions in columns A and B.</p>
        ) : (
          <Comparison workspaceId={workspaceId} setupId={setupId} a={pair.a} b={pair.b} />
        )}
      </div>
    </div>
  );
}
