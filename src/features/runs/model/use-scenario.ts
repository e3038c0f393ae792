import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { roadQueryOptions, roadsQueryOptions } from '../../../lib/queries/roads.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { initialScenario, INLINE_ROAD, resolveScenario, type ScenarioDraft, type ScenarioErrors } from './scenario.ts';

/** Draft state of a scenario plus what ScenarioFields needs; `resolve()` checks it and sets errors. */
export function useScenario(workspaceId: string) {
  const speedUnit = useUnits().prefs.speed;
  const [draft, setDraft] = useState<ScenarioDraft>(() => initialScenario(speedUnit));
  const [errors, setErrors] = useState<ScenarioErrors>({});
  const roads = useQuery({ ...roadsQueryOptions(workspaceId), retry: false });
  const libraryRoad = useQuery(roadQueryOptions(workspaceId, draft.roadChoice !== INLINE_ROAD ? draft.roadChoice : undefined));
  const definition = libraryRoad.data?.definition;

  const resolve = () => {
    const out = resolveScenario(draft, definition);
    setErrors(out.ok ? {} : out.errors);
    return out;
  };

  return {
    resolve,
    fieldProps: {
      draft,
      onChange: setDraft,
      errors,
      libraryRoads: roads.data?.roads,
      libraryUnavailable: roads.isError,
      librarySeed: definition?.kind === 'iso8608' ? definition.seed : undefined,
    },
  };
}
