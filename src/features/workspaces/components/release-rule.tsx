import type { WorkspaceSettings } from '../../../../shared/schemas/workspace.ts';
import { FormError } from '../../../components/ui/field.tsx';
import { useUpdateWorkspaceSettings } from '../api/update-settings.ts';

/** The admin's switch for a second person at target-sheet release. */
export function ReleaseRule({ workspaceId, settings }: { workspaceId: string; settings: WorkspaceSettings }) {
  const update = useUpdateWorkspaceSettings(workspaceId);
  // Shows the choice at once; the workspace's own answer takes over when the save comes back.
  const shown = update.isPending ? update.variables : settings;
  return (
    <div className="space-y-1">
      <label className="flex items-start gap-2 text-sm">
        <input
          type="checkbox"
          className="mt-0.5"
          checked={shown.releaseNeedsSecondPerson}
          disabled={update.isPending}
          onChange={(e) => update.mutate({ ...settings, releaseNeedsSecondPerson: e.target.checked })}
        />
        <span>
          A second person releases target sheets
          <span className="block text-ink-soft">When on, a lead cannot release a sheet they wrote or submitted; another lead does. Released sheets change parts fitted to vehicles.</span>
        </span>
      </label>
      <FormError message={update.error?.message ?? ''} />
    </div>
  );
}
