import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Select } from '../../../components/ui/field.tsx';
import { latestRevisionsQueryOptions, revisionQueryOptions } from '../../../lib/queries/revisions.ts';
import { setupsQueryOptions } from '../../../lib/queries/setups.ts';
import type { Scenario } from '../model/scenario.ts';
import { useScenario } from '../model/use-scenario.ts';
import { ScenarioFields } from './scenario-fields.tsx';

/** What the form hands over: the run itself plus where its setup came from. */
export interface RunChoice extends Scenario {
  setup: Setup;
  setupId: string;
  revisionNumber: number;
  latestRevision: number;
}

export interface RunFormProps {
  workspaceId: string;
  initialSetupId?: string;
  initialRevision?: number;
  running: boolean;
  onRun: (choice: RunChoice) => void;
  onCancel: () => void;
}

/** The scenario of one run: which setup revision, over which road, how fast and for how long. */
export function RunForm({ workspaceId, initialSetupId, initialRevision, running, onRun, onCancel }: RunFormProps) {
  const setups = useQuery(setupsQueryOptions(workspaceId));
  const scenario = useScenario(workspaceId);
  const [setupId, setSetupId] = useState(initialSetupId ?? '');
  const [revision, setRevision] = useState<number | undefined>(initialRevision);
  const [setupError, setSetupError] = useState('');

  const live = setups.data?.setups ?? [];
  useEffect(() => {
    // no choice yet, or a link named a setup that is not (or no longer) here: take the first
    if (live.length > 0 && !live.some((s) => s.id === setupId)) {
      setSetupId(live[0].id);
      setRevision(undefined);
    }
  }, [setupId, live]);
  const chosen = live.find((s) => s.id === setupId);
  const revisions = useQuery(latestRevisionsQueryOptions(workspaceId, chosen?.id));
  useEffect(() => {
    if (chosen && (revision === undefined || revision > chosen.latestRevision)) setRevision(chosen.latestRevision);
  }, [chosen, revision]);
  const revisionDoc = useQuery(revisionQueryOptions(workspaceId, chosen?.id, revision));

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const resolved = scenario.resolve();
    const setup = revisionDoc.data?.document;
    setSetupError(!chosen || !setup || revision === undefined ? 'Pick a setup and a revision' : '');
    if (!resolved.ok || !chosen || !setup || revision === undefined) return;
    onRun({ ...resolved.scenario, setup, setupId: chosen.id, revisionNumber: revision, latestRevision: chosen.latestRevision });
  };

  const revisionOptions = revisions.data?.revisions.map((r) => r.number) ?? (chosen ? [chosen.latestRevision] : []);

  return (
    <form onSubmit={submit} noValidate aria-label="Run a setup" className="rounded border border-rule bg-paper-raised p-3">
      <div className="mb-2 flex flex-wrap items-start gap-x-3 gap-y-2">
        <Field label="Setup" error={setupError} className="min-w-[16rem] flex-[2]">
          <Select
            value={setupId}
            onChange={(e) => {
              setSetupId(e.target.value);
              setRevision(undefined);
            }}
            disabled={setups.isPending}
          >
            {setups.isPending && <option value="">Loading…</option>}
            {live.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Revision" className="w-32">
          <Select value={revision ?? ''} onChange={(e) => setRevision(Number(e.target.value))} disabled={!chosen}>
            {revisionOptions.map((n) => (
              <option key={n} value={n}>
                r{n}
                {chosen && n === chosen.latestRevision ? ' (latest)' : ''}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <ScenarioFields {...scenario.fieldProps} />
      <div className="mt-3 flex flex-wrap items-center gap-2 border-t border-rule pt-3">
        <Button type="submit" variant="primary" disabled={running || !revisionDoc.data}>
          Run
        </Button>
        {running && (
          <Button type="button" onClick={onCancel}>
            Cancel run
          </Button>
        )}
        <span className="text-xs text-ink-faint">Runs in a worker in your browser; nothing is sent to the server until you save.</span>
      </div>
      {setups.isSuccess && live.length === 0 && <FormError message="This workspace has no setups yet. Create one under Corners first." />}
    </form>
  );
}
